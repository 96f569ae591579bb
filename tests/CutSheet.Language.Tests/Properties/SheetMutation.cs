using System.Text;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// One edit to a sheet's text, the kind a person makes while typing or a bad copy makes:
/// delete, insert or swap characters; duplicate a stretch; delete, duplicate or swap lines;
/// insert a piece of the language. Positions are taken modulo the text's length, so any
/// generated edit applies to any text.
/// </summary>
public sealed record SheetMutation(int Kind, int Position, int Other, char Character, string Piece)
{
    public const int KindCount = 8;

    public string ApplyTo(string text)
    {
        int n = text.Length;
        int p = n == 0 ? 0 : Position % n;
        int q = n == 0 ? 0 : Other % n;
        switch (Kind)
        {
            case 0: return n == 0 ? text : text.Remove(p, 1);
            case 1: return text.Insert(Position % (n + 1), Character.ToString());
            case 2:
            {
                int length = Math.Min(Other % 40 + 1, n - p);
                return n == 0 ? text : text.Insert(p + length, text.Substring(p, length));
            }
            case 3:
            {
                if (n == 0) return text;
                var chars = text.ToCharArray();
                (chars[p], chars[q]) = (chars[q], chars[p]);
                return new string(chars);
            }
            case 4 or 5 or 6:
                return EditLines(text);
            default:
                return text.Insert(Position % (n + 1), Piece);
        }
    }

    private string EditLines(string text)
    {
        var lines = Lines(text);
        if (lines.Count == 0) return text;
        int a = Position % lines.Count, b = Other % lines.Count;
        switch (Kind)
        {
            case 4: lines.RemoveAt(a); break;
            case 5: lines.Insert(a, lines[a]); break;
            default: (lines[a], lines[b]) = (lines[b], lines[a]); break;
        }
        return string.Concat(lines);
    }

    /// <summary>The lines of a text, each with its own line break, so that they concatenate back to it.</summary>
    private static List<string> Lines(string text)
    {
        var lines = new List<string>();
        var sb = new StringBuilder();
        foreach (char c in text)
        {
            sb.Append(c);
            if (c == '\n') { lines.Add(sb.ToString()); sb.Clear(); }
        }
        if (sb.Length > 0) lines.Add(sb.ToString());
        return lines;
    }

    public override string ToString() => $"({Kind}, {Position}, {Other}, {Support.CSharpLiteral.Of(Character.ToString())}, {Support.CSharpLiteral.Of(Piece)})";
}
