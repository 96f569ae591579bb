using System.Globalization;

namespace CutSheet.Cli.Rendering;

/// <summary>The number of terminal columns text takes, counted in user-perceived characters (so "µ" and "·" count one).</summary>
internal static class DisplayWidth
{
    public static int Of(string text)
    {
        bool ascii = true;
        foreach (char c in text)
        {
            if (c >= 0x80) { ascii = false; break; }
        }
        return ascii ? text.Length : new StringInfo(text).LengthInTextElements;
    }

    public static string PadRight(string text, int width) => text + new string(' ', Math.Max(0, width - Of(text)));

    public static string PadLeft(string text, int width) => new string(' ', Math.Max(0, width - Of(text))) + text;
}
