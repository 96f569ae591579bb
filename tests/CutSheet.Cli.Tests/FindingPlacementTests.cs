using CutSheet.Cli.Output;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Text;

namespace CutSheet.Cli.Tests;

/// <summary>Placing diagnostics: offsets become 1-based lines and UTF-16 columns, in the right file.</summary>
public sealed class FindingPlacementTests
{
    /// <summary>Serves texts from memory, as an editor's open documents would.</summary>
    private sealed class MemorySources(Dictionary<string, string> files) : ISheetSource
    {
        public string? Read(string fullPath) => files.TryGetValue(fullPath, out var text) ? text : null;

        public string ResolveLinks(string fullPath) => fullPath;
    }

    private static readonly string Root = Path.Combine(Path.GetTempPath(), "placement");
    private static readonly string SheetPath = Path.Combine(Root, "main.cutsheet");
    private static readonly string LibPath = Path.Combine(Root, "lib", "lib.cutsheet");

    private static LocationResolver Resolver(string sheetText, string libText) =>
        new(new SourceText(sheetText, SheetPath), SheetPath, Root, new MemorySources(new() { [LibPath] = libText }));

    [Fact]
    public void A_span_in_the_sheet_counts_lines_from_1_and_utf16_columns_from_1()
    {
        // "a\r\nb = 🔧x": line 2 starts at offset 3; 'x' is at offset 3 + 4 (b, space, =, space) + 2 (emoji) = 9,
        // so it is line 2, column 4 + 2 + 1 = 7 [counted].
        var resolver = Resolver("a\r\nb = 🔧x", "");
        var finding = FindingFactory.From(Diagnostic.Error("CUT3001", new TextSpan(9, 1), "x"), resolver);
        Assert.Equal(new SourceRange(2, 7, 2, 8), finding.Range);
        Assert.Equal(SheetPath, finding.FullPath);
    }

    [Fact]
    public void A_span_with_a_path_is_placed_in_that_file()
    {
        // lib text "k = 1\nm = q": 'q' at offset 6 + 4 = 10 is line 2, column 5 [counted].
        var resolver = Resolver("use \"lib/lib.cutsheet\"\n", "k = 1\nm = q");
        var diagnostic = new Diagnostic("CUT3001", Severity.Error, new TextSpan(10, 1), "'q' is not defined", [], [], LibPath);
        var finding = FindingFactory.From(diagnostic, resolver);
        Assert.Equal(LibPath, finding.FullPath);
        Assert.Equal(Path.Combine("lib", "lib.cutsheet"), finding.DisplayPath);
        Assert.Equal(new SourceRange(2, 5, 2, 6), finding.Range);
    }

    [Fact]
    public void Fixes_and_related_locations_are_placed_too()
    {
        var resolver = Resolver("x = 2 lb\n", "");
        var fix = new Fix("write lbf", [new TextEdit(new TextSpan(6, 2), "lbf")]);
        var related = new RelatedLocation(new TextSpan(6, 2), "this lb is a mass");
        var finding = FindingFactory.From(new Diagnostic("CUT2101", Severity.Error, new TextSpan(4, 4), "m", [related], [fix]), resolver);
        var edit = Assert.Single(Assert.Single(finding.Fixes).Edits);
        Assert.Equal(new SourceRange(1, 7, 1, 9), edit.Range);
        Assert.Equal("lbf", edit.NewText);
        Assert.Equal(new SourceRange(1, 7, 1, 9), Assert.Single(finding.Related).Range);
    }

    [Fact]
    public void An_unreadable_file_is_placed_at_its_start()
    {
        var resolver = Resolver("", "");
        var diagnostic = new Diagnostic("CUT3001", Severity.Error, new TextSpan(40, 2), "m", [], [], Path.Combine(Root, "gone.cutsheet"));
        Assert.Equal(SourceRange.FileStart, FindingFactory.From(diagnostic, resolver).Range);
    }

    [Fact]
    public void A_library_label_is_shown_as_it_is_and_placed_in_the_library_text()
    {
        string name = Assert.IsType<string>(Language.Library.LibrarySheets.Names.FirstOrDefault());
        string label = Language.Library.LibrarySheets.PathOf(name);
        string text = Language.Library.LibrarySheets.Read(name)!;
        int secondLine = text.IndexOf('\n') + 1; // the first character of line 2
        Assert.True(secondLine > 0, "the library sheet has a second line");
        var diagnostic = new Diagnostic("CUT4104", Severity.Warning, new TextSpan(secondLine, 0), "m", [], [], label);
        var finding = FindingFactory.From(diagnostic, Resolver("", ""));
        Assert.Equal(label, finding.DisplayPath);
        Assert.Equal(new SourceRange(2, 1, 2, 1), finding.Range);
    }

    [Fact]
    public void Sarif_uris_escape_each_segment()
    {
        Assert.Equal("my%20sheets/%C3%A4/a.cutsheet", Output.Sarif.SarifWriter.RelativeUri(Path.Combine("my sheets", "ä", "a.cutsheet")));
    }
}
