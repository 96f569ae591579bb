using CutSheet.Language.Units;

namespace CutSheet.Language.Diagnostics;

/// <summary>
/// Every message the language reports, in one place; tests assert against these.
/// Messages name both units and both dimensions where units disagree, and say what to do.
/// </summary>
public static class DiagnosticMessages
{
    // Syntax
    public static string UnexpectedCharacter(string c) => $"'{c}' is not part of the language";
    public static string Unexpected(string found, string expected) => $"unexpected {found}; expected {expected}";
    public const string UnterminatedString = "text in quotes is not closed before the end of the line";
    public const string InchMark = "the inch mark \" is ambiguous in plain text; write the unit 'in' instead";
    public const string FootMark = "the foot mark ' is ambiguous in plain text; write the unit 'ft' instead";
    public static string DecimalComma(string written, string? fixedText) => fixedText is null
        ? $"'{written}' uses a comma as decimal mark or thousands separator; write a decimal point and no separators"
        : $"'{written}' uses a decimal comma; write a decimal point: {fixedText}";
    public const string UnbalancedBracket = "a bracket is not closed on this statement";
    public const string StrayClosingBracket = "this closing bracket has no opening bracket before it";
    public static string Incomplete(string what) => $"the statement ends early: {what}";
    public const string NestingTooDeep = "the expression is nested too deeply (more than 64 levels)";
    public const string NotAStatement = "a line must define a name (name = …), a function, a check, a caution, a heading or a setting";
    public static string ClauseNotAllowed(string clause, string statement) => $"'{clause}' cannot be written on {statement}";
    public const string UnitWithoutNumber = "a unit is written only after a number or after 'as'";
    public static string DiameterSign(string sign) =>
        $"the diameter sign {sign} is not part of a number; write the number alone (a diameter is a length: d = 20 mm)";
    public static string RemoveFix(string text) => $"remove {text}";
    public static string SpacedDigits(string written, string joined) =>
        $"'{written}' groups digits with spaces, which do not join them into one number; write {joined}";
    public static string SpacedDigitsFix(string joined) => $"write {joined}";
    public static string MistypedStatementWord(string word, string meant) =>
        $"a line must define a name, or start with a statement's word; '{word}' is not one: did you mean '{meant}'?";
    public static string CheckOperator(string written, string meant) =>
        written == "=" ? "a check compares with ==, <=, >=, <, > or !=; a single = defines a name: write ==" : $"'{written}' is not a comparison: write {meant}";
    public static string NamedArgumentEquals(string name) => $"a named argument is written with ':' ({name}: value); '=' defines a name";
    public const string NamedArgumentFix = "write :";
    public const string ParameterWithoutKind = "each parameter of a function names its kind: (x: length, F: force)";
    public const string FunctionWithoutReturnKind = "a function names the kind it returns after its parameters: f(x: length): area = …";
    public const string ChoiceCommas = "a choice's options are separated by '|': choice mode = climb | conventional";
    public const string ChoiceCommasFix = "separate the options with |";
    public const string PlusMinusNotYet = "a tolerance written with ± is not in the language yet; write the typical value and give the range in the line's description";

    public static string SideBySide(string first, string second, bool sameDimension) => sameDimension
        ? $"two quantities side by side, '{first}' and '{second}'; to add them, write {first} + {second}"
        : $"two quantities side by side, '{first}' and '{second}'; join them with an operator (+, -, *, /)";

    public static string SideBySideFix(string first, string second) => $"add them: {first} + {second}";

    // Units
    public const string EmptyUnit = "the unit is empty";
    public static string UnexpectedInUnit(string c, string unit) => $"'{c}' cannot appear in the unit '{unit}'";
    public static string BadUnitExponent(int n) => FormattableString.Invariant($"a unit exponent must be a whole number from -12 to 12 other than 0, not {n}");
    public const string MissingUnitExponent = "a unit power needs a whole-number exponent, e.g. m^2 or s^-1";
    public const string UnitEndsEarly = "the unit ends early";
    public const string UnclosedUnitParen = "a parenthesis in the unit is not closed";
    public static string UnknownUnit(string symbol) => $"'{symbol}' is not a known unit";
    public static string UnknownUnitWithSuggestion(string symbol, string suggestion) => $"'{symbol}' is not a known unit; did you mean {suggestion}?";
    public static string OffsetUnitInCompound(string unit) => $"'{unit}' combines a temperature scale with an offset (°C, °F) with other units; write temperature differences in K";
    public static string NameAfterNumber(string name) => $"'{name}' is a name, not a unit; to multiply, write the operator";
    public static string NameAfterAs(string name, bool isKind, string? example) => isKind
        ? $"'{name}' is a kind, not a unit; 'as' takes a unit{(example is null ? "" : $", e.g. {example}")}"
        : $"'{name}' is a name, not a unit; 'as' takes a unit";
    public static string UnitAlsoName(string unit) => $"'{unit}' after a number is read as the unit {unit}, but '{unit}' is also a name in this sheet; to multiply, write the operator";

