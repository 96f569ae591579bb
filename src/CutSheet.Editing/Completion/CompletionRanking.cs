using System.Globalization;

namespace CutSheet.Editing.Completion;

/// <summary>
/// Orders candidates and keeps the best: better matches first (a prefix in either case counts
/// as one kind of match), then by group, then a prefix in the typed case before one in another
/// case (in a sheet, <c>F</c> and <c>f</c> are different quantities), then nearer names, then
/// alphabetically. A cut list is marked incomplete so that the editor asks again
/// as more is typed; every kept entry gets a sort text that keeps this order in the editor.
/// </summary>
public static class CompletionRanking
{
    /// <summary>At most this many names are offered at once: enough to scroll, few enough to send fast.</summary>
    public const int Limit = 100;

    /// <summary>Distances of names below the cursor start here, so that every name above it ranks first.</summary>
    public const int Below = 1 << 29;

    public static CompletionResult Rank(IEnumerable<CompletionCandidate> candidates, int limit = Limit)
    {
        var all = candidates.ToList();
        all.Sort(static (a, b) =>
        {
            int c = Tier(a.Match).CompareTo(Tier(b.Match));
            if (c == 0) c = a.Group.CompareTo(b.Group);
            if (c == 0) c = a.Match.CompareTo(b.Match);
            if (c == 0) c = a.Distance.CompareTo(b.Distance);
            return c != 0 ? c : string.CompareOrdinal(a.Entry.Label, b.Entry.Label);
        });
        int kept = Math.Min(limit, all.Count);
        var items = new CompletionEntry[kept];
        for (int i = 0; i < kept; i++)
            items[i] = all[i].Entry with { SortText = i.ToString("D4", CultureInfo.InvariantCulture) };
        return new CompletionResult(items, all.Count > limit);
    }

    private static int Tier(int match) => match == CompletionMatch.PrefixOtherCase ? CompletionMatch.Prefix : match;

    /// <summary>How far a name declared at <paramref name="declared"/> is from the cursor: above first, nearest first.</summary>
    public static int Distance(int declared, int cursor) => declared <= cursor ? cursor - declared : Below + (declared - cursor);
}
