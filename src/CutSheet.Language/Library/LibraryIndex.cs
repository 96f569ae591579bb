using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Library;

/// <summary>
/// Which library sheet declares a name, so that a sheet calling <c>backdrive_torque</c> without
/// <c>use ballscrews</c> is told where the function lives, and an editor can offer the name with
/// its import. Built once per process from the library sheets' syntax (no evaluation); a name
/// declared by two libraries belongs to the first in alphabetical order.
/// </summary>
public static class LibraryIndex
{
    private static readonly Lazy<(Dictionary<string, LibraryName> ByName, LibraryName[] All)> Index = new(Build);

    /// <summary>Every name the library sheets declare, in library then text order.</summary>
    public static IReadOnlyList<LibraryName> All => Index.Value.All;

    /// <summary>The library sheet that declares <paramref name="name"/>, or null.</summary>
    public static string? LibraryDeclaring(string name) => Index.Value.ByName.GetValueOrDefault(name)?.Library;

    private static (Dictionary<string, LibraryName>, LibraryName[]) Build()
    {
        var byName = new Dictionary<string, LibraryName>(StringComparer.Ordinal);
        var all = new List<LibraryName>();
        void Add(string name, string library, LibraryNameKind kind)
        {
            var entry = new LibraryName(name, library, kind);
            if (byName.TryAdd(name, entry)) all.Add(entry);
        }
        foreach (var library in LibrarySheets.Names)
        {
            if (LibrarySheets.Syntax(library) is not { } syntax) continue;
            foreach (var statement in syntax.Statements)
            {
                switch (statement)
                {
                    case DefinitionSyntax d: Add(d.Name, library, LibraryNameKind.Value); break;
                    case FunctionSyntax f: Add(f.Name, library, LibraryNameKind.Function); break;
                    case TableSyntax t: Add(t.Name, library, LibraryNameKind.Table); break;
                    case KindDeclarationSyntax k: Add(k.Name, library, LibraryNameKind.Kind); break;
                    case ChoiceSyntax c:
                        Add(c.Name, library, LibraryNameKind.Choice);
                        foreach (var (option, _) in c.Options) Add(option, library, LibraryNameKind.Option);
                        break;
                }
            }
        }
        return (byName, all.ToArray());
    }
}

/// <summary>A name a library sheet declares, the library, and what the name is.</summary>
public sealed record LibraryName(string Name, string Library, LibraryNameKind Kind);

/// <summary>What a library name stands for.</summary>
public enum LibraryNameKind { Value, Function, Table, Choice, Option, Kind }
