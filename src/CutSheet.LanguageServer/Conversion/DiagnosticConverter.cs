using CutSheet.LanguageServer.Documents;
using CutSheet.LanguageServer.Protocol;
using CutSheet.Language.Text;
using Lang = CutSheet.Language.Diagnostics;

namespace CutSheet.LanguageServer.Conversion;

/// <summary>
/// The language's diagnostics of one sheet as protocol diagnostics: errors (failed checks
/// among them) stay errors, cautions are warnings, notes are information; the code travels
/// along and related places become related information.
/// </summary>
public sealed class DiagnosticConverter(SheetLocator locator)
{
    public const string Source = "cutsheet";

    /// <summary>Only the sheet's own diagnostics: problems inside imported sheets are summarised at the <c>use</c> line by the language.</summary>
    public Diagnostic[] Convert(IEnumerable<Lang.Diagnostic> diagnostics, SourceText text, OpenDocument document, PositionMapper positions) =>
        diagnostics.Where(d => d.Path is null || d.Path == document.Path)
            .Select(d => Convert(d, text, document, positions))
            .ToArray();

    public Diagnostic Convert(Lang.Diagnostic d, SourceText text, OpenDocument document, PositionMapper positions)
    {
        var related = d.Related
            .Select(r => (r, location: locator.ToLocation(r.Path, r.Span, r.Path is null ? text : null, document, positions)))
            .Where(x => x.location is not null)
            .Select(x => new DiagnosticRelatedInformation { Location = x.location!, Message = x.r.Message })
            .ToArray();
        return new Diagnostic
        {
            Range = positions.ToRange(text, d.Span),
            Severity = d.Severity switch
            {
                Lang.Severity.Error => ProtocolNumbers.Error,
                Lang.Severity.Warning => ProtocolNumbers.Warning,
                _ => ProtocolNumbers.Information,
            },
            Code = d.Code,
            Source = Source,
            Message = d.Message,
            RelatedInformation = related.Length == 0 ? null : related,
        };
    }
}
