namespace CutSheet.Language.Evaluation;

/// <summary>Where imported sheets come from: the file system, or an editor's open documents over it.</summary>
public interface ISheetSource
{
    /// <summary>The text of the sheet at a full path, or null when there is none.</summary>
    string? Read(string fullPath);

    /// <summary>The path with symbolic links resolved, for workspace confinement.</summary>
    string ResolveLinks(string fullPath);
}
