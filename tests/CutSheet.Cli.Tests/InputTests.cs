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
    public void Linked_folders_are_followed_once_and_a_sheet_keeps_its_own_path()
    {
        using var dir = new TempDirectory();
        string sheet = dir.Write("sub/a.cutsheet", "a = 1 mm\n");
        // A link back up the tree (a cycle) and a second way into sub/.
        Directory.CreateSymbolicLink(Path.Combine(dir.Path, "sub", "up"), "..");
        Directory.CreateDirectory(Path.Combine(dir.Path, "other"));
        Directory.CreateSymbolicLink(Path.Combine(dir.Path, "other", "same"), Path.Combine("..", "sub"));
        string linkedOnly = dir.Write("elsewhere/b.cutsheet", "b = 1 mm\n");
        Directory.CreateSymbolicLink(Path.Combine(dir.Path, "sub", "far"), Path.Combine("..", "elsewhere"));
        // From sub/ and other/: b only through the link far/, and other/same/ is sub/ again.
        Assert.Equal([sheet, Path.Combine(dir.Path, "sub", "far", "b.cutsheet")],
            SheetPathExpander.Expand([Path.Combine(dir.Path, "sub"), Path.Combine(dir.Path, "other")], dir.Path));
        // From the top, every sheet by its own path.
        Assert.Equal([linkedOnly, sheet], SheetPathExpander.Expand(["."], dir.Path));
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
