using CutSheet.Language.Diagnostics;

namespace CutSheet.Language.Tests.Oracles;

/// <summary>
/// LANGUAGE.md A.4: every shop spelling listed there is accepted, with its SI factor (SI base units,
/// angles in radians, counted revolutions and teeth as 1). Each factor names its source: "[calc] GNU units
/// 2.22" values were printed by <c>units -t -d 15 -1 FROM TO</c>; NIST SP 811 (2008) App. B values are
/// exact by definition (inch 0.0254 m, pound 0.453 592 37 kg, lbf 4.448 221 615 260 5 N) [recalled from
/// memory, confirmed with GNU units 2.22]. The compound torque spellings must also carry the
/// information note that names their reading (CUT2006).
/// </summary>
public class ShopSpellingTests
{
    /// <summary>The expected factors are printed to 15 significant digits or exact: 1e-12 relative absorbs the rest.</summary>
    private const double Tolerance = 1e-12;

    [Theory]
    [InlineData("thou", 2.54e-05, false)]                 // [calc] GNU units 2.22: thou → m = 2.54e-05
    [InlineData("tenth", 2.54e-06, false)]                // [calc] GNU units 2.22: 0.0001 inch → m = 2.54e-06 (A.4: tenth = 0.0001 in)
    [InlineData("mil", 2.54e-05, false)]                  // [calc] GNU units 2.22: mil → m = 2.54e-05 (the thou; milliradian is mrad)
    [InlineData("um", 1e-06, false)]                      // [calc] GNU units 2.22: micron → m = 1e-06 (SI prefix micro)
    [InlineData("µm", 1e-06, false)]                      // [calc] GNU units 2.22: micron → m = 1e-06
    [InlineData("micron", 1e-06, false)]                  // [calc] GNU units 2.22: micron → m = 1e-06
    [InlineData("tpi", 39.3700787401575, false)]          // [calc] GNU units 2.22: 1/inch → 1/m = 39.3700787401575; the thread's revolution is a count of 1 (ISO 80000-3 as LANGUAGE.md B.2 reads it)
    [InlineData("sfm", 0.00508, false)]                   // [calc] GNU units 2.22: ft/min → m/s = 0.00508
    [InlineData("ipm", 0.000423333333333333, false)]      // [calc] GNU units 2.22: inch/min → m/s = 0.000423333333333333
    [InlineData("ipr", 0.0254, false)]                    // NIST SP 811: inch = 0.0254 m exactly; per revolution, a count of 1 (LANGUAGE.md B.2)
    [InlineData("ipt", 0.0254, false)]                    // NIST SP 811: inch = 0.0254 m exactly; per tooth, a count of 1 (ISO 80000-1 number of entities)
    [InlineData("r/min", 0.0166666666666667, false)]      // ISO 80000-3: rotational frequency, 1 r/min = 1/60 s⁻¹ (not the oracles' 2π/60)
    [InlineData("min⁻¹", 0.0166666666666667, false)]      // ISO 80000-3 / ISO 3002 spindle speed: 1/60 s⁻¹
    [InlineData("rpm", 0.0166666666666667, false)]        // ISO 80000-3: 1/60 s⁻¹
    [InlineData("%", 0.01, false)]                        // [calc] GNU units 2.22: percent → 1 = 0.01
    [InlineData("‰", 0.001, false)]                       // ISO 80000-1: per mille = 0.001
    [InlineData("lbf", 4.4482216152605, false)]           // NIST SP 811: lbf = 4.448 221 615 260 5 N; [calc] GNU units 2.22 agrees
    [InlineData("kip", 4448.2216152605, false)]           // [calc] GNU units 2.22: kip → N = 4448.2216152605
    [InlineData("ozf", 0.278013850953781, false)]         // [calc] GNU units 2.22: ounce*force → N = 0.278013850953781
    [InlineData("lb·in", 0.112984829027617, true)]        // [calc] GNU units 2.22: lbf*inch → N*m = 0.112984829027617 (NIST SP 811: 0.112 984 8)
    [InlineData("lb·ft", 1.3558179483314, true)]          // [calc] GNU units 2.22: lbf*ft → N*m = 1.3558179483314 (NIST SP 811: 1.355 818)
    [InlineData("ft·lb", 1.3558179483314, true)]          // [calc] GNU units 2.22: lbf*ft → N*m = 1.3558179483314
    [InlineData("oz·in", 0.00706155181422604, true)]      // [calc] GNU units 2.22: ounce*force*inch → N*m = 0.00706155181422604 (CHECK-VALUES: 0.007 061 551 81)
    [InlineData("in·oz", 0.00706155181422604, true)]      // [calc] GNU units 2.22: ounce*force*inch → N*m = 0.00706155181422604
    [InlineData("kgf·cm", 0.0980665, true)]               // [calc] GNU units 2.22: kgf*cm → N*m = 0.0980665 (NIST SP 811: kgf = 9.806 65 N exactly)
    [InlineData("N·cm", 0.01, true)]                      // [calc] GNU units 2.22: N*cm → N*m = 0.01
    [InlineData("mNm", 0.001, true)]                      // [calc] GNU units 2.22: mN*m → N*m = 0.001
    [InlineData("Nm", 1.0, true)]                         // SI: newton metre
    [InlineData("kNm", 1000.0, true)]                     // [calc] GNU units 2.22: kN*m → N*m = 1000
    [InlineData("hp", 745.69987158227, false)]            // [calc] GNU units 2.22: hp → W = 745.69987158227 (NIST SP 811: 745.699 87 W)
    [InlineData("kg·m²", 1.0, false)]                     // SI: kilogram metre squared
    [InlineData("kg·cm²", 0.0001, false)]                 // [calc] GNU units 2.22: kg*cm^2 → kg*m^2 = 0.0001
    [InlineData("g·cm²", 1e-07, false)]                   // [calc] GNU units 2.22: g*cm^2 → kg*m^2 = 1e-07
    [InlineData("lb·in²", 0.0002926396534292, false)]     // [calc] GNU units 2.22: lb*inch^2 → kg*m^2 = 0.0002926396534292 (NIST SP 811: 2.926 397e-4)
    [InlineData("lbf·in·s²", 0.112984829027617, false)]   // [calc] GNU units 2.22: lbf*inch*s^2 → kg*m^2 = 0.112984829027617
    [InlineData("oz·in·s²", 0.00706155181422604, false)]  // [calc] GNU units 2.22: ounce*force*inch*s^2 → kg*m^2 = 0.00706155181422604 (read as ozf·in·s², A.4)
    public void Shop_spelling_is_accepted_with_its_SI_factor(string symbol, double siFactor, bool noted)
    {
        var result = SheetRunner.Run($"x = 1 {symbol}\n");
        string diagnostics = string.Join("; ", result.Diagnostics.Select(d => $"{d.Code} {d.Message}"));
        Assert.False(result.HasErrors, $"'1 {symbol}' has errors: [{diagnostics}]");
        var value = result.Definitions.Single().Value;
        Assert.True(value is not null, $"'1 {symbol}' has no value: [{diagnostics}]");
        double si = value!.Quantity.Si;
        Assert.True(Math.Abs(si - siFactor) <= Tolerance * Math.Abs(siFactor), $"1 {symbol} = {si:R} in SI units, expected {siFactor:R}");
        if (noted)
        {
            Assert.True(result.Diagnostics.Any(d => d.Code == DiagnosticCodes.ShopSpelling && d.Severity == Severity.Information),
                $"'1 {symbol}' should carry the CUT2006 note naming its reading (LANGUAGE.md A.4), got [{diagnostics}]");
        }
    }
}
