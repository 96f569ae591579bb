namespace CutSheet.Editing.Highlighting;

/// <summary>How a piece of the sheet is coloured. Units are a category of their own, apart from names.</summary>
public enum HighlightCategory
{
    Keyword, Number, Unit, String, Comment, Heading, Operator,
    Definition, Function, Parameter, Local, Choice, Option, Table, Kind, Namespace, Constant,
}

[Flags]
public enum HighlightModifiers { None = 0, Declaration = 1, Builtin = 2, Library = 4 }
