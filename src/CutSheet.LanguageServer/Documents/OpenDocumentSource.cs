using CutSheet.Language.Evaluation;

namespace CutSheet.LanguageServer.Documents;

/// <summary>Imports read the editor's text of open sheets (unsaved edits included) and the disk for the rest.</summary>
public sealed class OpenDocumentSource(DocumentStore documents) : ISheetSource
{
    public string? Read(string fullPath) => documents.FindByPath(fullPath)?.Text.Text ?? FileSheetSource.Instance.Read(fullPath);

    public string ResolveLinks(string fullPath) => FileSheetSource.Instance.ResolveLinks(fullPath);
}
