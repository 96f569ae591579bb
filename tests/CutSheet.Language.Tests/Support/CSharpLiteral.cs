using System.Globalization;
using System.Text;

namespace CutSheet.Language.Tests.Support;

/// <summary>
/// Writes a string as a C# literal with every non-printable or non-ASCII character escaped,
/// so that a failing generated input can be pasted into a regression test exactly.
/// </summary>
public static class CSharpLiteral
{
    public static string Of(string text, int max = 2000)
    {
        var sb = new StringBuilder("\"");
        int n = Math.Min(text.Length, max);
        for (int i = 0; i < n; i++)
        {
            char c = text[i];
            switch (c)
            {
                case '"': sb.Append("\\\""); break;
                case '\\': sb.Append("\\\\"); break;
                case '\n': sb.Append("\\n"); break;
                case '\r': sb.Append("\\r"); break;
                case '\t': sb.Append("\\t"); break;
                default:
                    if (c >= 0x20 && c < 0x7F) sb.Append(c);
                    else sb.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
                    break;
            }
        }
        sb.Append('"');
        if (text.Length > max) sb.Append($" /* … {text.Length - max} more characters */");
        return sb.ToString();
    }
}
