namespace CutSheet.Editing.Symbols;

/// <summary>What a name stands for; decides icons, token colours and what may be renamed.</summary>
public enum SymbolCategory
{
    Definition,
    Function,
    Parameter,
    Local,
    Choice,
    Option,
    Table,
    Kind,
    Namespace,
    BuiltinFunction,
    BuiltinConstant,
    BuiltinKind,
    Sheet,
}
