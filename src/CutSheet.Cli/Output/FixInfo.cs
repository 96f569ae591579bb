namespace CutSheet.Cli.Output;

/// <summary>A fix offered with a finding: its title and the edits, placed like the finding.</summary>
internal sealed record FixInfo(string Title, IReadOnlyList<EditInfo> Edits);
