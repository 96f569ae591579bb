using CutSheet.Editing.Analysis;
using CutSheet.Editing.Completion;

namespace CutSheet.Editing.Tests;

/// <summary>
/// Resolving finds a completion's details again by its key, and answers null, not an error,
/// for keys that no longer fit the sheet (the user may have edited it since the list was made).
/// </summary>
public sealed class CompletionResolveTests
{
    private static readonly SheetAnalysis Sheet = SheetAnalysis.Evaluate("use screws as s\nF_axial = 1.1 kN\n", null, 1);

    [Fact]
    public void A_definition_resolves_to_its_value_as_the_sheet_shows_it() =>
        // 1.1 kN as written in the sheet, shown to 4 significant figures (the default, docs/language.md, "Display").
        Assert.Equal("1.100 kN", CompletionResolver.Resolve(Sheet, new CompletionKey(CompletionCategory.Definition, "F_axial"))?.Detail);

    [Fact]
    public void A_built_in_function_resolves_to_its_description() =>
        Assert.False(string.IsNullOrEmpty(CompletionResolver.Resolve(Sheet, new CompletionKey(CompletionCategory.Function, "sqrt"))?.Documentation));

    [Fact]
    public void A_member_of_an_imported_sheet_resolves_through_its_alias() =>
        Assert.Contains("length_per_revolution", CompletionResolver.Resolve(Sheet, new CompletionKey(CompletionCategory.Function, "lead", "s"))?.Detail);

    [Theory]
    [InlineData(CompletionCategory.Definition, "no_such_name", null)]
    [InlineData(CompletionCategory.Definition, "lead", "no_such_alias")]
    [InlineData(CompletionCategory.Unit, "not-a-unit", null)]
    [InlineData(CompletionCategory.Definition, "", null)]
    public void A_key_that_fits_nothing_resolves_to_null(CompletionCategory category, string name, string? alias) =>
        Assert.Null(CompletionResolver.Resolve(Sheet, new CompletionKey(category, name, alias)));
}
