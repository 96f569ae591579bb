namespace CutSheet.Cli.Output;

/// <summary>One text edit of a fix: replace <see cref="Range"/> of the file with <see cref="NewText"/>.</summary>
internal sealed record EditInfo(string DisplayPath, SourceRange Range, string NewText);
