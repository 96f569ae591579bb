using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.Language.Text;

namespace CutSheet.LanguageServer.Documents;

/// <summary>Applies didChange events in order: a ranged change replaces its range; a change without a range replaces the text.</summary>
public static class TextChanges
{
    /// <summary>The new text, its line map built once; <paramref name="clamped"/> is true when a range reached past the end (applied up to the end).</summary>
    public static SourceText Apply(SourceText text, IEnumerable<TextDocumentContentChangeEvent> changes, PositionMapper positions, out bool clamped)
    {
        clamped = false;
        var current = text;
        foreach (var change in changes)
        {
            if (change.Range is null)
            {
                current = new SourceText(change.Text ?? "", text.Path);
                continue;
            }
            if (PastEnd(current, change.Range.End) || PastEnd(current, change.Range.Start)) clamped = true;
            var span = positions.ToSpan(current, change.Range);
            string updated = string.Concat(current.Text.AsSpan(0, span.Start), change.Text ?? "", current.Text.AsSpan(span.End));
            current = new SourceText(updated, text.Path);
        }
        return current;
    }

    private static bool PastEnd(SourceText text, Position p) => p.Line >= text.LineCount || p.Line < 0 || p.Character < 0;
}
