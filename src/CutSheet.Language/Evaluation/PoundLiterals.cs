using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

/// <summary>Finds the <c>lb</c> units behind an expression, following names back to their definitions.</summary>
internal static class PoundLiterals
{
    public static List<TextSpan> Find(ExpressionSyntax root, SheetScope scope)
    {
        var found = new List<TextSpan>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var stack = new Stack<ExpressionSyntax>();
        stack.Push(root);
        int budget = 10_000;
        while (stack.Count > 0 && budget-- > 0)
        {
            switch (stack.Pop())
            {
                case QuantityLiteralSyntax { Unit: { } u } when u.Text is "lb" or "lbs":
                    found.Add(u.Span);
                    break;
                case NameSyntax { Qualifier: null } n when seen.Add(n.Name) && scope.Definitions.TryGetValue(n.Name, out var d):
                    stack.Push(d.Syntax.Value);
                    break;
                case BinarySyntax b: stack.Push(b.Left); stack.Push(b.Right); break;
                case UnarySyntax u: stack.Push(u.Operand); break;
                case ConvertSyntax c: stack.Push(c.Operand); break;
                case ConditionalSyntax c: stack.Push(c.Then); stack.Push(c.Else); break;
                case ListSyntax l: foreach (var i in l.Items) stack.Push(i); break;
                case CallSyntax c: foreach (var a in c.Arguments) stack.Push(a.Value); break;
            }
        }
        return found;
    }
}
