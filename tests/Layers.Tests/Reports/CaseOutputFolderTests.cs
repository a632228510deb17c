using Layers.Core.Reports;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Reports;

/// <summary>
/// The case folder is replaced whole: an old folder that cannot be removed does not turn a written result into a
/// failure, and hidden leftovers of a killed run are removed by a later run unless their writer still runs
/// (common practice, no source).
/// </summary>
public sealed class CaseOutputFolderTests
{
    private static readonly Dictionary<string, byte[]> Files = new() { ["summary.json"] = "{}"u8.ToArray() };

    [Fact]
    public void An_old_folder_that_cannot_be_removed_leaves_the_new_results_in_place_without_an_error()
    {
        using var temp = new TempFolder();
        CaseOutputFolder.Write(temp.Path, "case", new Dictionary<string, byte[]> { ["old.txt"] = [1] });

        // What the file system answers when the old folder holds a file the user may not delete (EACCES).
        var folder = CaseOutputFolder.Write(
            temp.Path, "case", Files, _ => throw new UnauthorizedAccessException("Access to the path is denied."), CancellationToken.None);

        Assert.Equal(["summary.json"], Directory.GetFiles(folder).Select(Path.GetFileName));
    }

    [Fact]
    public void A_staging_folder_left_by_a_process_that_no_longer_runs_is_removed_by_the_next_write()
    {
        using var temp = new TempFolder();
        // Linux process ids stay below 2^22 (pid_max; from memory), so this writer cannot be running.
        var leftover = temp.Combine(".case.writing-999999999-0123abcd");
        Directory.CreateDirectory(leftover);
        File.WriteAllBytes(Path.Combine(leftover, "profiles.csv"), []);

        CaseOutputFolder.Write(temp.Path, "other", Files);

        Assert.False(Directory.Exists(leftover));
        Assert.Equal(["other"], Directory.GetFileSystemEntries(temp.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void Leftovers_of_a_live_writer_or_whose_results_are_missing_are_kept_and_old_unowned_ones_removed()
    {
        using var temp = new TempFolder();
        var now = DateTime.UtcNow;
        string Make(string name, TimeSpan age)
        {
            var path = temp.Combine(name);
            Directory.CreateDirectory(path);
            Directory.SetLastWriteTimeUtc(path, now - age);
            return path;
        }

        var live = Make(".a.writing-42-0123abcd", TimeSpan.FromMinutes(5));
        var liveButAncient = Make(".b.writing-42-0123abcd", TimeSpan.FromDays(2));
        var deadWithoutResults = Make(".c.previous-7-0123abcd", TimeSpan.FromMinutes(5));
        var youngUnowned = Make(".d.writing-0123abcd", TimeSpan.FromMinutes(5));
        var oldUnowned = Make(".e.writing-0123abcd", TimeSpan.FromHours(2));
        var deadWithResults = Make(".f.previous-7-0123abcd", TimeSpan.FromMinutes(5));
        Directory.CreateDirectory(temp.Combine("f"));

        var removed = StagingNames.SweepStale(temp.Path, isRunning: pid => pid == 42, now);

        Assert.Equal(3, removed);
        Assert.True(Directory.Exists(live));
        Assert.False(Directory.Exists(liveButAncient));
        Assert.True(Directory.Exists(deadWithoutResults));
        Assert.True(Directory.Exists(youngUnowned));
        Assert.False(Directory.Exists(oldUnowned));
        Assert.False(Directory.Exists(deadWithResults));
    }

    [Fact]
    public void A_write_cancelled_before_its_renames_keeps_the_earlier_results_and_leaves_no_staging_folder()
    {
        using var temp = new TempFolder();
        CaseOutputFolder.Write(temp.Path, "case", new Dictionary<string, byte[]> { ["old.txt"] = [1] });
        using var cancelled = new CancellationTokenSource();
        cancelled.Cancel();

        Assert.Throws<OperationCanceledException>(() => CaseOutputFolder.Write(temp.Path, "case", Files, cancelled.Token));

        Assert.Equal(["case"], Directory.GetFileSystemEntries(temp.Path).Select(Path.GetFileName));
        Assert.Equal(["old.txt"], Directory.GetFiles(temp.Combine("case")).Select(Path.GetFileName));
    }
}
