using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Signatures;

/// <summary>A sheet function's signature as written, defaults included: <c>lead(pitch: length, starts: number = 1): length_per_revolution</c>.</summary>
public static class SignatureText
{
    public static string Of(FunctionSyntax f, SourceText? text) =>
        $"{f.Name}({string.Join(", ", Parameters(f, text))}): {f.ReturnKind}";

    public static IEnumerable<string> Parameters(FunctionSyntax f, SourceText? text) =>
        f.Parameters.Select(p => p.Default is not null && text is not null ? $"{p.Name}: {p.KindName} = {text.Slice(p.Default.Span)}" : $"{p.Name}: {p.KindName}");
}
