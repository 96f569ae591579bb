using System.Globalization;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Culture;

/// <summary>The assembly-wide culture switch for CI (<see cref="TestCultureInitializer"/>) does what it says.</summary>
[Collection(CultureCollection.Name)]
public class TestCulturePropertyTests
{
    [Fact]
    public void ApplySetsEveryCultureOfTheRun()
    {
        using (new CultureScope(CultureInfo.InvariantCulture))
        {
            TestCultureInitializer.Apply("de-DE");
            Assert.Equal("de-DE", CultureInfo.CurrentCulture.Name);
            Assert.Equal("de-DE", CultureInfo.CurrentUICulture.Name);
            Assert.Equal("de-DE", CultureInfo.DefaultThreadCurrentCulture?.Name);
            // A new thread starts in it too.
            string? onThread = null;
            var thread = new Thread(() => onThread = CultureInfo.CurrentCulture.Name);
            thread.Start();
            thread.Join();
            Assert.Equal("de-DE", onThread);
        }
    }

    [Fact]
    public void UnknownCultureNameIsRefused() =>
        Assert.ThrowsAny<CultureNotFoundException>(() => TestCultureInitializer.Apply("xx-NOT-A-CULTURE"));

    /// <summary>
    /// When CI sets the variable, the tests really run in that culture; when it does not, no
    /// test has left a process-wide culture behind.
    /// </summary>
    [Fact]
    public void EnvironmentCultureIsInEffect()
    {
        string? wanted = Environment.GetEnvironmentVariable(TestCultureInitializer.Variable);
        if (string.IsNullOrWhiteSpace(wanted))
            Assert.Null(CultureInfo.DefaultThreadCurrentCulture);
        else
            Assert.Equal(wanted.Trim(), CultureInfo.CurrentCulture.Name);
    }
}
