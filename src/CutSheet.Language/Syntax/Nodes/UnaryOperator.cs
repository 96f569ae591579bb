namespace CutSheet.Language.Syntax.Nodes;

public enum UnaryOperator { Negate, Plus, Not }
