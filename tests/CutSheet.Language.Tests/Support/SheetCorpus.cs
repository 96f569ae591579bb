namespace CutSheet.Language.Tests.Support;

/// <summary>
/// The sheets the suite knows: example sheets (<c>examples/**/*.cutsheet</c>), the parser golden
/// inputs, the library sheets shipped in <c>src/CutSheet.Language/Library</c>, and one sheet per
/// line of the evaluation case files. Each comes with a name for messages.
/// </summary>
public static class SheetCorpus
{
    public static string LibraryFolder => Path.Combine(RepoPaths.Root, "src", "CutSheet.Language", "Library");

    public static string GoldenParserFolder => RepoPaths.TestData("Golden", "Parser");

    public static IEnumerable<(string Name, string Text)> Examples => Files(RepoPaths.Examples);

    public static IEnumerable<(string Name, string Text)> GoldenInputs => Files(GoldenParserFolder);

    public static IEnumerable<(string Name, string Text)> Library => Files(LibraryFolder);

    /// <summary>Every file sheet: examples, golden inputs and library sheets.</summary>
    public static IEnumerable<(string Name, string Text)> FileSheets => Examples.Concat(GoldenInputs).Concat(Library);

    public static readonly string[] CaseFiles = ["evaluation.cases", "rotation.cases", "lexing.cases", "kinds.cases"];

    /// <summary>One sheet per case line, built as <see cref="CaseRunner"/> builds it.</summary>
    public static IEnumerable<(string Name, string Text)> CaseSheets =>
        CaseFiles.SelectMany(CaseFile.Load).Select(c => ((string)c[0], CaseRunner.SheetText((string)c[1])));

    /// <summary>UTF-8 without dropping a byte-order mark (it is part of the text a round trip must keep).</summary>
    public static string Decode(byte[] bytes) => new System.Text.UTF8Encoding(false, false).GetString(bytes);

    private static IEnumerable<(string, string)> Files(string folder) =>
        Directory.Exists(folder)
            ? Directory.EnumerateFiles(folder, "*.cutsheet", SearchOption.AllDirectories)
                .OrderBy(f => f, StringComparer.Ordinal)
                .Select(f => (Path.GetRelativePath(RepoPaths.Root, f), Decode(File.ReadAllBytes(f))))
            : [];
}
