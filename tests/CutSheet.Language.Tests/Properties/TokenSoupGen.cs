using CsCheck;
using CutSheet.Language.Syntax;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Random sequences of the language's own pieces — keywords, units, numbers in every written
/// form, operators, names, strings, comments, headings, indented clause lines — so that the
/// parser is driven deep into its statement grammar rather than stopping at the first token.
/// </summary>
public static class TokenSoupGen
{
    private static readonly string[] Pieces =
    [
        .. Keywords.All,
        // units, written after a number or after `as`
        "mm", "m", "in", "ft", "N", "kN", "lbf", "lb", "N·m", "N*m", "lbf·in", "rpm", "r/min", "min⁻¹", "rad/s", "Hz",
        "deg", "°", "rev", "mm/rev", "mm/tooth", "tooth", "kW", "hp", "MPa", "psi", "µm", "um", "%", "‰", "kg·m²",
        "m/s^2", "s^-1", "(N·m)/s", "t", "W", "\"", "'",
        // numbers
        "0", "1", "2", "25", "2.5", ".5", "2.", "1e3", "1.5e-3", "1E+300", "1e999", "3/8", "1 1/4", "1,5", "1,500", "0.500",
        // operators and punctuation
        "+", "-", "*", "/", "^", "²", "³", "⁻¹", "(", ")", "[", "]", ",", ":", "=", "==", "!=", "<", "<=", ">", ">=",
        ".", "|", "±", "≤", "≥", "≠", "×", "·", "−", "–", "!",
        // names
        "x", "y", "P_h", "d_0", "λ", "η'", "eta_back", "pi", "π", "g_n", "sqrt", "sum", "max", "round", "lead_angle",
        "lead", "screws", "s.lead_angle", "F_rim", "T", "n", "material", "steel", "mu",
        // text, comments, headings, line structure
        "\"text\"", "\"unterminated", "“curly”", "\"a \\\" b\"", "// remark", "# Title", "## Section",
        "\n", "\n  ", "\r\n", "\r", "\t",
    ];

    private static readonly Gen<string> Separator = Gen.OneOf("", " ", " ", " ", "  ", "\n", "\u00A0");

    public static readonly Gen<string> Text =
        Gen.Select(Gen.OneOf(Pieces), Separator).Array[0, 60]
            .Select(parts => string.Concat(parts.Select(p => p.Item1 + p.Item2)));

    /// <summary>One piece on its own, for inserting into sheets.</summary>
    public static readonly Gen<string> Piece = Gen.OneOf(Pieces);
}
