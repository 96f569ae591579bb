using System.Globalization;
using System.Runtime.CompilerServices;

namespace CutSheet.Language.Tests.Culture;

/// <summary>
/// Lets CI run the whole test assembly under another culture (LANGUAGE.md A.7: "tests run
/// under a decimal-comma culture too"): when <c>CUTSHEET_TEST_CULTURE</c> is set, e.g. to
/// <c>de-DE</c>, every thread of the run uses it as current and UI culture, as an engineer's
/// machine would. An unknown culture name fails the run at load rather than testing nothing.
/// </summary>
public static class TestCultureInitializer
{
    public const string Variable = "CUTSHEET_TEST_CULTURE";

    [ModuleInitializer]
    public static void FromEnvironment()
    {
        string? name = Environment.GetEnvironmentVariable(Variable);
        if (!string.IsNullOrWhiteSpace(name)) Apply(name.Trim());
    }

    public static void Apply(string name)
    {
        var culture = CultureInfo.GetCultureInfo(name, predefinedOnly: true);
        CultureInfo.DefaultThreadCurrentCulture = culture;
        CultureInfo.DefaultThreadCurrentUICulture = culture;
        CultureInfo.CurrentCulture = culture;
        CultureInfo.CurrentUICulture = culture;
    }
}
