using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Results;

/// <summary>A caution that fired: its level, message, where it fired and, if acknowledged, the reason given.</summary>
public sealed record CautionResult(CautionLevel Level, string Message, TextSpan Span, string? AcceptedReason, string? Origin)
{
    public bool IsAccepted => AcceptedReason is not null;

    /// <summary>The diagnostic code when it differs from the level's own (CUT4104 for a model used outside its validity).</summary>
    public string? Code { get; init; }
}
