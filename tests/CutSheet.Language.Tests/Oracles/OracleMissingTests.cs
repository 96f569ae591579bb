namespace CutSheet.Language.Tests.Oracles;

/// <summary>
/// Issue 2: without an oracle the tests fail — never skip — and the failure names the Debian
/// package to install. Simulated with a program and a module that do not exist.
/// </summary>
public class OracleMissingTests
{
    private static readonly OracleQuery Inch = new("1 inch", "mm");

    [Fact]
    public void Missing_gnu_units_fails_naming_the_package()
    {
        var e = Assert.Throws<OracleMissingException>(() => GnuUnits.Convert([Inch], program: "cutsheet-no-such-units-program"));
        Assert.Contains("apt-get install units", e.Message);
    }

    [Fact]
    public void Missing_pint_fails_naming_the_package()
    {
        var e = Assert.Throws<OracleMissingException>(() => Pint.Convert([Inch], module: "cutsheet_no_such_pint_module"));
        Assert.Contains("apt-get install python3-pint", e.Message);
    }
}
