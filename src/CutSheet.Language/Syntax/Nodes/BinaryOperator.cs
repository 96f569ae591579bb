namespace CutSheet.Language.Syntax.Nodes;

public enum BinaryOperator
{
    Add, Subtract, Multiply, Divide, Power,
    Equal, NotEqual, Less, LessEqual, Greater, GreaterEqual,
    And, Or,
}
