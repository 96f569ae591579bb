namespace CutSheet.UnitCatalogGenerator;

/// <summary>
/// How each UnitsNet quantity's base unit relates to coherent SI. Reviewed by hand against
/// UnitsNet <see cref="ReviewedVersion"/> (every one of its 135 quantities): a quantity not
/// listed here has a coherent SI base unit (m, kg, s, A, K, mol, cd and their products,
/// e.g. N·m, Pa, W, rad/s, m²·K/W). The generator refuses any other UnitsNet version, so an
/// upgrade forces a fresh review instead of silently mis-scaling new base units.
/// </summary>
public static class SiPolicy
{
    public const string ReviewedVersion = "5.75.1";

    /// <summary>
    /// Quantities whose base unit is NOT coherent SI: quantity → (base unit we expect,
    /// SI value of one base unit). The expected name guards against UnitsNet changing a base.
    /// </summary>
    public static readonly IReadOnlyDictionary<string, (string BaseUnit, double SiFactor)> NonCoherentBase =
        new Dictionary<string, (string, double)>(StringComparer.Ordinal)
        {
            // SI: the plane angle unit is the radian (dimension one); UnitsNet's base is the degree.
            ["Angle"] = ("Degree", Math.PI / 180),
            // V·A·h and var·h are energies: 1 h = 3600 s of a coherent (J-dimensioned) power unit.
            ["ElectricApparentEnergy"] = ("VoltampereHour", 3600),
            ["ElectricReactiveEnergy"] = ("VoltampereReactiveHour", 3600),
            // Base is g/s; coherent is kg/s.
            ["MassFlow"] = ("GramPerSecond", 1e-3),
            // Base is m²·K/kW; coherent is m²·K/W.
            ["ThermalResistance"] = ("SquareMeterKelvinPerKilowatt", 1e-3),
            // Percent of a dimension-one ratio.
            ["RelativeHumidity"] = ("Percent", 0.01),
            // No SI unit exists for information. Choice: one bit counts as 1 (dimension one),
            // so a byte is 8 and bit/s is s⁻¹. (The other convention, 1 Sh = ln 2 nat, is not used.)
            ["Information"] = ("Bit", 1),
            ["BitRate"] = ("BitPerSecond", 1),
            // A degree-Celsius step equals a kelvin step, so °C/s is coherent K/s: factor 1, listed
            // only because the name looks non-SI.
            ["TemperatureChangeRate"] = ("DegreeCelsiusPerSecond", 1),
        };

    /// <summary>
    /// Quantities left out of the table: their rows cannot honestly say
    /// "one unit = Factor·SI + Offset" with UnitsNet's dimensions.
    /// </summary>
    public static readonly IReadOnlyDictionary<string, string> Excluded =
        new Dictionary<string, string>(StringComparer.Ordinal)
        {
            ["AmplitudeRatio"] = "logarithmic (dBV); dB offsets are not affine SI conversions",
            ["Level"] = "logarithmic (dB, Np)",
            ["PowerRatio"] = "logarithmic (dBW, dBm)",
            ["FuelEfficiency"] = "UnitsNet gives dimension one (L/100 km is really m²) and km/L, mpg are reciprocal, not affine",
            ["SpecificFuelConsumption"] = "UnitsNet gives dimension one; g/(kN·s) is really s/m",
            ["StandardVolumeFlow"] = "standard m³ → kg needs a gas density; no fixed SI factor",
            ["Turbidity"] = "NTU is an optical convention with no SI equivalent",
            ["VitaminA"] = "IU is a biological-activity convention with no SI equivalent",
            // Obsolete in UnitsNet 5 (replaced by the Electric* quantities, which are kept). Their
            // rows would duplicate every symbol, and ElectricPotentialAc/Dc carry dimension one for volts.
            ["ApparentEnergy"] = "obsolete duplicate of ElectricApparentEnergy",
            ["ApparentPower"] = "obsolete duplicate of ElectricApparentPower",
            ["Capacitance"] = "obsolete duplicate of ElectricCapacitance",
            ["ElectricAdmittance"] = "obsolete (use ElectricConductance/ElectricSusceptance)",
            ["ElectricImpedance"] = "obsolete (use ElectricResistance/ElectricReactance)",
            ["ElectricPotentialAc"] = "obsolete; UnitsNet gives volts dimension one",
            ["ElectricPotentialDc"] = "obsolete; UnitsNet gives volts dimension one",
            ["ReactiveEnergy"] = "obsolete duplicate of ElectricReactiveEnergy",
            ["ReactivePower"] = "obsolete duplicate of ElectricReactivePower",
        };
}
