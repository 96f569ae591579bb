namespace CutSheet.Editing;

/// <summary>Every message the editing features show to a person, in one place.</summary>
public static class EditingMessages
{
    public const string NothingToRename = "there is no name here to rename";
    public const string BuiltinNotRenamed = "a built-in name cannot be renamed";
    public const string LibraryNotRenamed = "names of library sheets ship with the tool and cannot be renamed";
    public const string SheetNotRenamed = "an import names a sheet; rename the file instead";

    public static string NotAName(string name) => $"'{name}' is not a valid name: a name starts with a letter or '_' and continues with letters, digits or '_'";

    public static string Reserved(string name) => $"'{name}' is a reserved word of the language";

    public static string AlreadyNamed(string name, string where) => $"'{name}' already names something in {where}";

    // Completion details: what a name is when its value or signature says nothing more.
    public const string CompletionTable = "table";
    public const string CompletionChoice = "choice";
    public const string CompletionKind = "kind";
    public const string CompletionConstant = "constant";

    public static string CompletionOption(string choice) => $"option of {choice}";

    public static string CompletionImportedSheet(string sheet) => $"imported sheet {sheet}";
    public static string CompletionFromLibrary(string library) => $"library {library} (adds 'use {library}')";
}
