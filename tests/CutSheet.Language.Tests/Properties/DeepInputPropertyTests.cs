using System.Text;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Deep nesting and large sizes never crash (no stack overflow: a stack overflow would kill
/// the whole test run), never hang, and print back losslessly. Evaluation is bounded
/// (LANGUAGE.md H: "capped nesting, list and table sizes"), so each sheet either gives the
/// right value or an error that says why it has none — never a silent unknown.
/// </summary>
public class DeepInputPropertyTests
{
    // The biggest sheets are a few hundred kilobytes; in a Debug build, with the rest of the
    // suite running in parallel, they take a few seconds, so they get a wider bound than the
    // 5 s of one ordinary run.
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(20);

    private static readonly DeepInput[] All =
    [
        // 1 inside 10,000 parentheses is 1 [calc]
        new("10,000 parentheses", () => "x = " + new string('(', 10_000) + "1" + new string(')', 10_000) + "\n", "x", "1"),
        new("10,000 unclosed parentheses", () => "x = " + new string('(', 10_000) + "1\n", "x", "none"),
        // an even number of minus signs: (−1)^10000 · 1 = 1 [calc]
        new("10,000 unary minus", () => "x = " + new string('-', 10_000) + "1\n", "x", "1"),
        new("10,000 unary minus with spaces", () => "x = " + Repeat("- ", 10_000) + "1\n", "x", "1"),
        // not applied 10,000 times (an even number) to true is true [calc]
        new("10,000 not", () => "x = " + Repeat("not ", 10_000) + "true\n", "x", "true"),
        // 2^2^…^2 with 5000 twos is a power tower far beyond the largest double: no finite value [calc]
        new("2^2^…^2 ×5000", () => "x = " + string.Join("^", Enumerable.Repeat("2", 5000)) + "\n", "x", "none"),
        // if true then (if true then … 1 else 2) else 2: the innermost then-branch, 1 [calc]
        new("if nested 1000 times", () => "x = " + Repeat("if true then ", 1000) + "1" + Repeat(" else 2", 1000) + "\n", "x", "1"),
        new("10,000 nested lists", () => "x = " + new string('[', 10_000) + "1" + new string(']', 10_000) + "\n", "x", "none"),
        // abs(abs(…abs(-1)…)) is 1 [calc]
        new("10,000 nested calls", () => "x = " + Repeat("abs(", 10_000) + "-1" + new string(')', 10_000) + "\n", "x", "1"),
        // 1 mm = 0.001 m [calc]
        new("10,000 parentheses in a unit", () => "x = 1 " + new string('(', 10_000) + "mm" + new string(')', 10_000) + "\n", "x", "0.001"),
        new("1,000,000-character name", () => "x = " + new string('a', 1_000_000) + "\n", "x", "none"),
        new("1,000,000-character comment", () => "x = 1 // " + new string('c', 1_000_000) + "\n", "x", "1"),
        new("1,000,000-character text", () => "sheet title \"" + new string('t', 1_000_000) + "\"\nx = 2\n", "x", "2"),
        new("1,000,000-character heading", () => "# " + new string('h', 1_000_000) + "\nx = 2\n", "x", "2"),
        // 20,000 × 1 mm = 20 m [calc]
        new("sum of 20,000 terms", () => "x = " + string.Join(" + ", Enumerable.Repeat("1 mm", 20_000)) + "\n", "x", "20"),
        // sum() of 20,000 × 1 N = 20,000 N [calc]
        new("list of 20,000 items", () => "x = sum([" + string.Join(", ", Enumerable.Repeat("1 N", 20_000)) + "])\n", "x", "20000"),
        // 1 mm · 1 mm · … (2000 factors of 1) stays 1 as a plain product of numbers [calc]
        new("product of 2000 factors", () => "x = " + string.Join(" * ", Enumerable.Repeat("1", 2000)) + "\n", "x", "1"),
        new("and of 2000 terms", () => "x = " + string.Join(" and ", Enumerable.Repeat("true", 2000)) + "\n", "x", "true"),
        // x0 = 1 mm, x_i = x_(i−1) + 1 mm: x4999 = 5000 mm = 5 m [calc]
        new("5,000 statements in a chain", () => "x0 = 1 mm\n" + string.Concat(Enumerable.Range(1, 4999).Select(i => $"x{i} = x{i - 1} + 1 mm\n")), "x4999", "5"),
        // 5,000 independent inputs; the last is 4999 mm = 4.999 m [calc]
        new("5,000 independent statements", () => string.Concat(Enumerable.Range(0, 5000).Select(i => $"x{i} = {i} mm\n")), "x4999", "4.999"),
        // f_i calls f_(i−1) down to f0(a) = a, so f299(1 mm) is 1 mm [calc] — or a call-depth limit says why not
        new("300 functions calling each other", () => "f0(a: length): length = a\n" + string.Concat(Enumerable.Range(1, 299).Select(i => $"f{i}(a: length): length = f{i - 1}(a: a)\n")) + "x = f299(a: 1 mm)\n", "x", "0.001"),
        // f(a) = a whatever its (unused) local b: 1 mm [calc]
        new("5,000 indented clause lines", () => "f(a: length): length = a\n" + Repeat("  where b = a\n", 5000) + "x = f(a: 1 mm)\n", "x", "0.001"),
        // 2001 × 1 N [calc]
        new("2,000 lines inside one bracket", () => "x = sum([\n" + Repeat("  1 N,\n", 2000) + "  1 N])\n", "x", "2001"),
    ];

    /// <summary>The inputs by name (names serialise, so each shows as its own test case).</summary>
    public static TheoryData<string> Inputs => new(All.Select(i => i.Name));

    [Theory, MemberData(nameof(Inputs))]
    public void FinishesAndExplainsItself(string name)
    {
        var input = All.Single(i => i.Name == name);
        string text = input.Build();
        var syntax = Bounded.Run(() => Syntax.SheetSyntax.Parse(text), $"{input.Name}: parse", Limit);
        Assert.True(syntax.Print() == text, $"{input.Name}: Print() differs from the text");
        var result = Bounded.Run(() => SheetRunner.Run(text), $"{input.Name}: run", Limit);

        var definition = result.Definitions.Single(d => d.Name == input.Definition);
        string diagnostics = string.Join("; ", result.Diagnostics.Take(5).Select(d => $"{d.Code} {Short(d.Message)}"));
        if (definition.Value is null)
        {
            Assert.True(result.Diagnostics.Any(d => d.Severity == Severity.Error),
                $"{input.Name}: '{input.Definition}' is unknown but no error says why");
            return;
        }
        Assert.True(input.Expected != "none", $"{input.Name}: expected an error, got {definition.Value.Text} [{diagnostics}]");
        if (input.Expected == "true")
        {
            Assert.Equal("true", definition.Value.NumberText);
            return;
        }
        double expected = double.Parse(input.Expected, System.Globalization.CultureInfo.InvariantCulture);
        Assert.True(Math.Abs(definition.Value.Quantity.Si - expected) <= 1e-12 * Math.Abs(expected),
            $"{input.Name}: expected {input.Expected} (SI), got {definition.Value.Quantity.Si} [{diagnostics}]");
    }

    private static string Repeat(string s, int n) => new StringBuilder(s.Length * n).Insert(0, s, n).ToString();

    private static string Short(string s) => s.Length > 80 ? s[..80] + "…" : s;
}
