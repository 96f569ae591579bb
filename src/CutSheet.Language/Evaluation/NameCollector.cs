using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Evaluation;

/// <summary>The unqualified names an expression mentions (names, callees, table names).</summary>
internal static class NameCollector
{
    public static IEnumerable<string> Names(ExpressionSyntax root)
    {
        var stack = new Stack<ExpressionSyntax>();
        stack.Push(root);
        while (stack.Count > 0)
        {
            switch (stack.Pop())
            {
                case NameSyntax { Qualifier: null } n: yield return n.Name; break;
                case BinarySyntax b: stack.Push(b.Left); stack.Push(b.Right); break;
                case UnarySyntax u: stack.Push(u.Operand); break;
                case ConvertSyntax c: stack.Push(c.Operand); break;
                case ConditionalSyntax c: stack.Push(c.Condition); stack.Push(c.Then); stack.Push(c.Else); break;
                case ListSyntax l: foreach (var i in l.Items) stack.Push(i); break;
                case CallSyntax c:
                    if (c.Callee.Qualifier is null) yield return c.Callee.Name;
                    foreach (var a in c.Arguments) stack.Push(a.Value);
                    break;
                case LookupSyntax l:
                    if (l.Table.Qualifier is null) yield return l.Table.Name;
                    stack.Push(l.Key);
                    break;
            }
        }
    }
}
