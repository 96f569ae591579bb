namespace CutSheet.Editing.Completion;

/// <summary>
/// Where a name comes from, in the order completions are ranked among equally good matches:
/// what the function being written declares, then the sheet's own names, then imported ones,
/// the built-in functions and constants, the names of library sheets not imported yet, and last
/// the keywords.
/// </summary>
public enum CompletionGroup { Local, Own, Imported, Builtin, Library, Keyword }
