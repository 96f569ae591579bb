using System.Runtime.CompilerServices;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Evaluation;

/// <summary>Whether a formula mentions π: a product that contains it is taken to carry its 2π already.</summary>
internal static class PiScanner
{
    private static readonly ConditionalWeakTable<FunctionSymbol, object> FunctionCache = new();

    public static bool Mentions(FunctionSymbol fn) =>
        (bool)FunctionCache.GetValue(fn, f => Mentions(f.Syntax.Body) || f.Syntax.Clauses.Locals.Any(l => Mentions(l.Value)));

    public static bool Mentions(ExpressionSyntax root)
    {
        var stack = new Stack<ExpressionSyntax>();
        stack.Push(root);
        while (stack.Count > 0)
        {
            switch (stack.Pop())
            {
                case NameSyntax n when n.Name is "pi" or "π" or "tau" or "τ": return true;
                case BinarySyntax b: stack.Push(b.Left); stack.Push(b.Right); break;
                case UnarySyntax u: stack.Push(u.Operand); break;
                case ConvertSyntax c: stack.Push(c.Operand); break;
                case ConditionalSyntax c: stack.Push(c.Condition); stack.Push(c.Then); stack.Push(c.Else); break;
                case ListSyntax l: foreach (var i in l.Items) stack.Push(i); break;
                case CallSyntax c: foreach (var a in c.Arguments) stack.Push(a.Value); break;
                case LookupSyntax l: stack.Push(l.Key); break;
            }
        }
        return false;
    }
}
