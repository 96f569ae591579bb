using CsCheck;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Sheets that follow the grammar, so that evaluation — not only parsing — is exercised in
/// depth: definitions with units and `as`, functions with kinds, defaults and clause lines
/// (require, valid, where, cautions), calls with named and positional arguments, choices,
/// tables and lookups, lists, conditionals, checks and cautions. Names, kinds and units are
/// drawn from small pools so that statements refer to each other — and sometimes to
/// something undefined, of the wrong kind or of a kind that does not exist.
/// </summary>
public static class SheetGrammarGen
{
    private static readonly string[] Names = ["a", "b", "c", "F", "T", "n", "d_0", "P_h", "mu", "x"];
    private static readonly string[] Functions = ["f", "g", "h"];
    private static readonly string[] Parameters = ["p", "q"];
    private static readonly string[] Kinds = ["length", "force", "torque", "number", "plane_angle", "length_per_revolution", "rotational_frequency", "list", "boolean", "material", "lenx"];
    private static readonly string[] Units = ["mm", "m", "in", "N", "kN", "lbf", "N·m", "rpm", "rad/s", "deg", "rev", "mm/rev", "s", "kg", "lb", "%", "1/min"];
    private static readonly string[] Numbers = ["0", "1", "2", "2.5", "0.1", "1e3", "3/8", "-1", "1e-9", "1e300"];
    private static readonly string[] Builtins = ["sqrt", "abs", "min", "max", "sum", "sin", "atan", "round", "mean", "count"];
    private static readonly string[] Comparisons = ["<=", ">=", "<", ">", "==", "!="];
    private static readonly string[] Operators = ["+", "-", "*", "/", "^"];

    private static Gen<string> Literal =>
        Gen.Select(Gen.OneOf(Numbers), Gen.OneOf(Units), Gen.Int[0, 3], (n, u, plain) => plain == 0 ? n : n + " " + u);

    private static Gen<string> Name => Gen.OneOf([.. Names, .. Parameters, "pi", "g_n", "steel", "bronze", "nothing"]);

    private static Gen<string> Expression(int depth)
    {
        if (depth <= 0) return Gen.Frequency((3, Literal), (3, Name), (1, Gen.OneOf("true", "false")));
        var sub = Gen.Const(0).SelectMany(_ => Expression(depth - 1));
        return Gen.Frequency(
            (3, Literal),
            (3, Name),
            (4, Gen.Select(sub, Gen.OneOf(Operators), sub, (l, op, r) => $"{l} {op} {r}")),
            (1, Gen.Select(sub, Gen.OneOf(Comparisons), sub, (l, op, r) => $"{l} {op} {r}")),
            (2, sub.Select(e => $"({e})")),
            (1, sub.Select(e => $"-{e}")),
            (1, Gen.Select(sub, Gen.OneOf(Units), (e, u) => $"{e} as {u}")),
            (2, Gen.Select(Gen.OneOf(Builtins), sub.Array[0, 3], (fn, args) => $"{fn}({string.Join(", ", args)})")),
            (2, Gen.Select(Gen.OneOf(Functions), Gen.Select(Gen.OneOf(Parameters), sub, Gen.Bool).Array[0, 3],
                (fn, args) => $"{fn}({string.Join(", ", args.Select(a => a.Item3 ? $"{a.Item1}: {a.Item2}" : a.Item2))})")),
            (1, Gen.Select(sub, sub, sub, (c, a, b) => $"if {c} then {a} else {b}")),
            (1, sub.Array[0, 4].Select(items => $"[{string.Join(", ", items)}]")),
            (1, Gen.Select(Gen.OneOf("steel", "bronze", "brass"), Gen.OneOf("typical", "static", "nope"), (k, col) => $"mu_table[{k}].{col}")));
    }

    private static readonly Gen<string> Expr = Expression(3);

    private static readonly Gen<string> Clause = Gen.Frequency(
        (2, Gen.Const("  assumed")),
        (2, Gen.Const("  source \"handbook\"")),
        (1, Gen.Const("  accepted \"reviewed\"")),
        (2, Expr.Select(e => $"  require {e} \"why\"")),
        (2, Expr.Select(e => $"  valid {e}")),
        (2, Gen.Select(Gen.OneOf(Names), Expr, (n, e) => $"  where {n} = {e}")),
        (2, Gen.Select(Gen.OneOf("caution", "notice", "warning"), Expr, (l, e) => $"  {l} \"hazard\" when {e}")));

    // Defaults include calls, so recursion through defaults (once a hang) is exercised too.
    private static readonly Gen<string> Parameter =
        Gen.Select(Gen.OneOf(Parameters), Gen.OneOf(Kinds), Gen.Frequency((3, Expression(0)), (1, Gen.OneOf(Functions).Select(fn => fn + "()"))), Gen.Int[0, 2],
            (p, k, d, hasDefault) => hasDefault == 0 ? $"{p}: {k} = {d}" : $"{p}: {k}");

    private static readonly Gen<string> Statement = Gen.Frequency(
        (8, Gen.Select(Gen.OneOf(Names), Expr, Gen.Frequency((3, Gen.Const("")), (1, Gen.OneOf(Units).Select(u => " as " + u))),
            Gen.OneOf("", "", " assumed", " source \"s\"", " accepted \"r\"", " // a description"),
            (n, e, conv, clause) => $"{n} = {e}{conv}{clause}")),
        (3, Gen.Select(Gen.OneOf(Functions), Parameter.Array[0, 2], Gen.OneOf(Kinds), Expr, Clause.Array[0, 3],
            (fn, ps, k, body, clauses) => $"{fn}({string.Join(", ", ps)}): {k} = {body}" + string.Concat(clauses.Select(c => "\n" + c)))),
        (3, Gen.Select(Expr, Gen.OneOf(Comparisons), Expr, Gen.Frequency((3, Gen.Const("")), (1, Expr.Select(t => " within " + t))),
            Gen.OneOf("", " accepted \"r\""), (l, op, r, w, acc) => $"check {l} {op} {r}{w}{acc}")),
        (2, Gen.Select(Gen.OneOf("caution", "notice", "warning"), Expr, Gen.OneOf("", " accepted \"r\""), (l, e, acc) => $"{l} \"hazard\" when {e}{acc}")),
        (1, Gen.Const("choice material = steel | bronze")),
        (1, Gen.Const("table mu_table(material)\n  row steel: typical = 0.12 from 0.1 to 0.15, static = 0.15\n  row bronze: typical = 0.08")),
        (1, Gen.OneOf("use screws", "use screws as s", "use nothere", "display units inch", "display units both", "display digits 2", "display digits 15", "sheet title \"t\"", "## Section")));

    public static readonly Gen<string> Sheet = Statement.Array[1, 12].Select(s => string.Join("\n", s) + "\n");
}
