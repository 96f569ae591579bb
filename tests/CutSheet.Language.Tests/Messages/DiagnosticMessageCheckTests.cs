using CutSheet.Language.Diagnostics;
using CutSheet.Language.Units;
using M = CutSheet.Language.Diagnostics.DiagnosticMessages;

namespace CutSheet.Language.Tests.Messages;

/// <summary>
/// Messages are asserted against the one place they live (ARCHITECTURE.md, after NodaTime: "all
/// error messages in one place and asserted by tests"): for each erroneous sheet, the diagnostic
/// with the expected code carries exactly the text DiagnosticMessages produces for the
/// arguments a reader would name — the character, the literal as written, the names, the units
/// and dimensions involved (chosen by hand here, not read back from the result).
/// </summary>
public class DiagnosticMessageCheckTests
{
    private static readonly Dimension L = Dimension.FromSi(1, 0, 0);
    private static readonly Dimension Mass = Dimension.FromSi(0, 1, 0);
    private static readonly Dimension Force = Dimension.FromSi(1, 1, -2);

    private static readonly DiagnosticMessageCase[] All =
    [
        // Syntax
        new("unexpected character", "x = 2 § 3\n", DiagnosticCodes.UnexpectedCharacter, M.UnexpectedCharacter("§")),
        new("diameter sign before a number", "d = Ø20 mm\n", DiagnosticCodes.UnexpectedCharacter, M.DiameterSign("Ø")),
        new("digits grouped with spaces", "n = 1 500 rpm\n", DiagnosticCodes.UnexpectedToken, M.SpacedDigits("1 500", "1500")),
        new("statement word mistyped", "x = 3 mm\nchek x <= 5 mm\n", DiagnosticCodes.NotAStatement, M.MistypedStatementWord("chek", "check")),
        new("statement word capitalised", "x = 3 mm\nCheck x <= 5 mm\n", DiagnosticCodes.NotAStatement, M.MistypedStatementWord("Check", "check")),
        new("single equals in a check", "x = 3 mm\ncheck x = 5 mm\n", DiagnosticCodes.UnexpectedToken, M.CheckOperator("=", "==")),
        new("swapped halves in a check", "x = 3 mm\ncheck x => 5 mm\n", DiagnosticCodes.UnexpectedToken, M.CheckOperator("=>", ">=")),
        new("parted halves in a check", "x = 3 mm\ncheck x < = 5 mm\n", DiagnosticCodes.UnexpectedToken, M.CheckOperator("< =", "<=")),
        new("parameter without its kind", "f(x) = x * 2\n", DiagnosticCodes.UnexpectedToken, M.ParameterWithoutKind),
        new("function without its return kind", "g(x: length) = x * 2\n", DiagnosticCodes.UnexpectedToken, M.FunctionWithoutReturnKind),
        new("named argument with equals inside a check", "use screws\ncheck lead_angle(lead = 5 mm/rev, d: 16 mm) <= 10 deg\n", DiagnosticCodes.UnexpectedToken, M.NamedArgumentEquals("lead")),
        new("named argument with equals", "use screws\nP_h = lead(pitch = 5 mm)\n", DiagnosticCodes.UnexpectedToken, M.NamedArgumentEquals("pitch")),
        new("choice options with commas", "choice mode = climb, conventional\n", DiagnosticCodes.UnexpectedToken, M.ChoiceCommas),
        new("library named with its extension", "use screws.cutsheet\n", DiagnosticCodes.UnexpectedToken, M.UseWithExtension("screws.cutsheet", "screws")),
        new("workspace sheet without quotes", "use shared/axis.cutsheet\n", DiagnosticCodes.UnexpectedToken, M.UseWithExtension("shared/axis.cutsheet", "\"shared/axis.cutsheet\"")),
        new("import written another way", "import screws\n", DiagnosticCodes.NotAStatement, M.MistypedStatementWord("import", "use")),
        new("unexpected token", "sheet 5 \"x\"\n", DiagnosticCodes.UnexpectedToken, M.Unexpected("number 5", "name")),
        new("unterminated string", "x = \"abc\n", DiagnosticCodes.UnterminatedString, M.UnterminatedString),
        new("inch mark", "d = 0.500\"\n", DiagnosticCodes.InchMark, M.InchMark),
        new("foot mark", "L = 2'\n", DiagnosticCodes.FootMark, M.FootMark),
        new("decimal comma", "x = 1,5 mm\n", DiagnosticCodes.DecimalComma, M.DecimalComma("1,5", "1.5")),
        new("comma or thousands separator", "x = 1,500 mm\n", DiagnosticCodes.DecimalComma, M.DecimalComma("1,500", null)),
        new("unclosed bracket", "x = (2 + 3\n", DiagnosticCodes.UnbalancedBracket, M.UnbalancedBracket),
        new("statement ends early", "sheet title\n", DiagnosticCodes.IncompleteStatement, M.Incomplete("expected text in quotes")),
        new("nested too deeply", "x = " + new string('(', 65) + "1" + new string(')', 65) + "\n", DiagnosticCodes.NestingTooDeep, M.NestingTooDeep),
        new("not a statement", "5 mm + 3\n", DiagnosticCodes.NotAStatement, M.NotAStatement),
        new("clause not allowed", "check 1 mm <= 2 mm assumed\n", DiagnosticCodes.ClauseNotAllowed, M.ClauseNotAllowed("assumed", "a check")),
        new("unit without number", "x = 2 mm\ny = x mm\n", DiagnosticCodes.UnitWithoutNumber, M.UnitWithoutNumber),
        new("tolerance with plus-minus", "mu = 0.08 ± 0.02\n", DiagnosticCodes.UnexpectedToken, M.PlusMinusNotYet),
        new("feet and inches side by side", "h = 5 ft 3 in\n", DiagnosticCodes.UnexpectedToken, M.SideBySide("5 ft", "3 in", sameDimension: true)),
        new("force and length side by side", "M = 2 kN 0.5 m\n", DiagnosticCodes.UnexpectedToken, M.SideBySide("2 kN", "0.5 m", sameDimension: false)),

        // Units and kinds
        new("name after a number", "x = 2 pi\n", DiagnosticCodes.NameAfterNumber, M.NameAfterNumber("pi")),
        new("a name after as", "d_0 = 5 mm\nx = 2 mm as d_0\n", DiagnosticCodes.NameAfterNumber, M.NameAfterAs("d_0", isKind: false, example: null)),
        new("a kind after as", "T = 5 N*m as torque\n", DiagnosticCodes.NameAfterNumber, M.NameAfterAs("torque", isKind: true, example: "N·m")),
        new("unit also a name", "W = 200 lbf\nx = 2 W\n", DiagnosticCodes.UnitAlsoName, M.UnitAlsoName("W")),
        new("unknown one-letter unit", "x = 1000 U/min\n", DiagnosticCodes.UnknownUnit, M.UnknownUnit("U")),
        new("unknown unit near a known one", "x = 3 inchs\n", DiagnosticCodes.UnknownUnit, M.UnknownUnitWithSuggestion("inchs", "inch")),
        new("unit exponent out of range", "x = 1 m^13\n", DiagnosticCodes.MalformedUnit, M.BadUnitExponent(13)),
        new("negative unit exponent out of range", "x = 1 m^-13\n", DiagnosticCodes.MalformedUnit, M.BadUnitExponent(-13)),
        new("add length and mass", "x = 5 mm + 2 kg\n", DiagnosticCodes.DimensionMismatch, M.DimensionMismatch("add", "5 mm", L, "2 kg", Mass)),
        new("compare length and mass", "x = 5 mm <= 3 kg\n", DiagnosticCodes.ComparisonMismatch, M.ComparisonMismatch("5 mm", L, "3 kg", Mass)),
        new("show a length as a force", "x = 5 mm as N\n", DiagnosticCodes.ConversionMismatch, M.ConversionMismatch("5 mm", L, "N", Force)),
        new("fractional dimension", "x = (2 m)^0.5\n", DiagnosticCodes.NonIntegerExponent, M.NonIntegerExponent("2 m", "0.5000")),
        new("exponent with a unit", "x = 2^(1 mm)\n", DiagnosticCodes.ExponentNotDimensionless, M.ExponentNotDimensionless("1 mm")),
        new("revolutions against radians", "x = 1000 rpm + 1 rad/s\n", DiagnosticCodes.RotationKindMix, M.RotationKindMix("1000 rpm", "1 rad/s")),
        new("rad/s as Hz", "x = 1 rad/s as Hz\n", DiagnosticCodes.AngleWithout2Pi, M.AngleDropped),
        new("lead plus pitch", "P_h = 5 mm/rev\nP = 5 mm\nx = P_h + P\n", DiagnosticCodes.CountMix, M.CountMix("P_h in mm/rev", "P in mm")),
        new("torque plus energy", "x = 10 N·m + 5 J\n", DiagnosticCodes.KindMismatch, M.KindMismatch("add", "torque", "energy")),
        new("torque times rpm", "T = 10 N·m\nn = 100 rpm\nP = T * n as W\n", DiagnosticCodes.TorqueTimesRpm, M.TorqueTimesRpm),
        new("rpm times length", "n = 1000 rpm\nD = 20 mm\nv = n * D / 2 as m/min\n", DiagnosticCodes.RpmTimesLength, M.RpmTimesLength),
        new("per revolution times angle", "P_h = 5 mm/rev\ntheta = 90 deg\nx = P_h * theta as mm\n", DiagnosticCodes.PerRevTimesAngle, M.PerRevTimesAngle),
        new("override of another dimension", "use ballscrews with (E_steel = 206 mm)\n", DiagnosticCodes.OverrideMismatch,
            M.OverrideDimension("E_steel", Dimension.FromSi(-1, 1, -2), L)),
        new("min of a length and a force", "S = min(1 mm, 2 N)\n", DiagnosticCodes.DimensionMismatch, M.DimensionMismatch("compare", "a value in mm", L, "a value in N", Force)),
        new("torque shown in J", "T = 10 N·m\nx = T as J\n", DiagnosticCodes.TorqueAsEnergy, M.TorqueAsEnergy),
        // 45 rad = 45 × 180/π degrees = 2578.3° (the SI definition of the radian).
        new("plain number as radians", "x = sin(45)\n", DiagnosticCodes.PlainNumberAsRadians, M.PlainNumberAsRadians("sin", "45", 45 * 180 / Math.PI)),

        // Names and functions
        new("unknown name", "x = zeta_q\n", DiagnosticCodes.UnknownName, M.UnknownName("zeta_q", null)),
        new("function named by the start of another", "use screws\nm = self_locking(d_m: 18 mm, lead: 4 mm/rev, f: 0.1)\n", DiagnosticCodes.UnknownFunction, M.UnknownFunction("self_locking", "self_locking_margin")),
        new("function whose name contains another", "use screws\nd_2 = trapezoidal_mean_diameter(d: 20 mm, pitch: 4 mm)\n", DiagnosticCodes.UnknownFunction, M.UnknownFunction("trapezoidal_mean_diameter", "mean_diameter")),
        new("library function not imported", "T = backdrive_torque(F: 1 kN, lead: 5 mm/rev, eta: 0.9)\n", DiagnosticCodes.UnknownFunction, M.InLibrary("backdrive_torque", "ballscrews")),
        new("library function misspelt, not imported", "lam = lead_angel(lead: 5 mm/rev, d: 16 mm)\n", DiagnosticCodes.UnknownFunction, M.UnknownFunctionInLibrary("lead_angel", "lead_angle", "screws")),
        new("library name under an alias", "use ballscrews as b\nE = E_steel\n", DiagnosticCodes.UnknownName, M.ImportedUnderAlias("E_steel", "ballscrews", "b")),
        new("short unknown name, no guess", "x = 1\ny = c\n", DiagnosticCodes.UnknownName, M.UnknownName("c", null)),
        new("short name in another case", "F = 1 N\ny = f\n", DiagnosticCodes.UnknownName, M.UnknownName("f", "F")),
        new("the definition being written is not suggested", "rate = rat\n", DiagnosticCodes.UnknownName, M.UnknownName("rat", null)),
        new("unknown name with suggestion", "F_rim = 1 N\nx = F_rin\n", DiagnosticCodes.UnknownName, M.UnknownName("F_rin", "F_rim")),
        new("used before definition", "a = b\nb = 1\n", DiagnosticCodes.UsedBeforeDefinition, M.UsedBeforeDefinition("b", 1, 2)),
        new("defined twice", "x = 1\nx = 2\n", DiagnosticCodes.Redefinition, M.Redefinition("x", 1)),
        new("unknown argument", "f(a: length): length = a\nx = f(b: 1 mm)\n", DiagnosticCodes.ArgumentList, M.UnknownArgument("f", "b")),
        new("missing argument", "f(a: length, c: length): length = a\nx = f(a: 1 mm)\n", DiagnosticCodes.ArgumentList, M.MissingArgument("f", "c")),
        new("argument given twice", "f(a: length): length = a\nx = f(a: 1 mm, a: 2 mm)\n", DiagnosticCodes.ArgumentList, M.DuplicateArgument("f", "a")),
        new("too many arguments", "f(a: length): length = a\nx = f(1 mm, 2 mm)\n", DiagnosticCodes.ArgumentList, M.TooManyArguments("f", 1)),
        new("positional after named", "f(a: length, c: length): length = a\nx = f(a: 1 mm, 2 mm)\n", DiagnosticCodes.ArgumentList, M.PositionalAfterNamed),
        new("recursion", "f(a: length): length = f(a: a)\n", DiagnosticCodes.Recursion, M.Recursion("f")),
        new("unknown kind", "f(a: lenght): length = a\n", DiagnosticCodes.UnknownKind, M.UnknownKind("lenght", "length")),
        new("a value called", "x = 1\ny = x(2)\n", DiagnosticCodes.NotAFunction, M.NotAFunction("x")),
        new("bad display setting", "display colour red\n", DiagnosticCodes.BadSetting, M.BadSetting("colour", "'display units …' or 'display digits …'")),
        new("bad display digits", "display digits 99\n", DiagnosticCodes.BadSetting, M.BadSetting("99", "a whole number of significant figures from 1 to 15")),
        new("unknown column", "choice material = steel | bronze\ntable mu(material)\n  row steel: typical = 0.1\nx = mu[steel].nope\n",
            DiagnosticCodes.UnknownColumn, M.UnknownColumn("nope", "mu")),
        new("row for no option", "choice material = steel | bronze\ntable mu(material)\n  row brass: typical = 0.1\n",
            DiagnosticCodes.UnknownChoiceValue, M.UnknownChoiceValue("brass", "material")),

        // Checks and cautions
        new("check failed", "check 30 N <= 25 N\n", DiagnosticCodes.CheckFailed,
            M.CheckFailed("30.00 N <= 25.00 N does not hold (utilisation 120 %, margin -5.000 N)")), // 30/25 = 120 %; 25 − 30 = −5 N [calc]
        new("check not evaluated", "check y <= 1 mm\n", DiagnosticCodes.CheckNotEvaluated, M.CheckNotEvaluated),
        new("not a comparison", "check 5 mm\n", DiagnosticCodes.NotAComparison, M.NotAComparison),
        new("nothing to accept", "x = 1 mm accepted \"r\"\n", DiagnosticCodes.NothingToAccept, M.NothingToAccept),
        // the signal word leads the message (ISO 3864-2), then the sheet's text
        new("accepted caution", "caution \"lock the axis\" when 1 > 0 accepted \"gib lock\"\n", DiagnosticCodes.CautionAccepted,
            M.CautionAccepted("CAUTION: lock the axis", "gib lock")),
        new("outside validity", "f(a: length): length = a\n  valid a <= 1 m \"fitted range\"\ny = f(a: 2 m)\n", DiagnosticCodes.OutsideValidity,
            "CAUTION: " + M.OutsideValidity("f", "a <= 1 m", "fitted range")),

        // Evaluation
        new("division by zero", "x = 1 / 0\n", DiagnosticCodes.DivisionByZero, M.DivisionByZero),
        new("not finite", "x = 10^400\n", DiagnosticCodes.NotFinite, M.NotFinite),
        new("square root of a negative", "x = sqrt(-4)\n", DiagnosticCodes.DomainError, M.DomainError("sqrt", "the square root of a negative value has no real value")),
        new("requirement failed", "f(a: length): length = a\n  require a > 0 mm \"positive\"\ny = f(a: -1 mm)\n", DiagnosticCodes.RequirementFailed,
            M.RequirementFailed("f", "a > 0 mm", "positive")),
        new("lists of different lengths", "x = [1, 2] + [1, 2, 3]\n", DiagnosticCodes.ListMismatch, M.ListMismatch(2, 3)),
        new("condition not boolean", "x = if 1 mm then 1 else 2\n", DiagnosticCodes.TypeMismatch, M.TypeMismatch("true or false", "a quantity")),
        new("calls nested too deep", "f0(a: length): length = a\n" + string.Concat(Enumerable.Range(1, 40).Select(i => $"f{i}(a: length): length = f{i - 1}(a: a)\n")) + "x = f40(a: 1 mm)\n",
            DiagnosticCodes.LimitExceeded, M.LimitExceeded("calls nested more than 32 deep")),
    ];

    public static TheoryData<string> Cases => new(All.Select(c => c.Name));

    [Theory, MemberData(nameof(Cases))]
    public void MessageIsTheOneInDiagnosticMessages(string name)
    {
        var c = All.Single(x => x.Name == name);
        var result = SheetRunner.Run(c.Sheet);
        var withCode = result.Diagnostics.Where(d => d.Code == c.Code).Select(d => d.Message).ToList();
        Assert.True(withCode.Count > 0, $"{name}: no {c.Code}; got [{string.Join("; ", result.Diagnostics.Select(d => $"{d.Code} {d.Message}"))}]");
        Assert.Contains(c.Message, withCode);
    }

    /// <summary>Every case has its own name, so each shows (and fails) on its own.</summary>
    [Fact]
    public void CaseNamesAreUnique() => Assert.Equal(All.Length, All.Select(c => c.Name).Distinct().Count());
}
