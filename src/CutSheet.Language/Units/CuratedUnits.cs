namespace CutSheet.Language.Units;

/// <summary>
/// The curated part of the unit catalog: what the trade writes that UnitsNet does not say,
/// or says differently. Every row says why; docs/units.md is generated from this table and
/// the UnitsNet rows together.
/// </summary>
internal static class CuratedUnits
{
    /// <summary>UnitsNet quantities left out of the language, with the reason.</summary>
    public static readonly IReadOnlyDictionary<string, string> ExcludedQuantities = new Dictionary<string, string>
    {
        ["Information"] = "bits and bytes are not machining quantities and their symbols clash (b, B)",
        ["BitRate"] = "not a machining quantity",
        ["Level"] = "logarithmic (dB): not a linear unit",
        ["AmplitudeRatio"] = "logarithmic (dBV, dBu): not a linear unit",
        ["PowerRatio"] = "logarithmic (dBW): not a linear unit",
        ["RatioChangeRate"] = "duplicates percent per second with clashing symbols",
        ["Scalar"] = "an amount without a unit",
        ["TemperatureDelta"] = "°C, K and °F name absolute temperatures here; a difference is written in K",
        ["TemperatureChangeRate"] = "symbols clash with temperature and frequency units",
        ["TemperatureGradient"] = "not a machining quantity",
        ["FuelEfficiency"] = "reciprocal units (L/100km) that are not linear in the value",
        ["RadiationExposure"] = "not a machining quantity",
        ["RadiationEquivalentDose"] = "not a machining quantity",
        ["RadiationEquivalentDoseRate"] = "not a machining quantity",
        ["AbsorbedDoseOfIonizingRadiation"] = "not a machining quantity; its rad clashes with the radian",
        ["ApparentEnergy"] = "volt-ampere hours clash with energy",
        ["ReactiveEnergy"] = "reactive volt-ampere hours clash with energy",
        ["ApparentPower"] = "volt-amperes are not mechanical power",
        ["ReactivePower"] = "reactive volt-amperes are not mechanical power",
        ["Frequency.RadianPerSecond"] = "UnitsNet reads rad/s as 1/(2π) Hz; rad/s is an angular velocity here",
        ["Frequency.BUnit"] = "not a frequency unit of the trade",
        ["Compressibility"] = "UnitsNet 5.75.1 states the inverse-pressure factors upside down (1/atm as 101325 Pa⁻¹)",
        ["Volume.KilocubicMeter"] = "its symbol km³ reads as (km)³ = 10⁹ m³ but UnitsNet means 1000 m³",
        ["Volume.HectocubicMeter"] = "its symbol hm³ reads as (hm)³ = 10⁶ m³ but UnitsNet means 100 m³",
        ["Volume.KilocubicFoot"] = "its symbol kft³ reads as (kft)³ but UnitsNet means 1000 ft³",
        ["Volume.MegacubicFoot"] = "its symbol Mft³ reads as (Mft)³ but UnitsNet means 10⁶ ft³",
    };

    /// <summary>Symbols UnitsNet offers that the language leaves out, with the reason.</summary>
    public static readonly IReadOnlyDictionary<string, string> ExcludedSymbols = new Dictionary<string, string>
    {
        ["k"] = "a bare k would read as a kip; write kip (or kN) so a reader cannot mistake it for kilo",
        ["r"] = "a bare r would read as a revolution measured as an angle (2π rad); write rev for a count of revolutions",
    };

    /// <summary>
    /// Quantity order used to settle a symbol that names units of several quantities when no
    /// explicit choice below applies: the quantities a machining sheet uses most come first.
    /// </summary>
    public static readonly string[] QuantityPriority =
    [
        "Length", "Mass", "Duration", "Force", "Torque", "Power", "Energy", "Pressure", "Angle", "RotationalSpeed",
        "Speed", "Acceleration", "Area", "Volume", "VolumeFlow", "Frequency", "MassMomentOfInertia", "Density",
        "Temperature", "Ratio", "ElectricCurrent", "ElectricPotential",
    ];

