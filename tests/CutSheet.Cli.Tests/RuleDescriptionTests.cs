using System.Reflection;
using CutSheet.Cli.Output.Sarif;
using CutSheet.Language.Diagnostics;

namespace CutSheet.Cli.Tests;

/// <summary>The SARIF rule table must keep up with the language's diagnostic codes.</summary>
public sealed class RuleDescriptionTests
{
    [Fact]
    public void Every_language_code_has_a_description()
    {
        var codes = typeof(DiagnosticCodes).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Where(f => f.IsLiteral && f.FieldType == typeof(string))
            .Select(f => (string)f.GetRawConstantValue()!)
            .ToList();
        Assert.NotEmpty(codes);
        Assert.Empty(codes.Except(RuleDescriptions.KnownCodes));
    }

    [Fact]
    public void Every_description_is_for_a_language_code()
    {
        var codes = typeof(DiagnosticCodes).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Select(f => (string?)f.GetRawConstantValue());
        Assert.Empty(RuleDescriptions.KnownCodes.Except(codes));
    }
}
