namespace CutSheet.Cli.Output;

/// <summary>Another place that explains a finding, placed like the finding.</summary>
internal sealed record RelatedInfo(string DisplayPath, SourceRange Range, string Message);
