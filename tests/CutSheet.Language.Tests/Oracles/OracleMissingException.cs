namespace CutSheet.Language.Tests.Oracles;

/// <summary>
/// An oracle program or module is not installed. The oracle tests fail with this rather than
/// skip: a skipped oracle test would let a wrong conversion factor pass CI unnoticed.
/// </summary>
public sealed class OracleMissingException(string what, string package, string detail)
    : Exception($"{what} is missing ({detail}): install it with 'apt-get install {package}' " +
                "(.ci/run installs units and python3-pint). The oracle tests fail, not skip, without it.")
{
    public string Package { get; } = package;
}
