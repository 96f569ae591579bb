using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Library;

/// <summary>
/// Which library sheet declares a name, so that a sheet calling <c>backdrive_torque</c> without
/// <c>use ballscrews</c> is told where the function lives. Built once per process from the
/// library sheets' syntax (no evaluation); a name declared by two libraries maps to the first
/// in alphabetical order.
/// </summary>
internal static class LibraryIndex
{
    private static readonly Lazy<Dictionary<string, string>> Declaring = new(Build);

    /// <summary>The library sheet that declares <paramref name="name"/>, or null.</summary>
    public static string? LibraryDeclaring(string name) => Declaring.Value.GetValueOrDefault(name);

    private static Dictionary<string, string> Build()
    {
        var index = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var library in LibrarySheets.Names)
        {
            if (LibrarySheets.Syntax(library) is not { } syntax) continue;
            foreach (var statement in syntax.Statements)
            {
                switch (statement)
                {
                    case DefinitionSyntax d: index.TryAdd(d.Name, library); break;
                    case FunctionSyntax f: index.TryAdd(f.Name, library); break;
                    case TableSyntax t: index.TryAdd(t.Name, library); break;
                    case KindDeclarationSyntax k: index.TryAdd(k.Name, library); break;
                    case ChoiceSyntax c:
                        index.TryAdd(c.Name, library);
                        foreach (var (option, _) in c.Options) index.TryAdd(option, library);
                        break;
                }
            }
        }
        return index;
    }
}
