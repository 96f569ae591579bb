using CutSheet.Language.Display;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Options of one evaluation. <see cref="Overrides"/> replaces inputs of the sheet with
/// expressions (<c>--set d_0=20mm</c>); <see cref="WorkspaceRoot"/> confines <c>use "path"</c>
/// imports; <see cref="Sources"/> supplies sheet text (files, or an editor's open documents).
/// Null settings fall back to the sheet's own <c>display</c> lines, then to the defaults.
/// </summary>
public sealed record RunOptions
{
    public UnitSystem? Units { get; init; }
    public int? Digits { get; init; }
    public IReadOnlyDictionary<string, string> Overrides { get; init; } = new Dictionary<string, string>();
    public string? WorkspaceRoot { get; init; }
    public ISheetSource Sources { get; init; } = FileSheetSource.Instance;

    public static readonly RunOptions Default = new();
}