    // Dimensions and kinds
    public static string DimensionMismatch(string op, string leftUnit, Dimension left, string rightUnit, Dimension right) =>
        $"cannot {op} {leftUnit} ({Kinds.Describe(left)}, {left.ToSiString()}) and {rightUnit} ({Kinds.Describe(right)}, {right.ToSiString()})";
    public static string ComparisonMismatch(string leftUnit, Dimension left, string rightUnit, Dimension right) =>
        $"cannot compare {leftUnit} ({Kinds.Describe(left)}, {left.ToSiString()}) with {rightUnit} ({Kinds.Describe(right)}, {right.ToSiString()})";
    public static string ConversionMismatch(string fromUnit, Dimension from, string toUnit, Dimension to) =>
        $"cannot show {fromUnit} ({Kinds.Describe(from)}, {from.ToSiString()}) in {toUnit} ({Kinds.Describe(to)}, {to.ToSiString()})";
    public const string MassForForce = "a mass in lb where a force is needed: lb is the pound of mass; write lbf for pound-force";
    public const string MassLiteralHere = "this lb is a mass (pound); pound-force is lbf";
    public static string NonIntegerExponent(string unit, string exponent) =>
        $"raising {unit} to the power {exponent} leaves a fractional dimension; normalise first, e.g. (h / 1 mm)^-m_c";
    public static string ExponentNotDimensionless(string unit) => $"an exponent must be a plain number, not {unit}";
    public static string ArgumentNotDimensionless(string function, string unit) => $"{function} needs a plain number or an angle, not {unit}";
    public static string RotationKindMix(string leftUnit, string rightUnit) =>
        $"{leftUnit} and {rightUnit} differ by 2π (revolutions against radians); convert one with 'as' first";
    public const string AngleDropped = "an angular velocity shown as a plain frequency: 1 rad/s is 1 s⁻¹, not 1/(2π) Hz; to count revolutions, convert 'as rpm' or 'as rev/s'";
    public const string AngleInserted = "a plain frequency shown as an angular velocity: 1 s⁻¹ is read as 1 rad/s; if it counts revolutions or cycles, write ω = 2 * pi * n";
    public static string CountMix(string leftUnit, string rightUnit) =>
        $"{leftUnit} and {rightUnit} count different things (e.g. a lead per revolution and a plain length); check that this is meant";
    public static string KindMismatch(string op, string leftKind, string rightKind) =>
        $"cannot {op} {leftKind.Replace('_', ' ')} and {rightKind.Replace('_', ' ')}: they are different kinds of quantity (ISO 80000)";
    public static string UnknownChoice(string name, string? suggestion) =>
        suggestion is null ? $"'{name}' is not a choice" : $"'{name}' is not a choice; did you mean '{suggestion}'?";

    public static string ArgumentDimension(string function, string parameter, Kind expected, string gotUnit, Dimension got) =>
        $"{function}: '{parameter}' expects {expected.Description} ({expected.Dimension.ToSiString()}), got {gotUnit} ({Kinds.Describe(got)}, {got.ToSiString()})";
    public static string ArgumentRotation(string function, string parameter, Kind expected, string gotUnit) =>
        $"{function}: '{parameter}' expects {expected.Description}, got {gotUnit}, which differs by 2π; convert with 'as'";
    public static string ArgumentCount(string function, string parameter, Kind expected, string gotUnit, string what) =>
        $"{function}: '{parameter}' expects {expected.Description}, got {gotUnit}: {what}; convert with 'as' if this is meant";
    public static string ArgumentKind(string function, string parameter, Kind expected, Kind got) =>
        $"{function}: '{parameter}' expects {expected.Description}, got {got.Description}";
    public static string DeclaredKindMismatch(string function, string parameter, Kind expected, Kind got) =>
        $"{function}: '{parameter}' expects {expected.Description}, got {got.Description}; the two are not interchangeable — check which one the formula needs";
    public static string ReturnKind(string function, Kind declared, string gotUnit, Dimension got) =>
        $"{function} declares {declared.Description} ({declared.Dimension.ToSiString()}) but its formula gives {gotUnit} ({Kinds.Describe(got)}, {got.ToSiString()})";
    public const string TorqueTimesRpm = "torque × rotational frequency without 2π: power is P = 2π·n·T (n in rev/min), or T·ω with ω in rad/s";
    public const string RpmTimesLength = "rotational frequency × length without π: a surface speed is v = π·D·n";
    public const string PerRevTimesAngle = "a per-revolution quantity × an angle: an angle is not a revolution count; convert the angle 'as rev' first";
    public const string TorqueAsEnergy = "a torque shown in an energy unit: torque is usually written N·m (J is kept for energy)";
    public const string OffsetArithmetic = "a temperature with an offset scale (°C, °F) in arithmetic is taken as absolute (K); for differences write K";

