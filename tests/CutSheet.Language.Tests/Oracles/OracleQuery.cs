namespace CutSheet.Language.Tests.Oracles;

/// <summary>One conversion asked of an external oracle: the source expression and the target unit, in that oracle's own spelling.</summary>
public sealed record OracleQuery(string Have, string Want)
{
    /// <summary>Reads <c>HAVE ⇒ WANT</c>.</summary>
    public static OracleQuery Parse(string text, string where)
    {
        int arrow = text.IndexOf(OracleCase.Into, StringComparison.Ordinal);
        if (arrow < 0) throw new FormatException($"{where}: no {OracleCase.Into} between source and target in '{text}'");
        string have = text[..arrow].Trim(), want = text[(arrow + OracleCase.Into.Length)..].Trim();
        if (have.Length == 0 || want.Length == 0) throw new FormatException($"{where}: empty source or target in '{text}'");
        return new OracleQuery(have, want);
    }

    public override string ToString() => $"{Have} {OracleCase.Into} {Want}";
}
