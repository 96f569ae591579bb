using CsCheck;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Any text at all, weighted towards what breaks lexers: the language's own punctuation,
/// the look-alike characters it normalises (µ, °, ·, −, superscripts, no-break spaces),
/// lone surrogates, control characters and line breaks of every style; plus any UTF-16 unit.
/// </summary>
public static class AnyTextGen
{
    private static readonly Gen<char> Syntax = Gen.Char["0123456789 .,+-*/^()[]=<>!:|\"'#\n\r\t_abcmNxyzeE"];

    private static readonly Gen<char> LookAlikes =
        Gen.Char["µμ°º˚·⋅∙×−–²³⁻¹⁰″′“”±≤≥≠λη\u00A0\u202F\u2009\u2007\u200B\uFEFF\u0085\u2028\u2029"];

    private static readonly Gen<char> Surrogate = Gen.Char['\uD800', '\uDFFF'];

    private static readonly Gen<char> Control = Gen.Char['\0', '\u001F'];

    public static readonly Gen<char> Char =
        Gen.Frequency((8, Syntax), (3, LookAlikes), (1, Surrogate), (1, Control), (2, Gen.Char));

    public static readonly Gen<string> Text = Char.Array[0, 120].Select(a => new string(a));
}
