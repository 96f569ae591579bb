using System.Text;

namespace CutSheet.Language.Units;

/// <summary>
/// Normalises unit text copied from PDFs and datasheets: micro signs, degree signs and
/// multiplication dots each have one spelling, so <c>μm</c> and <c>µm</c>, <c>N⋅m</c>,
/// <c>N*m</c> and <c>N·m</c> are the same unit.
/// </summary>
public static class UnitText
{
    public static string Normalize(string text)
    {
        bool clean = true;
        foreach (char c in text)
        {
            if (c is 'μ' or 'º' or '˚' or '⋅' or '∙' or '*' or '•' or '−' or '\u00A0' or '\u202F') { clean = false; break; }
        }
        if (clean) return text;
        var sb = new StringBuilder(text.Length);
        foreach (char c in text)
        {
            sb.Append(c switch
            {
                'μ' => 'µ',
                'º' or '˚' => '°',
                '⋅' or '∙' or '*' or '•' => '·',
                '−' => '-',
                _ => c,
            });
        }
        return sb.ToString().Replace("\u00A0", "").Replace("\u202F", "");
    }
}
