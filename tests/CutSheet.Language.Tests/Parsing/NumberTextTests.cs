using System.Globalization;
using CsCheck;
using CutSheet.Language.Syntax.Parsing;

namespace CutSheet.Language.Tests.Parsing;

/// <summary>
/// <see cref="NumberText"/> reads short decimals itself (digits over an exact power of ten) and
/// leaves the rest to <see cref="double.Parse(string, NumberStyles, IFormatProvider?)"/>. Both must
/// give the correctly rounded value of the decimal (IEEE 754-2008, 5.12.2), which the .NET runtime's
/// <c>double.Parse</c> gives: it is the reference for every decimal here, compared bit for bit.
/// </summary>
public class NumberTextTests
{
    [Theory]
    [InlineData("0.1")]
    [InlineData("0.25")]
    [InlineData("1.0001")]
    [InlineData("0.9999")]
    [InlineData(".5")]
    [InlineData("007")]
    [InlineData("123456789012345")]
    [InlineData("12345678.9012345")]
    [InlineData("0.000000000000001")]
    [InlineData("9007199254740993")]   // 2⁵³ + 1: 16 digits, past the exact range, to double.Parse
    [InlineData("0.30000000000000004")]
    [InlineData("1e3")]
    [InlineData("2.5E-7")]
    public void DecimalIsTheCorrectlyRoundedValue(string text) =>
        Assert.Equal(BitConverter.DoubleToInt64Bits(Reference(text)), BitConverter.DoubleToInt64Bits(NumberText.Parse(text)));

    /// <summary>A trailing point is allowed: <c>2.</c> is 2 (docs/language.md, "Lexing").</summary>
    [Fact]
    public void TrailingPointIsAllowed() => Assert.Equal(2.0, NumberText.Parse("2."));

    /// <summary>Fractions and mixed numbers: 3/8 = 0.375 and 1 1/4 = 1.25 exactly (binary fractions; arithmetic).</summary>
    [Theory]
    [InlineData("3/8", 0.375)]
    [InlineData("1 1/4", 1.25)]
    [InlineData("1\u00A01/2", 1.5)]
    [InlineData("1\u20071/4", 1.25)]
    [InlineData("1\u2003 1/2", 1.5)]
    [InlineData("2\uFEFF\uFEFF3/4", 2.75)]
    public void FractionIsItsQuotient(string text, double expected) => Assert.Equal(expected, NumberText.Parse(text));

    /// <summary>
    /// The tokenizer reads a mixed number across any space it knows (a figure space, an em space),
    /// so the number must read across it too: parsing such a line used to throw.
    /// </summary>
    [Theory]
    [InlineData("x = 1\u20071/4 in\n", 1.25)]
    [InlineData("x = 1\u20031/2 in\n", 1.5)]
    public void MixedNumberAcrossAnySpaceParses(string text, double expected)
    {
        var syntax = Syntax.SheetSyntax.Parse(text);
        var definition = Assert.IsType<Syntax.Nodes.DefinitionSyntax>(Assert.Single(syntax.Statements));
        var literal = Assert.IsType<Syntax.Nodes.QuantityLiteralSyntax>(definition.Value);
        Assert.Equal(expected, literal.Number);
        Assert.True(literal.IsFraction);
    }

    /// <summary>Random digit strings with and without a point, 1 to 20 characters: the same bits as the reference.</summary>
    [Fact]
    public void AnyShortDecimalMatchesTheReference() =>
        Gen.Select(Gen.String[Gen.Char["0123456789"], 1, 18], Gen.Int[0, 19], Gen.Bool)
            .Select((digits, at, point) => point ? digits.Insert(Math.Min(at, digits.Length), ".") : digits)
            .Where(text => text != ".")
            .Sample(text =>
                BitConverter.DoubleToInt64Bits(NumberText.Parse(text)) == BitConverter.DoubleToInt64Bits(Reference(text.TrimEnd('.'))),
                iter: 20_000);

    private static double Reference(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
}
