using System.Text.Json;

namespace CutSheet.Language.Tests.Oracles;

/// <summary>
/// pint (Debian package <c>python3-pint</c>, 0.19 measured) as an oracle, run with the system
/// python so a virtual environment cannot change the answer. Spelling traps: <c>in</c> is a Python
/// keyword (write <c>inch</c>), <c>mil</c> is a milliradian (write <c>thou</c>), <c>Btu</c> is the
/// ISO Btu 1055.056 J (write <c>Btu_it</c> for the International Table Btu).
/// </summary>
public static class Pint
{
    public const string Python = "/usr/bin/python3";
    public const string Package = "python3-pint";

    /// <summary>One registry, every query from a JSON list on stdin; one answer per query, a number or the error text.</summary>
    private const string Script = """
        import importlib, json, sys
        try:
            pint = importlib.import_module(sys.argv[1])
        except ImportError as e:
            print("PINT-MISSING " + str(e), file=sys.stderr)
            sys.exit(3)
        ureg = pint.UnitRegistry()
        out = []
        for have, want in json.load(sys.stdin):
            try:
                out.append(float(ureg.parse_expression(have).to(want).magnitude))
            except Exception as e:
                out.append(type(e).__name__ + ": " + str(e))
        json.dump({"version": pint.__version__, "answers": out}, sys.stdout)
        """;

    /// <param name="module">The module to import; a test passes a missing one to see the failure.</param>
    public static (string Version, IReadOnlyList<OracleAnswer> Answers) Convert(IReadOnlyList<OracleQuery> queries, string module = "pint")
    {
        string stdin = JsonSerializer.Serialize(queries.Select(q => new[] { q.Have, q.Want }));
        // -I (isolated): PYTHONPATH and the user site cannot swap in another pint.
        var output = OracleProcess.Run(Python, ["-I", "-c", Script, module], stdin, "python3 " + Package);
        if (output.ExitCode == 3) throw new OracleMissingException($"the python module {module} for {Python}", Package, output.StdErr.Trim());
        if (output.ExitCode != 0) throw new InvalidOperationException($"pint oracle failed (exit {output.ExitCode}): {output.StdErr}");
        using var doc = JsonDocument.Parse(output.StdOut);
        var answers = doc.RootElement.GetProperty("answers").EnumerateArray()
            .Select(e => e.ValueKind == JsonValueKind.Number
                ? new OracleAnswer(e.GetDouble(), e.GetRawText())
                : new OracleAnswer(null, e.ToString()))
            .ToList();
        if (answers.Count != queries.Count) throw new InvalidOperationException($"pint answered {answers.Count} of {queries.Count} queries");
        return (doc.RootElement.GetProperty("version").GetString() ?? "?", answers);
    }
}
