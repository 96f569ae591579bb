using CutSheet.Editing.Symbols;
using CutSheet.Language.Library;

namespace CutSheet.LanguageServer.Documents;

/// <summary>
/// The library sheets written to a folder of their own, read-only, so that go to definition
/// can open them in any editor (generic clients do not understand private URI schemes). The
/// folder is named by the library version: sheets of another version never mix in.
/// </summary>
public sealed class LibraryFiles(string folder)
{
    public static LibraryFiles Default { get; } = new(Path.Combine(Path.GetTempPath(), $"cutsheet-library-{LibrarySheets.Version}-{Environment.UserName}"));

    public string Folder { get; } = folder;

    /// <summary>The file of a library label (<c>library/screws.cutsheet</c>), written on first use; null if it cannot be written.</summary>
    public string? PathOf(string label, Action<string>? log = null)
    {
        string? name = LibraryPaths.NameOf(label);
        string? text = name is null ? null : LibrarySheets.Read(name);
        if (name is null || text is null) return null;
        string file = Path.Combine(Folder, name + ".cutsheet");
        try
        {
            if (!File.Exists(file) || File.ReadAllText(file) != text)
            {
                Directory.CreateDirectory(Folder);
                // An older copy is read-only too: make it writable for the moment of the update.
                if (File.Exists(file)) File.SetAttributes(file, FileAttributes.Normal);
                if (File.Exists(file) && !OperatingSystem.IsWindows()) File.SetUnixFileMode(file, UnixFileMode.UserRead | UnixFileMode.UserWrite);
                File.WriteAllText(file, text);
                if (OperatingSystem.IsWindows()) File.SetAttributes(file, FileAttributes.ReadOnly);
                else File.SetUnixFileMode(file, UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead);
            }
            return file;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            log?.Invoke(ServerMessages.LibraryFolderFailed(e.Message));
            return null;
        }
    }
}
