namespace CutSheet.Cli.Input;

/// <summary>Reads the <c>--set NAME=VALUE</c> options into the language's override table.</summary>
internal static class OverrideParser
{
    public static IReadOnlyDictionary<string, string> Parse(IEnumerable<string>? assignments)
    {
        var overrides = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (string assignment in assignments ?? [])
        {
            int eq = assignment.IndexOf('=');
            if (eq < 0) throw new CliUsageException($"--set '{assignment}': expected NAME=VALUE, e.g. --set \"d_0=20 mm\"");
            string name = assignment[..eq].Trim();
            string value = assignment[(eq + 1)..].Trim();
            if (name.Length == 0) throw new CliUsageException($"--set '{assignment}': the name before '=' is missing");
            if (value.Length == 0) throw new CliUsageException($"--set '{assignment}': the value after '=' is missing");
            // Two values for one input leave the reader guessing which one the results used.
            if (!overrides.TryAdd(name, value)) throw new CliUsageException($"--set {name} is given more than once");
        }
        return overrides;
    }
}
