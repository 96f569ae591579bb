namespace CutSheet.Language.Evaluation;

/// <summary>Reads imported sheets from disk.</summary>
public sealed class FileSheetSource : ISheetSource
{
    public static readonly FileSheetSource Instance = new();

    public string? Read(string fullPath)
    {
        try
        {
            return File.Exists(fullPath) ? File.ReadAllText(fullPath) : null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    public string ResolveLinks(string fullPath) => RealPath.Of(fullPath);
}