    /// <summary>Explicit choices for clashing symbols: symbol → "Quantity.Unit", with the reason.</summary>
    public static readonly IReadOnlyDictionary<string, (string Unit, string Why)> Choices = new Dictionary<string, (string, string)>
    {
        ["m"] = ("Length.Meter", "SI metre; a minute is min"),
        ["min"] = ("Duration.Minute", "SI-accepted minute of time; arcminute is arcmin"),
        ["h"] = ("Duration.Hour", "hour; the hand (4 in) is not a machining length"),
        ["rad"] = ("Angle.Radian", "radian; the radiation dose unit is not a machining quantity"),
        ["g"] = ("Mass.Gram", "gram; gradian is gon"),
        ["t"] = ("Mass.Tonne", "metric tonne (1000 kg); short and long tons have their own symbols"),
        ["A"] = ("ElectricCurrent.Ampere", "ampere; ångström is Å"),
        ["lb"] = ("Mass.Pound", "a bare lb is the avoirdupois pound of mass; force is lbf"),
        ["oz"] = ("Mass.Ounce", "a bare oz is the ounce of mass; force is ozf"),
        ["s"] = ("Duration.Second", "second"),
        ["d"] = ("Duration.Day", "day"),
        ["°"] = ("Angle.Degree", "degree of angle; temperatures are °C and °F"),
        ["deg"] = ("Angle.Degree", "degree of angle"),
        ["in"] = ("Length.Inch", "inch"),
        ["ft"] = ("Length.Foot", "foot"),
        ["yd"] = ("Length.Yard", "yard"),
        ["mi"] = ("Length.Mile", "statute mile"),
        ["kn"] = ("Speed.Knot", "knot"),
        ["cal"] = ("Energy.Calorie", "thermochemical calorie"),
    };

    /// <summary>
    /// Exact or better factors where UnitsNet truncates or uses an approximate π.
    /// Key "Quantity.Unit" → SI factor. Sources named beside each value.
    /// </summary>
    public static readonly IReadOnlyDictionary<string, double> FactorOverrides = new Dictionary<string, double>
    {
        // NIST SP 811 (2008) App. B: 1 hp (550 ft·lbf/s) = 745.699 871 582 270 22 W (550 × 0.3048 × 4.448 221 615 260 5).
        ["Power.MechanicalHorsepower"] = 550 * 0.3048 * 4.4482216152605,
        // NIST SP 811 (2008) App. B: horsepower, metric = 735.498 75 W (75 kgf·m/s × 9.806 65).
        ["Power.MetricHorsepower"] = 75 * 9.80665,
        // NIST SP 811 (2008) App. B: horsepower, electric = 746 W (exact).
        ["Power.ElectricalHorsepower"] = 746,
        // NIST SP 811 (2008) App. B: 1 lbf = 4.448 221 615 260 5 N (exact by definition of the pound and g_n).
        ["Force.PoundForce"] = 4.4482216152605,
        ["Force.KilopoundForce"] = 4448.2216152605,
        ["Force.OunceForce"] = 4.4482216152605 / 16,
        // NIST SP 811 (2008) App. B: ft·lbf = 1.355 818 J, lbf·in = 0.112 984 8 N·m (products of exact factors).
        ["Torque.PoundForceFoot"] = 4.4482216152605 * 0.3048,
        ["Torque.PoundForceInch"] = 4.4482216152605 * 0.0254,
        ["Energy.FootPound"] = 4.4482216152605 * 0.3048,
        // NIST SP 811 (2008) App. B: slug = 14.593 90 kg (lbf·s²/ft, exact ratio).
        ["Mass.Slug"] = 4.4482216152605 / 0.3048,
        // NIST SP 811 (2008) App. B: psi = 6894.757 Pa (lbf/in², exact ratio).
        ["Pressure.PoundForcePerSquareInch"] = 4.4482216152605 / (0.0254 * 0.0254),
        ["Pressure.KilopoundForcePerSquareInch"] = 4448.2216152605 / (0.0254 * 0.0254),
        // NIST SP 811 (2008) App. B: pound = 0.453 592 37 kg and inch = 0.0254 m exactly, so these are exact products.
        ["MassMomentOfInertia.PoundSquareInch"] = 0.45359237 * 0.0254 * 0.0254,
        ["MassMomentOfInertia.PoundSquareFoot"] = 0.45359237 * 0.3048 * 0.3048,
        ["MassMomentOfInertia.SlugSquareFoot"] = 4.4482216152605 / 0.3048 * 0.3048 * 0.3048,
        ["Density.PoundPerCubicInch"] = 0.45359237 / (0.0254 * 0.0254 * 0.0254),
        ["Density.PoundPerCubicFoot"] = 0.45359237 / (0.3048 * 0.3048 * 0.3048),
        ["ForcePerLength.PoundForcePerInch"] = 4.4482216152605 / 0.0254,
        ["ForcePerLength.PoundForcePerFoot"] = 4.4482216152605 / 0.3048,
        // NIST SP 811 (2008) App. B: horsepower, boiler = 9.809 50 kW; technical atmosphere = 1 kgf/cm² = 98 066.5 Pa;
        // torr = 101 325/760 Pa; millimetre of mercury (conventional) = 133.322 387 415 Pa; inch of mercury (conventional) = 3386.389 Pa.
        ["Power.BoilerHorsepower"] = 9809.5,
        ["Pressure.TechnicalAtmosphere"] = 98066.5,
        ["Pressure.KilogramForcePerSquareMeter"] = 9.80665,
        ["Pressure.KilogramForcePerSquareCentimeter"] = 98066.5,
        ["Pressure.KilogramForcePerSquareMillimeter"] = 9806650,
        ["Pressure.Torr"] = 101325.0 / 760,
        ["Pressure.MillimeterOfMercury"] = 133.322387415,
        ["Pressure.InchOfMercury"] = 133.322387415 * 25.4,
        // SI Brochure (9th ed., 2019): the elementary charge is exact, so 1 eV = 1.602 176 634 × 10⁻¹⁹ J.
        ["Energy.ElectronVolt"] = 1.602176634e-19,
        ["Energy.KiloelectronVolt"] = 1.602176634e-16,
        ["Energy.MegaelectronVolt"] = 1.602176634e-13,
        ["Energy.GigaelectronVolt"] = 1.602176634e-10,
        ["Energy.TeraelectronVolt"] = 1.602176634e-7,
        // NIST SP 811 (2008) App. B: square foot per second = 0.092 903 04 m²/s (exact).
        ["KinematicViscosity.SquareFootPerSecond"] = 0.3048 * 0.3048,
        // ISO 80000-3: degree = π/180 rad exactly.
        ["Angle.Degree"] = Math.PI / 180,
    };