    // Names
    public static string UnknownName(string name, string? suggestion) =>
        suggestion is null ? $"'{name}' is not defined" : $"'{name}' is not defined; did you mean '{suggestion}'?";
    public static string UsedBeforeDefinition(string name, int useLine, int defLine) =>
        $"'{name}' is used on line {useLine} before its definition on line {defLine}; a sheet reads top to bottom";
    public static string MoveLineFix(string name, int toLine) => $"move the definition of '{name}' before line {toLine}";
    public static string Redefinition(string name, int firstLine) => $"'{name}' is already defined on line {firstLine}; a name is defined once";
    public static string RedefinitionOfBuiltin(string name) => $"'{name}' is built into the language and cannot be defined again";
    public static string ImportedRedefinition(string name, string from) =>
        $"'{name}' is imported from {from}; to change an imported input, write it in the import: use {from} with ({name} = …)";
    public static string InLibrary(string name, string library) => $"'{name}' is not defined in this sheet; the library {library} has it: add 'use {library}'";
    public static string AddUseFix(string library) => $"add 'use {library}'";
    public static string UnknownFunctionInLibrary(string name, string near, string library) =>
        $"'{name}' is not a function; did you mean '{near}' of the library {library}? (add 'use {library}')";
    public static string UseLibraryFunctionFix(string near, string library) => $"write {near} and add 'use {library}'";
    public static string ImportedUnderAlias(string name, string library, string alias) =>
        $"'{name}' comes from {library}, imported here as {alias}: write {alias}.{name}";
    public static string QualifyFix(string alias, string name) => $"write {alias}.{name}";
    public static string UnknownFunction(string name, string? suggestion) =>
        suggestion is null ? $"'{name}' is not a function" : $"'{name}' is not a function; did you mean '{suggestion}'?";
    public static string TooManyArguments(string function, int max) => $"{function} takes at most {max} argument{(max == 1 ? "" : "s")}";
    public static string MissingArgument(string function, string parameter) => $"{function}: argument '{parameter}' is missing";
    public static string UnknownArgument(string function, string name) => $"{function} has no parameter '{name}'";
    public static string DuplicateArgument(string function, string name) => $"{function}: '{name}' is given twice";
    public const string PositionalAfterNamed = "a positional argument cannot follow a named one";
    public static string Recursion(string function) => $"{function} calls itself (directly or through another function); recursion is not allowed";
    public static string ImportNotFound(string target) => $"cannot find the sheet '{target}'";
    public static string UseWithExtension(string written, string meant) =>
        $"'{written}' is neither a library's name nor a quoted path: write use {meant}";
    public static string LibraryQuoted(string name) => $"cannot find the sheet '{name}' in the workspace; the library sheet {name} is written without quotes: use {name}";
    public static string ImportWithoutExtension(string target) => $"cannot find the sheet '{target}'; a sheet's path ends in .cutsheet: use \"{target}.cutsheet\"";
    public static string ImportOutsideWorkspace(string target) => $"'{target}' is outside the workspace; a sheet may import only sheets inside its workspace";
    public static string ImportCycle(string chain) => $"imports form a cycle: {chain}";
    public static string ImportClash(string name, string first, string second) => $"'{name}' is imported from both {first} and {second}; import one with 'as' to qualify its names";
    public static string OverrideNotInput(string name, string sheet) => $"'{name}' is not an input of {sheet}; only definitions that depend on no other definition can be overridden";
    public static string OverrideUnknown(string name, string sheet, string? suggestion = null) =>
        suggestion is null ? $"{sheet} has no definition '{name}'" : $"{sheet} has no definition '{name}'; did you mean '{suggestion}'?";
    public static string SetUnknown(string name, string? suggestion) =>
        suggestion is null ? $"--set {name}: the sheet has no definition '{name}'" : $"--set {name}: the sheet has no definition '{name}'; did you mean '{suggestion}'?";
    public static string SetNotInput(string name) =>
        $"--set {name}: '{name}' is not an input of the sheet; only definitions that depend on no other definition can be set";
    public static string OverrideDimension(string name, Dimension own, Dimension given) =>
        $"the sheet gives '{name}' as {Kinds.Describe(own)} ({own.ToSiString()}); the value set is {Kinds.Describe(given)} ({given.ToSiString()}), so it cannot stand in";
    public static string OverrideValueKind(string name, string own, string given) =>
        $"the sheet gives '{name}' as {own}; the value set is {given}, so it cannot stand in";
    public static string UnknownKind(string name, string? suggestion) =>
        suggestion is null ? $"'{name}' is not a kind of quantity" : $"'{name}' is not a kind of quantity; did you mean '{suggestion}'?";
    public static string NotAFunction(string name) => $"'{name}' is a value, not a function";
    public static string UnknownChoiceValue(string value, string choice) => $"'{value}' is not an option of {choice}";
    public static string ImportHasErrors(string target, int count) => $"{target} has {count} error{(count == 1 ? "" : "s")}; its values that depend on them are unknown";
    public static string UnknownColumn(string column, string table) => $"table {table} has no column '{column}'";
    public static string BadSetting(string setting, string allowed) => $"'{setting}' is not a display setting here; use {allowed}";

