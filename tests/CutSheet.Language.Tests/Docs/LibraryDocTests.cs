using CutSheet.Language.Diagnostics;
using CutSheet.Language.Library;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Docs;

/// <summary>
/// docs/library.md is generated from the library sheets (<see cref="LibraryDocRenderer"/>), so it
/// lists exactly the functions, tables, choices and kinds the tool ships, with their formulas and
/// sources. The whole file must equal a fresh rendering; <c>CUTSHEET_BLESS=1</c> rewrites it.
/// The library's own rules (a description and a source on every function, a source on every
/// table, sheets that load without errors) are checked here for every sheet present.
/// </summary>
public class LibraryDocTests
{
    private static string DocPath => Path.Combine(RepoPaths.Root, "docs", "library.md");

    [Fact]
    public void Library_md_is_generated_from_the_library_sheets()
    {
        string fresh = LibraryDocRenderer.Render();
        string committed = File.Exists(DocPath) ? File.ReadAllText(DocPath).Replace("\r\n", "\n") : "";
        if (committed == fresh) return;
        if (DocExamples.Blessing)
        {
            File.WriteAllText(DocPath, fresh);
            return;
        }
        Assert.Fail("docs/library.md is stale: run " +
            $"'{DocExamples.BlessVariable}=1 dotnet test tests/CutSheet.Language.Tests --filter FullyQualifiedName~LibraryDoc' and commit the result");
    }

    [Fact]
    public void Every_sheet_function_table_choice_and_kind_is_in_the_document()
    {
        string doc = LibraryDocRenderer.Render();
        Assert.NotEmpty(LibrarySheets.Names);
        foreach (var sheet in LibraryDocRenderer.Sheets())
        {
            Assert.Contains("\n## Sheet " + sheet.Name + "\n", doc);
            foreach (var s in sheet.Syntax.Statements)
            {
                string? expected = s switch
                {
                    FunctionSyntax f => "#### `" + LibraryDocRenderer.Signature(sheet, f) + "`",
                    TableSyntax t => "#### Table `" + t.Name + "[",
                    ChoiceSyntax c => "#### Choice `" + c.Name + "`",
                    KindDeclarationSyntax k => "#### Kind `" + k.Name + "`",
                    DefinitionSyntax d => "#### Data `" + d.Name + "`",
                    _ => null,
                };
                if (expected is not null) Assert.Contains(expected, doc);
            }
        }
        Assert.StartsWith("# The CutSheet library", doc);
        Assert.Contains("> **Safety.**", doc[..1200]);
    }

    public static TheoryData<string> Names => new(LibrarySheets.Names);

    [Theory, MemberData(nameof(Names))]
    public void Library_sheet_parses_and_loads_without_errors(string name)
    {
        var syntax = LibraryDocRenderer.Sheets().Single(s => s.Name == name).Syntax;
        Assert.Empty(syntax.Diagnostics);
        var result = SheetRunner.Run($"use {name}\n");
        Assert.False(result.HasErrors, string.Join("; ", result.Diagnostics.Select(d => $"{d.Code} {d.Message}")));
        Assert.DoesNotContain(result.Diagnostics, d => d.Severity == Severity.Warning);
    }

    [Theory, MemberData(nameof(Names))]
    public void Every_function_and_table_states_a_description_and_a_source(string name)
    {
        var sheet = LibraryDocRenderer.Sheets().Single(s => s.Name == name);
        Assert.NotNull(LibraryDocRenderer.Title(sheet));
        foreach (var s in sheet.Syntax.Statements)
        {
            switch (s)
            {
                case FunctionSyntax f:
                    Assert.False(string.IsNullOrWhiteSpace(f.Clauses.Description?.Value), $"{name}.{f.Name} has no description");
                    Assert.False(string.IsNullOrWhiteSpace(f.Clauses.Source?.Value), $"{name}.{f.Name} has no source");
                    break;
                case TableSyntax t:
                    Assert.True(t.Clauses.Source is not null || t.Clauses.Rows.All(r => r.Source is not null), $"{name}.{t.Name} has no source");
                    break;
                case DefinitionSyntax d:
                    Assert.False(string.IsNullOrWhiteSpace(d.Clauses.Source?.Value), $"{name}.{d.Name} (library data) has no source");
                    break;
            }
        }
    }

    [Theory, MemberData(nameof(Names))]
    public void Every_caution_and_warning_defers_to_the_builders_data_codes_and_practice(string name)
    {
        var sheet = LibraryDocRenderer.Sheets().Single(s => s.Name == name);
        foreach (var f in sheet.Syntax.Statements.OfType<FunctionSyntax>())
        {
            foreach (var c in f.Clauses.Cautions.Where(c => c.Level != CautionLevel.Notice))
            {
                Assert.Contains("machine builder's data, local codes and licensed practice", c.Message.Value);
            }
        }
    }
}
