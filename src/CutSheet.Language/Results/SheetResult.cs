using CutSheet.Language.Diagnostics;
using CutSheet.Language.Display;
using CutSheet.Language.Syntax;

namespace CutSheet.Language.Results;

/// <summary>
/// Everything one evaluation of a sheet produced, immutable: the syntax, a result per
/// statement, every diagnostic (syntax, units, names, checks, cautions) in text order, the
/// sheet's metadata and display settings, and the versions that produced it.
/// </summary>
public sealed class SheetResult
{
    internal SheetResult(SheetSyntax syntax, IReadOnlyList<StatementResult> statements, IReadOnlyList<Diagnostic> diagnostics,
        IReadOnlyDictionary<string, string> metadata, DisplaySettings display, IReadOnlyList<string> imports, Semantics.SheetScope scope)
    {
        Scope = scope;
        Syntax = syntax;
        Statements = statements;
        Diagnostics = diagnostics;
        Metadata = metadata;
        Display = display;
        Imports = imports;
    }

    public SheetSyntax Syntax { get; }

    /// <summary>The sheet's names after evaluation (definitions with their values, functions, imports), for editor features.</summary>
    public Semantics.SheetScope Scope { get; }

    public string? Path => Syntax.Source.Path;

    public IReadOnlyList<StatementResult> Statements { get; }

    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    /// <summary><c>sheet KEY "value"</c> lines.</summary>
    public IReadOnlyDictionary<string, string> Metadata { get; }

    public DisplaySettings Display { get; }

    /// <summary>The sheets this one imports (library names with the library version, or full paths).</summary>
    public IReadOnlyList<string> Imports { get; }

    public IEnumerable<DefinitionResult> Definitions => Statements.OfType<DefinitionResult>();

    public IEnumerable<CheckResult> Checks => Statements.OfType<CheckResult>();

    public IEnumerable<CautionResult> Cautions => Statements.SelectMany(s => s.Cautions);

    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);

    /// <summary>The version of the tool and of its library sheets.</summary>
    public static string ToolVersion => typeof(SheetResult).Assembly.GetName().Version?.ToString(3) ?? "0.0.0";
}
