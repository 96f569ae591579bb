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

    /// <summary>
    /// The best <paramref name="limit"/> candidates as entries; <paramref name="build"/> makes the
    /// entry of a kept candidate that carries a symbol instead of an entry.
    /// </summary>
    public static CompletionResult Rank(IEnumerable<CompletionCandidate> candidates, Func<CompletionCandidate, CompletionEntry>? build = null, int limit = Limit)
    {
        var all = candidates.ToList();
        all.Sort(static (a, b) =>
        {
            int c = Tier(a.Match).CompareTo(Tier(b.Match));
            // Compared as numbers: an enum's CompareTo takes an object and would box on every comparison.
            if (c == 0) c = ((int)a.Group).CompareTo((int)b.Group);
            if (c == 0) c = a.Match.CompareTo(b.Match);
            if (c == 0) c = a.Distance.CompareTo(b.Distance);
            return c != 0 ? c : string.CompareOrdinal(a.Label, b.Label);
        });
        int kept = Math.Min(limit, all.Count);
        var items = new CompletionEntry[kept];
        for (int i = 0; i < kept; i++)
        {
            var entry = all[i].Entry ?? build?.Invoke(all[i]) ?? throw new InvalidOperationException($"the candidate {all[i].Label} has no entry and nothing to build one");
            items[i] = entry with { SortText = i.ToString("D4", CultureInfo.InvariantCulture) };
        }
        return new CompletionResult(items, all.Count > limit);
    }

    private static int Tier(int match) => match == CompletionMatch.PrefixOtherCase ? CompletionMatch.Prefix : match;

    /// <summary>How far a name declared at <paramref name="declared"/> is from the cursor: above first, nearest first.</summary>
    public static int Distance(int declared, int cursor) => declared <= cursor ? cursor - declared : Below + (declared - cursor);
}