    // Checks and cautions
    public static string CheckFailed(string detail) => $"check failed: {detail}";
    public const string CheckNotEvaluated = "check not evaluated: a value it needs is unknown (see the errors above)";
    public const string NotAComparison = "a check compares two values: value <= limit, value >= limit, or value == target [within tolerance]";
    public const string NothingToAccept = "'accepted' acknowledges a caution, but this line raised none";
    public static string OutsideValidity(string function, string condition, string? why) =>
        $"{function} is used outside its validity ({condition}){(why is null ? "" : ": " + why)}; the result is an extrapolation";
    public static string CautionAccepted(string message, string reason) => $"{message} (accepted: {reason})";

    // Details of evaluation errors in built-in functions.
    public const string InverseTrigRange = "the argument must lie between −1 and 1";
    public const string NegativeSquareRoot = "the square root of a negative value has no real value";
    public const string LogarithmOfNonPositive = "the logarithm needs a positive number";
    public const string StepNotPositive = "the step must be positive";
    public const string EmptyList = "the list is empty";
    public const string PowerMeanArguments = "needs a non-empty list and a non-zero power";
    public const string PointsNotAscending = "the points must be in ascending order";
    public const string OutsideCurve = "the value lies outside the table; a curve is not extrapolated";
    public const string NegativeFractionalPower = "a negative number to a fractional power has no real value";

    /// <summary>The signal word a caution's message starts with (ISO 3864-2 / ANSI Z535 levels).</summary>
    public static string SignalWord(Syntax.Nodes.CautionLevel level) => level switch
    {
        Syntax.Nodes.CautionLevel.Notice => "NOTICE",
        Syntax.Nodes.CautionLevel.Warning => "WARNING",
        _ => "CAUTION",
    };

    public static string Caution(Syntax.Nodes.CautionLevel level, string message) => $"{SignalWord(level)}: {message}";

    public static string LibraryNotFound(string name, string? suggestion, IEnumerable<string> names) =>
        ImportNotFound(name) + (suggestion is null ? $"; library sheets: {string.Join(", ", names)}" : $"; did you mean {suggestion}?");

    // Evaluation
    public const string DivisionByZero = "division by zero";
    public static string DomainError(string function, string detail) => $"{function}: {detail}";

    public static string PlainNumberAsRadians(string function, string number, double degrees) =>
        $"{function}({number}) reads the plain number {number} as radians ({Display.NumberFormatter.Format(degrees, 4)}°); if degrees were meant, write {number} deg";

    public static string PlainNumberAsDegreesFix(string number) => $"read it as degrees: {number} deg";
    public const string NotFinite = "the result is not a finite number";
    public static string NumberNotFinite(string written) => $"'{written}' is not a finite number (too large, or a fraction over zero)";
    public static string RequirementFailed(string function, string condition, string? why) =>
        $"{function} requires {condition}{(why is null ? "" : ": " + why)}";
    public static string InterpolationPoints(int xs, int ys) => $"interpolate needs two lists of at least two points and equal length, got {xs} and {ys}";
    public static string ListMismatch(int left, int right) => $"lists of different lengths ({left} and {right}) cannot be combined";
    public static string ExponentLimit(int max) => FormattableString.Invariant($"a dimension exponent beyond ±{max}");
    public static string LimitExceeded(string what) => $"evaluation limit reached: {what}";
    public static string TypeMismatch(string expected, string got) => $"expected {expected}, got {got}";
    public static string MissingRow(string table, string key) => $"table {table} has no row for {key}";
}
