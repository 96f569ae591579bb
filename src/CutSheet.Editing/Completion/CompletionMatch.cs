namespace CutSheet.Editing.Completion;

/// <summary>
/// How well a name fits what has been typed, lower is better: the whole name, a prefix in the
/// same case, a prefix in another case, or the typed letters in order starting with the first
/// (so <c>Fax</c> finds <c>F_axial</c>). Names that fit none of these are not offered.
/// </summary>
public static class CompletionMatch
{
    public const int None = -1;
    public const int Exact = 0;
    public const int Prefix = 1;
    public const int PrefixOtherCase = 2;
    public const int Scattered = 3;

    /// <summary>The fit of <paramref name="name"/> to <paramref name="typed"/>, or <see cref="None"/>.</summary>
    public static int Of(string typed, string name)
    {
        if (typed.Length == 0) return Prefix;
        if (typed.Length > name.Length) return None;
        if (name.StartsWith(typed, StringComparison.Ordinal)) return typed.Length == name.Length ? Exact : Prefix;
        if (name.StartsWith(typed, StringComparison.OrdinalIgnoreCase)) return typed.Length == name.Length ? Exact : PrefixOtherCase;
        if (!Same(typed[0], name[0])) return None;
        int at = 1;
        for (int i = 1; i < typed.Length; i++)
        {
            while (at < name.Length && !Same(typed[i], name[at])) at++;
            if (at == name.Length) return None;
            at++;
        }
        return Scattered;
    }

    private static bool Same(char a, char b) => a == b || char.ToUpperInvariant(a) == char.ToUpperInvariant(b);
}
