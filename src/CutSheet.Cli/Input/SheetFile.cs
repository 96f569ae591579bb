namespace CutSheet.Cli.Input;

/// <summary>A sheet read from disk: its full path (given to the language), the path shown to the user, and its text.</summary>
internal sealed record SheetFile(string FullPath, string DisplayPath, string Text);
