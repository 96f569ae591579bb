namespace CutSheet.Language.Evaluation;

/// <summary>
/// The built-in constants and functions, read-only, for editor features (completion, hover,
/// signature help) that must list exactly what the evaluator knows.
/// </summary>
public static class BuiltinCatalog
{
    /// <summary>Name, signature and one-line description of each built-in function.</summary>
    public static IReadOnlyList<(string Name, string Signature, string Description)> Functions => Builtins.Functions;

    /// <summary>The built-in constants (<c>pi</c>, <c>π</c>, <c>g_n</c>) with their values in SI.</summary>
    public static IReadOnlyDictionary<string, Quantity> Constants => Builtins.Constants;
}
