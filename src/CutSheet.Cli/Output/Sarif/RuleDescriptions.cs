using CutSheet.Language.Diagnostics;

namespace CutSheet.Cli.Output.Sarif;

/// <summary>
/// One-line descriptions of the diagnostic codes, for SARIF rules. The language publishes the codes
/// (<see cref="DiagnosticCodes"/>) but no description per code; until it does, this table supplies them,
/// and a test fails when a code is added to the language without an entry here.
/// </summary>
internal static class RuleDescriptions
{
    private static readonly Dictionary<string, string> Descriptions = new(StringComparer.Ordinal)
    {
        // Syntax
        [DiagnosticCodes.UnexpectedCharacter] = "A character that is not part of the language",
        [DiagnosticCodes.UnexpectedToken] = "Unexpected text in a statement",
        [DiagnosticCodes.UnterminatedString] = "Quoted text not closed before the end of the line",
        [DiagnosticCodes.InchMark] = "Inch mark (\") instead of the unit in",
        [DiagnosticCodes.FootMark] = "Foot mark (') instead of the unit ft",
        [DiagnosticCodes.DecimalComma] = "Decimal comma or thousands separator in a number",
        [DiagnosticCodes.UnbalancedBracket] = "Bracket not closed in a statement",
        [DiagnosticCodes.IncompleteStatement] = "Statement ends early",
        [DiagnosticCodes.NestingTooDeep] = "Expression nested too deeply",
        [DiagnosticCodes.NotAStatement] = "Line is not a statement",
        [DiagnosticCodes.ClauseNotAllowed] = "Clause not allowed on this statement",
        [DiagnosticCodes.UnitWithoutNumber] = "Unit written without a number or 'as'",

        // Units and kinds
        [DiagnosticCodes.UnknownUnit] = "Unknown unit",
        [DiagnosticCodes.MalformedUnit] = "Malformed unit expression",
        [DiagnosticCodes.OffsetUnitInCompound] = "Offset temperature scale inside a compound unit",
        [DiagnosticCodes.NameAfterNumber] = "Name written after a number where a unit is expected",
        [DiagnosticCodes.UnitAlsoName] = "Unit symbol after a number is also a name in the sheet",
        [DiagnosticCodes.ShopSpelling] = "Shop spelling of a unit read in a documented way",
        [DiagnosticCodes.DimensionMismatch] = "Quantities of different dimensions combined",
        [DiagnosticCodes.ComparisonMismatch] = "Quantities of different dimensions compared",
        [DiagnosticCodes.ConversionMismatch] = "Value converted to a unit of another dimension",
        [DiagnosticCodes.NonIntegerExponent] = "Power leaves a fractional dimension",
        [DiagnosticCodes.ExponentNotDimensionless] = "Exponent is not a plain number",
        [DiagnosticCodes.ArgumentNotDimensionless] = "Function needs a plain number or an angle",
        [DiagnosticCodes.RotationKindMix] = "Revolutions and radians mixed (differ by 2π)",
        [DiagnosticCodes.AngleWithout2Pi] = "Angular velocity and frequency exchanged without 2π",
        [DiagnosticCodes.CountMix] = "Quantities counting different things combined",
        [DiagnosticCodes.KindMismatch] = "Quantities of different kinds combined",
        [DiagnosticCodes.ArgumentDimension] = "Argument of the wrong dimension",
        [DiagnosticCodes.ArgumentRotation] = "Argument differs by 2π from the expected rotation kind",
        [DiagnosticCodes.ArgumentCount] = "Argument counts a different entity than expected",
        [DiagnosticCodes.ArgumentKind] = "Argument of the wrong kind",
        [DiagnosticCodes.ReturnKind] = "Function result does not match its declared kind",
        [DiagnosticCodes.TorqueTimesRpm] = "Torque times rotational frequency without 2π",
        [DiagnosticCodes.RpmTimesLength] = "Rotational frequency times length without π",
        [DiagnosticCodes.PerRevTimesAngle] = "Per-revolution quantity times an angle",
        [DiagnosticCodes.TorqueAsEnergy] = "Torque shown in an energy unit",
        [DiagnosticCodes.OverrideMismatch] = "Override of an input with a different kind of value",
        [DiagnosticCodes.OffsetArithmetic] = "Offset temperature scale used in arithmetic",
        [DiagnosticCodes.PlainNumberAsRadians] = "Plain number beyond a full turn read as radians by a trigonometric function",

        // Names and imports
        [DiagnosticCodes.UnknownName] = "Name not defined",
        [DiagnosticCodes.UsedBeforeDefinition] = "Name used before the line that defines it",
        [DiagnosticCodes.Redefinition] = "Name defined more than once",
        [DiagnosticCodes.UnknownFunction] = "Function not defined",
        [DiagnosticCodes.ArgumentList] = "Arguments do not match the function's parameters",
        [DiagnosticCodes.Recursion] = "Function calls itself",
        [DiagnosticCodes.ImportNotFound] = "Imported sheet not found",
        [DiagnosticCodes.ImportOutsideWorkspace] = "Imported sheet lies outside the workspace",
        [DiagnosticCodes.ImportCycle] = "Sheets import each other in a cycle",
        [DiagnosticCodes.ImportClash] = "Two imports define the same name",
        [DiagnosticCodes.OverrideNotInput] = "Override of a name that is not an input",
        [DiagnosticCodes.UnknownKind] = "Unknown kind in a parameter annotation",
        [DiagnosticCodes.NotAFunction] = "Name called as a function is not one",
        [DiagnosticCodes.ImportedRedefinition] = "Imported name redefined",
        [DiagnosticCodes.UnknownChoiceValue] = "Value is not one of the choice's options",
        [DiagnosticCodes.ImportHasErrors] = "Imported sheet has errors",
        [DiagnosticCodes.UnknownColumn] = "Table has no such column",
        [DiagnosticCodes.BadSetting] = "Invalid display or sheet setting",

        // Checks and cautions
        [DiagnosticCodes.CheckFailed] = "Check failed",
        [DiagnosticCodes.CheckNotEvaluated] = "Check could not be evaluated",
        [DiagnosticCodes.NotAComparison] = "Check or condition is not a comparison",
        [DiagnosticCodes.NothingToAccept] = "Acceptance without a caution to accept",
        [DiagnosticCodes.NoticeRaised] = "Notice raised",
        [DiagnosticCodes.CautionRaised] = "Caution raised",
        [DiagnosticCodes.WarningRaised] = "Warning raised",
        [DiagnosticCodes.OutsideValidity] = "Function used outside its declared validity range",
        [DiagnosticCodes.CautionAccepted] = "Caution raised and accepted with a reason",

        // Evaluation
        [DiagnosticCodes.DivisionByZero] = "Division by zero",
        [DiagnosticCodes.DomainError] = "Function argument outside its mathematical domain",
        [DiagnosticCodes.NotFinite] = "Result is not a finite number",
        [DiagnosticCodes.RequirementFailed] = "Function requirement not met",
        [DiagnosticCodes.ListMismatch] = "Lists of different lengths combined",
        [DiagnosticCodes.LimitExceeded] = "Evaluation limit exceeded",
        [DiagnosticCodes.TypeMismatch] = "Value of the wrong type",
        [DiagnosticCodes.MissingRow] = "Table has no matching row",
    };

    /// <summary>Codes that have a description here (tests compare them with the language's codes).</summary>
    public static IReadOnlyCollection<string> KnownCodes => Descriptions.Keys;

    public static string Describe(string code) =>
        Descriptions.TryGetValue(code, out var text) ? text : $"CutSheet diagnostic {code}";
}
