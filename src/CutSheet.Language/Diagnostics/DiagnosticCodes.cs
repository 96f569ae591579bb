namespace CutSheet.Language.Diagnostics;

/// <summary>
/// Stable diagnostic codes, grouped by area: CUT1xxx syntax, CUT2xxx units and kinds,
/// CUT3xxx names and imports, CUT4xxx checks and cautions, CUT5xxx evaluation.
/// A code, once published, keeps its meaning; docs/language.md lists them all.
/// </summary>
public static class DiagnosticCodes
{
    // Syntax
    public const string UnexpectedCharacter = "CUT1001";
    public const string UnexpectedToken = "CUT1002";
    public const string UnterminatedString = "CUT1003";
    public const string InchMark = "CUT1004";
    public const string FootMark = "CUT1005";
    public const string DecimalComma = "CUT1006";
    public const string UnbalancedBracket = "CUT1007";
    public const string IncompleteStatement = "CUT1008";
    public const string NestingTooDeep = "CUT1009";
    public const string NotAStatement = "CUT1010";
    public const string ClauseNotAllowed = "CUT1011";
    public const string UnitWithoutNumber = "CUT1012";

    // Units and kinds
    public const string UnknownUnit = "CUT2001";
    public const string MalformedUnit = "CUT2002";
    public const string OffsetUnitInCompound = "CUT2003";
    public const string NameAfterNumber = "CUT2004";
    public const string UnitAlsoName = "CUT2005";
    public const string ShopSpelling = "CUT2006";
    public const string DimensionMismatch = "CUT2101";
    public const string ComparisonMismatch = "CUT2102";
    public const string ConversionMismatch = "CUT2103";
    public const string NonIntegerExponent = "CUT2104";
    public const string ExponentNotDimensionless = "CUT2105";
    public const string ArgumentNotDimensionless = "CUT2106";
    public const string RotationKindMix = "CUT2107";
    public const string AngleWithout2Pi = "CUT2108";
    public const string CountMix = "CUT2110";
    public const string KindMismatch = "CUT2111";
    public const string OverrideMismatch = "CUT2112";
    public const string ArgumentDimension = "CUT2201";
    public const string ArgumentRotation = "CUT2202";
    public const string ArgumentCount = "CUT2203";
    public const string ArgumentKind = "CUT2204";
    public const string ReturnKind = "CUT2205";
    public const string TorqueTimesRpm = "CUT2301";
    public const string RpmTimesLength = "CUT2302";
    public const string PerRevTimesAngle = "CUT2303";
    public const string TorqueAsEnergy = "CUT2304";
    public const string OffsetArithmetic = "CUT2305";
    public const string PlainNumberAsRadians = "CUT2306";

    // Names and imports
    public const string UnknownName = "CUT3001";
    public const string UsedBeforeDefinition = "CUT3002";
    public const string Redefinition = "CUT3003";
    public const string UnknownFunction = "CUT3004";
    public const string ArgumentList = "CUT3005";
    public const string Recursion = "CUT3006";
    public const string ImportNotFound = "CUT3007";
    public const string ImportOutsideWorkspace = "CUT3008";
    public const string ImportCycle = "CUT3009";
    public const string ImportClash = "CUT3010";
    public const string OverrideNotInput = "CUT3011";
    public const string UnknownKind = "CUT3012";
    public const string NotAFunction = "CUT3013";
    public const string ImportedRedefinition = "CUT3014";
    public const string UnknownChoiceValue = "CUT3015";
    public const string ImportHasErrors = "CUT3016";
    public const string UnknownColumn = "CUT3017";
    public const string BadSetting = "CUT3018";

    // Checks and cautions
    public const string CheckFailed = "CUT4001";
    public const string CheckNotEvaluated = "CUT4002";
    public const string NotAComparison = "CUT4003";
    public const string NothingToAccept = "CUT4004";
    public const string NoticeRaised = "CUT4101";
    public const string CautionRaised = "CUT4102";
    public const string WarningRaised = "CUT4103";
    public const string OutsideValidity = "CUT4104";
    public const string CautionAccepted = "CUT4105";

    // Evaluation
    public const string DivisionByZero = "CUT5001";
    public const string DomainError = "CUT5002";
    public const string NotFinite = "CUT5003";
    public const string RequirementFailed = "CUT5005";
    public const string ListMismatch = "CUT5006";
    public const string LimitExceeded = "CUT5007";
    public const string TypeMismatch = "CUT5008";
    public const string MissingRow = "CUT5009";
}
