using CutSheet.Language.Diagnostics;
using CutSheet.Language.Evaluation;

namespace CutSheet.Language.Tests.Imports;

/// <summary>
/// <c>use "path"</c> in a workspace of files: it stays inside by the path its links resolve to
/// (LANGUAGE.md G), a linked folder may lead inside, never out, however the links are chained;
/// and a path that names no file says what was likely meant.
/// </summary>
public sealed class WorkspaceImportTests : IDisposable
{
    private readonly string _top = Directory.CreateTempSubdirectory("cutsheet-links-").FullName;
    private readonly string _workspace;

    public WorkspaceImportTests()
    {
        _workspace = Directory.CreateDirectory(Path.Combine(_top, "ws")).FullName;
        Write("ws/deep/er/data.cutsheet", "d_0 = 16 mm\n");
        Write("outside/data.cutsheet", "d_0 = 20 mm\n");
        // ws/alias → ws/deep/er: a link that stays inside.
        Directory.CreateSymbolicLink(Path.Combine(_workspace, "alias"), Path.Combine("deep", "er"));
        // ws/out → ../outside: a link straight out.
        Directory.CreateSymbolicLink(Path.Combine(_workspace, "out"), Path.Combine("..", "outside"));
        // ws/deep/er/up → ../../../outside, read from the folder the link sits in: out of the workspace,
        // though reached through ws/alias/up, whose text alone would suggest ws/outside.
        Directory.CreateSymbolicLink(Path.Combine(_workspace, "deep", "er", "up"), Path.Combine("..", "..", "..", "outside"));
    }

    [Theory]
    [InlineData("alias/data.cutsheet", null)]
    [InlineData("out/data.cutsheet", DiagnosticCodes.ImportOutsideWorkspace)]
    [InlineData("alias/up/data.cutsheet", DiagnosticCodes.ImportOutsideWorkspace)]
    [InlineData("deep/er/up/data.cutsheet", DiagnosticCodes.ImportOutsideWorkspace)]
    public void Links_are_resolved_before_the_workspace_is_checked(string target, string? code)
    {
        string sheet = Write("ws/main.cutsheet", $"use \"{target}\"\nx = d_0\n");
        var result = SheetRunner.Run(File.ReadAllText(sheet), sheet, new RunOptions { WorkspaceRoot = _workspace });
        var errors = result.Diagnostics.Where(d => d.Severity == Severity.Error).Select(d => d.Code).ToList();
        if (code is null) Assert.Empty(errors);
        else Assert.Contains(code, errors);
    }

    [Theory]
    [InlineData("deep/er/data")]
    [InlineData("screws")]
    public void A_quoted_path_that_names_no_file_says_what_was_likely_meant(string target)
    {
        string sheet = Write("ws/main.cutsheet", $"use \"{target}\"\n");
        var result = SheetRunner.Run(File.ReadAllText(sheet), sheet, new RunOptions { WorkspaceRoot = _workspace });
        var error = Assert.Single(result.Diagnostics, d => d.Code == DiagnosticCodes.ImportNotFound);
        Assert.Equal(target == "screws" ? DiagnosticMessages.LibraryQuoted(target) : DiagnosticMessages.ImportWithoutExtension(target), error.Message);
        Assert.Single(error.Fixes);
    }

    [Theory]
    [InlineData("ws/alias")]
    [InlineData("ws/alias/up")]
    [InlineData("ws/alias/up/data.cutsheet")]
    [InlineData("ws/out/../outside/data.cutsheet")]
    [InlineData("ws/deep/er/up/../ws/alias")]
    public void Real_path_agrees_with_the_system(string relative)
    {
        // Oracle: coreutils realpath, which resolves links as the kernel does ('..' after the links before it).
        string path = Path.Combine(_top, relative);
        Assert.Equal(SystemRealPath(path), RealPath.Of(path));
    }

    private static string SystemRealPath(string path)
    {
        var psi = new System.Diagnostics.ProcessStartInfo("realpath") { RedirectStandardOutput = true, UseShellExecute = false };
        psi.ArgumentList.Add(path);
        using var p = System.Diagnostics.Process.Start(psi)!;
        string output = p.StandardOutput.ReadToEnd().TrimEnd('\n');
        p.WaitForExit();
        Assert.Equal(0, p.ExitCode);
        return output;
    }

    private string Write(string relative, string text)
    {
        string path = Path.Combine(_top, relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
        return path;
    }

    public void Dispose()
    {
        try { Directory.Delete(_top, recursive: true); } catch (IOException) { }
    }
}