    /// <summary>
    /// Symbols the trade writes that UnitsNet lacks or defines otherwise. Each is defined by a
    /// unit expression over other accepted symbols, times a number; the note (if any) is shown
    /// as information wherever the symbol is read.
    /// </summary>
    public static readonly (string Symbol, string Name, double Scale, string Expression, string? Note)[] Additions =
    [
        // Counted entities (ISO 80000-1, "number of entities") — units of their own kind.
        ("rev", "revolution (a count)", 1, "#rev", null),
        ("revs", "revolutions (a count)", 1, "#rev", null),
        ("revolution", "revolution (a count)", 1, "#rev", null),
        ("revolutions", "revolutions (a count)", 1, "#rev", null),
        ("tooth", "tooth (a count)", 1, "#tooth", null),
        ("teeth", "teeth (a count)", 1, "#tooth", null),
        ("start", "thread start (a count)", 1, "#start", null),
        ("starts", "thread starts (a count)", 1, "#start", null),
        ("cycle", "cycle (a count)", 1, "#cycle", null),
        ("cycles", "cycles (a count)", 1, "#cycle", null),
        ("div", "dial division (a count)", 1, "#div", null),
        ("divs", "dial divisions (a count)", 1, "#div", null),
        ("division", "dial division (a count)", 1, "#div", null),
        ("divisions", "dial divisions (a count)", 1, "#div", null),
        ("stroke", "stroke (a count)", 1, "#stroke", null),
        ("strokes", "strokes (a count)", 1, "#stroke", null),

        // Rotation, ISO 80000-3: rotational frequency counts revolutions per time.
        ("rpm", "revolutions per minute", 1, "rev/min", null),
        ("RPM", "revolutions per minute", 1, "rev/min", null),
        ("r/min", "revolutions per minute", 1, "rev/min", null),
        ("rps", "revolutions per second", 1, "rev/s", null),
        ("r/s", "revolutions per second", 1, "rev/s", null),
        ("min⁻¹", "per minute, read as revolutions per minute (spindle speed as ISO 3002 writes it)", 1, "rev/min", "min⁻¹ is read as a rotational frequency (r/min)"),
        ("min^-1", "per minute, read as revolutions per minute (spindle speed as ISO 3002 writes it)", 1, "rev/min", "min^-1 is read as a rotational frequency (r/min)"),
        ("radian", "radian", 1, "rad", null),
        ("radians", "radians", 1, "rad", null),
        ("degree", "degree of angle", 1, "deg", null),
        ("degrees", "degrees of angle", 1, "deg", null),
        ("arcmin", "minute of arc", 1.0 / 60, "deg", null),
        ("arcsec", "second of arc", 1.0 / 3600, "deg", null),

        // Lengths of the shop floor.
        ("inch", "inch", 1, "in", null),
        ("inches", "inches", 1, "in", null),
        ("foot", "foot", 1, "ft", null),
        ("feet", "feet", 1, "ft", null),
        ("thou", "thousandth of an inch", 0.001, "in", null),
        ("mil", "thousandth of an inch (milliradian is mrad)", 0.001, "in", null),
        ("tenth", "ten-thousandth of an inch (a machinist's tenth)", 0.0001, "in", null),
        ("tenths", "ten-thousandths of an inch", 0.0001, "in", null),
        ("um", "micrometre (ASCII spelling)", 1e-6, "m", null),
        ("micron", "micrometre", 1e-6, "m", null),
        ("microns", "micrometres", 1e-6, "m", null),

        // Feeds and speeds as written in inch shops.
        ("tpi", "threads per inch (revolutions of a single-start screw per inch of travel)", 1, "rev/in", null),
        ("ipr", "inches per revolution", 1, "in/rev", null),
        ("ipt", "inches per tooth", 1, "in/tooth", null),
        ("ipm", "inches per minute", 1, "in/min", null),
        ("sfm", "surface feet per minute", 1, "ft/min", null),
        ("sfpm", "surface feet per minute", 1, "ft/min", null),
        ("fpm", "feet per minute", 1, "ft/min", null),

        // Forces and power. UnitsNet has no plain hp; the trade's hp is the mechanical one (NIST SP 811: 745.699 871 58 W).
        ("hp", "mechanical horsepower (550 ft·lbf/s), the US machine-tool rating", 550 * 0.3048 * 4.4482216152605, "W", null),
        ("kip", "kilopound-force (1000 lbf)", 1000, "lbf", null),
        ("kp", "kilopond (= kgf)", 1, "kgf", null),
        ("hp_e", "electrical horsepower (746 W exactly)", 746, "W", null),
        ("hp_metric", "metric horsepower (75 kgf·m/s)", 735.49875, "W", null),
        ("PS", "metric horsepower (Pferdestärke, 75 kgf·m/s)", 735.49875, "W", null),

        // Compound torque spellings of the trade, read as force × length.
        ("lb·in", "pound-force inch", 1, "lbf·in", "lb·in is read as lbf·in (pound-force inch): in a torque, lb means pound-force"),
        ("in·lb", "pound-force inch", 1, "lbf·in", "in·lb is read as lbf·in (pound-force inch): in a torque, lb means pound-force"),
        ("lb·ft", "pound-force foot", 1, "lbf·ft", "lb·ft is read as lbf·ft (pound-force foot): in a torque, lb means pound-force"),
        ("ft·lb", "pound-force foot", 1, "lbf·ft", "ft·lb is read as lbf·ft (pound-force foot): in a torque, lb means pound-force"),
        ("oz·in", "ounce-force inch", 1, "ozf·in", "oz·in is read as ozf·in (ounce-force inch): in a torque, oz means ounce-force"),
        ("in·oz", "ounce-force inch", 1, "ozf·in", "in·oz is read as ozf·in (ounce-force inch): in a torque, oz means ounce-force"),
        ("kgf·cm", "kilogram-force centimetre", 1, "kgf·cm", "kgf·cm is read as a torque (kilogram-force × centimetre)"),
        ("N·cm", "newton centimetre", 0.01, "N·m", "N·cm is read as a torque (newton × centimetre)"),
        ("Ncm", "newton centimetre", 0.01, "N·m", "Ncm is read as N·cm (newton centimetre)"),
        ("Nm", "newton metre", 1, "N·m", "Nm is read as N·m (newton metre)"),
        ("mNm", "millinewton metre", 0.001, "N·m", "mNm is read as mN·m (millinewton metre)"),
        ("kNm", "kilonewton metre", 1000, "N·m", "kNm is read as kN·m (kilonewton metre)"),
        ("lb·in·s²", "pound-force inch second squared (inertia)", 1, "lbf·in·s²", "lb·in·s² is read as lbf·in·s²: an inertia, 386.09 lb·in²"),
        ("lb·in·s^2", "pound-force inch second squared (inertia)", 1, "lbf·in·s²", "lb·in·s^2 is read as lbf·in·s²: an inertia, 386.09 lb·in²"),
        ("oz·in·s²", "ounce-force inch second squared (inertia)", 1, "ozf·in·s²", "oz·in·s² is read as ozf·in·s²: an inertia"),
        ("oz·in·s^2", "ounce-force inch second squared (inertia)", 1, "ozf·in·s²", "oz·in·s^2 is read as ozf·in·s²: an inertia"),

        // Volumes and masses UnitsNet spells only with spaces ("gal (U.S.)", "t (short)").
        ("L", "litre (SI Brochure: L and l are both accepted)", 0.001, "m³", null),
        ("mL", "millilitre", 1e-6, "m³", null),
        ("gal", "US liquid gallon (231 in³, NIST SP 811)", 231, "in³", null),
        ("ton", "short ton of mass (2000 lb), as GNU units reads it", 2000, "lb", null),

        // Ratios.
        ("‰", "per mille", 0.001, "1", null),
        ("ppm", "parts per million", 1e-6, "1", null),
    ];
}
