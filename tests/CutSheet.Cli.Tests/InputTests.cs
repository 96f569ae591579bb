using CutSheet.Cli.Input;
using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary>The pieces that read the command line's inputs: --set, paths, workspace roots, file text.</summary>
public sealed class InputTests
{
    [Fact]
    public void Set_splits_at_the_first_equals_sign_and_trims()
    {
        var overrides = OverrideParser.Parse(["d_0 = 20 mm", "note=a=b"]);
        Assert.Equal("20 mm", overrides["d_0"]);
        Assert.Equal("a=b", overrides["note"]);
    }

    [Fact]
    public void No_set_gives_no_overrides()
    {
        Assert.Empty(OverrideParser.Parse(null));
    }

    [Fact]
    public void A_missing_path_names_itself()
    {
        var e = Assert.Throws<CliUsageException>(() => SheetPathExpander.Expand(["nope"], Sheets.Directory));
        Assert.StartsWith("nope:", e.Message);
    }

    [Fact]
    public void Hidden_folders_are_searched_too()
    {
        using var dir = new TempDirectory();
        string hidden = dir.Write(".hidden/h.cutsheet", "a = 1 mm\n");
        string visible = dir.Write("v.cutsheet", "a = 1 mm\n");
        Assert.Equal([hidden, visible], SheetPathExpander.Expand(["."], dir.Path));
    }

    [Fact]
    public void Only_the_cutsheet_extension_counts_in_directories()
    {
        using var dir = new TempDirectory();
        dir.Write("a.cutsheet.bak", "");
        dir.Write("b.txt", "");
        string sheet = dir.Write("c.cutsheet", "");
        Assert.Equal([sheet], SheetPathExpander.Expand([dir.Path], dir.Path));
    }

    [Fact]
    public void A_git_file_marks_a_workspace_root_like_a_git_folder()
    {
        using var dir = new TempDirectory();
        dir.Write("repo/.git", "gitdir: elsewhere\n");
        string sheet = dir.Write("repo/sub/s.cutsheet", "");
        Assert.Equal(Path.Combine(dir.Path, "repo"), WorkspaceRootLocator.Locate(sheet, explicitRoot: null));
    }

    [Fact]
    public void A_byte_order_mark_is_dropped()
    {
        Assert.Equal("a = 1 mm", SheetFileReader.Decode([0xEF, 0xBB, 0xBF, .. "a = 1 mm"u8.ToArray()]));
    }

    [Fact]
    public void A_sheet_with_a_byte_order_mark_evaluates()
    {
        using var dir = new TempDirectory();
        File.WriteAllBytes(Path.Combine(dir.Path, "bom.cutsheet"), [0xEF, 0xBB, 0xBF, .. "a = 1 mm\n"u8.ToArray()]);
        var outcome = CliDriver.RunIn(dir.Path, "run", "bom.cutsheet");
        Assert.True(outcome.ExitCode == 0, outcome.ToString());
    }
}
