using System.Diagnostics;
using System.Runtime.CompilerServices;

namespace CutSheet.LanguageServer.Tests;

/// <summary>
/// Runs the Node end-to-end suite (tests/lsp-e2e: the real LSP client library against the real
/// <c>cutsheet lsp</c> process) so that <c>dotnet test CutSheet.sln</c> runs everything. The
/// server is the <c>cutsheet.dll</c> built next to these tests. Needs node and npm on PATH;
/// <c>npm ci</c> runs first when node_modules is missing.
/// </summary>
public sealed class EndToEndTests
{
    private static string SuiteFolder([CallerFilePath] string here = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "lsp-e2e"));

    [Fact]
    public void Node_suite_with_the_real_client_passes()
    {
        string folder = SuiteFolder();
        string dll = Path.Combine(AppContext.BaseDirectory, "cutsheet.dll");
        Assert.True(File.Exists(dll), $"the server is not built next to the tests: {dll}");
        if (!Directory.Exists(Path.Combine(folder, "node_modules")))
        {
            var install = Run("npm", ["ci", "--no-audit", "--no-fund"], folder, dll, TimeSpan.FromMinutes(5));
            Assert.True(install.Code == 0, $"npm ci failed ({install.Code}):\n{install.Output}");
        }
        var suite = Run("node", ["--test", "--test-concurrency=1", "."], folder, dll, TimeSpan.FromMinutes(3));
        Assert.True(suite.Code == 0, $"node --test failed ({suite.Code}):\n{suite.Output}");
        Assert.Contains("# fail 0", suite.Output);
    }

    /// <summary>
    /// More real clients, each running the configuration documented in docs/editors.md headless
    /// against the built server: Neovim 0.7 (diagnostics, hover, edit, code lenses) and Emacs 28
    /// with eglot 1.9 in batch mode (Flymake diagnostics, hover, formatting, an edit that clears
    /// the error). Debian packages, installed by .ci/run; a missing editor fails the test rather
    /// than skipping it.
    /// </summary>
    [Theory]
    [InlineData("nvim", "neovim", "apt-get install neovim")]
    [InlineData("emacs", "emacs", "apt-get install emacs-nox elpa-eglot")]
    public void Editor_with_the_documented_configuration_passes(string program, string folder, string install)
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "cutsheet.dll");
        string script = Path.Combine(SuiteFolder(), folder, "check.sh");
        var probe = Run("bash", ["-c", "command -v " + program], SuiteFolder(), dll, TimeSpan.FromSeconds(10));
        Assert.True(probe.Code == 0, $"{program} is not installed: {install} (.ci/run installs it)");
        var check = Run("bash", [script, dll], SuiteFolder(), dll, TimeSpan.FromMinutes(2));
        Assert.True(check.Code == 0, $"the {folder} check failed ({check.Code}):\n{check.Output}");
        Assert.Contains(folder + " check passed", check.Output);
    }

    /// <summary>The configurations docs/editors.md shows are the files the client checks run.</summary>
    [Theory]
    [InlineData("lua", "neovim/cutsheet.lua")]
    [InlineData("elisp", "emacs/cutsheet.el")]
    public void Documented_editor_configuration_is_the_tested_file(string fence, string file)
    {
        string doc = File.ReadAllText(Path.Combine(SuiteFolder(), "..", "..", "docs", "editors.md"));
        var block = System.Text.RegularExpressions.Regex.Match(doc, "```" + fence + "\n(.*?)```", System.Text.RegularExpressions.RegexOptions.Singleline);
        Assert.True(block.Success, $"docs/editors.md has no ```{fence} block");
        string tested = File.ReadAllText(Path.Combine(SuiteFolder(), file));
        Assert.Contains(block.Groups[1].Value.Trim(), tested);
    }

    private static (int Code, string Output) Run(string program, string[] args, string folder, string dll, TimeSpan timeout)
    {
        var start = new ProcessStartInfo(program) { WorkingDirectory = folder, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in args) start.ArgumentList.Add(a);
        start.Environment["CUTSHEET_DLL"] = dll;
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            process.Kill(entireProcessTree: true);
            return (-1, $"timed out after {timeout}\n{stdout.Result}\n{stderr.Result}");
        }
        return (process.ExitCode, stdout.Result + "\n" + stderr.Result);
    }
}
