using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary><c>layers run</c> on several cases: statuses, rows, exit codes, determinism, shards and merge.</summary>
public sealed class BatchRunTests
{
    [Fact]
    public void A_folder_with_good_and_broken_cases_gives_each_its_row_and_exit_code_2()
    {
        using var temp = new TempFolder();
        BatchCases.WriteMixedFolder(temp, "in");

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "--jobs", "2");

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal(
            ["a-sweep.01_thickness-10um", "a-sweep.02_thickness-30um", "b-good", "c-negative", "d-broken"],
            rows.Select(row => row["case"]));
        Assert.Equal(["succeeded", "succeeded", "succeeded", "invalid", "invalid"], rows.Select(row => row["status"]));
        Assert.Matches(@"\$\.layers\[0\]\.thickness \(line \d+, column \d+\): must be > 0; got '-5 um'", rows[3]["message"]);
        Assert.Contains("not valid JSON", rows[4]["message"], StringComparison.Ordinal);
        Assert.All(rows.Take(3), row => Assert.Equal(string.Empty, row["message"]));
        Assert.True(File.Exists(temp.Combine("out", "b-good", "summary.json")));
        Assert.False(Directory.Exists(temp.Combine("out", "c-negative")));
        Assert.Contains("c-negative: invalid:", outcome.Error, StringComparison.Ordinal);
        // No limit key exists yet: the limit columns stay empty rather than showing a verdict.
        Assert.All(rows, row => Assert.Equal(string.Empty, row["limitVerdict"]));
    }

    [Fact]
    public void Recursive_takes_the_cases_in_sub_folders_and_all_good_cases_exit_0()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "one.json"), BatchCases.Membrane);
        temp.WriteFile(Path.Combine("in", "sub", "two.json"), BatchCases.Membrane);

        var flat = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("flat"), "--no-plots");
        var deep = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("deep"), "--no-plots", "--recursive");

        Assert.True(flat.ExitCode == ExitCodes.Success, flat.Error);
        Assert.Equal(ExitCodes.Success, deep.ExitCode);
        Assert.Equal(["one"], SummaryCsv.Read(temp.Combine("flat", "summary.csv")).Select(row => row["case"]));
        Assert.Equal(["one", "two"], SummaryCsv.Read(temp.Combine("deep", "summary.csv")).Select(row => row["case"]));
    }

    [Fact]
    public void The_summaries_are_byte_identical_whatever_the_number_of_jobs_and_shards_merge_into_the_same()
    {
        using var temp = new TempFolder();
        BatchCases.WriteMixedFolder(temp, "in");
        var input = temp.Combine("in");

        CliRun.Invoke("run", input, "--recursive", "--out", temp.Combine("one"), "--no-plots", "--jobs", "1");
        CliRun.Invoke("run", input, "--recursive", "--out", temp.Combine("four"), "--no-plots", "--jobs", "4");
        CliRun.Invoke("run", input, "--recursive", "--out", temp.Combine("s1"), "--no-plots", "--shard", "1/2");
        CliRun.Invoke("run", input, "--recursive", "--out", temp.Combine("s2"), "--no-plots", "--shard", "2/2");
        // The sweep file is in a temporary folder, outside the current folder, so merge needs leave to read it again.
        var merge = CliRun.Invoke("merge", temp.Combine("s1"), temp.Combine("s2"), "--out", temp.Combine("merged"), "--allow-outside-files");

        foreach (var file in new[] { "summary.csv", "summary.json" })
        {
            Assert.Equal(File.ReadAllBytes(temp.Combine("one", file)), File.ReadAllBytes(temp.Combine("four", file)));
            Assert.Equal(File.ReadAllBytes(temp.Combine("one", file)), File.ReadAllBytes(temp.Combine("merged", file)));
        }

        Assert.Equal(ExitCodes.InvalidInput, merge.ExitCode);
        var first = SummaryCsv.Read(temp.Combine("s1", "summary.csv")).Select(row => row["case"]).ToHashSet();
        var second = SummaryCsv.Read(temp.Combine("s2", "summary.csv")).Select(row => row["case"]).ToHashSet();
        Assert.Empty(first.Intersect(second));
        Assert.Equal(6, first.Count + second.Count);
        Assert.Equal(3, first.Count);
    }

    [Fact]
    public void Sharded_sweeps_get_their_plot_from_merge()
    {
        using var temp = new TempFolder();
        var sweep = temp.WriteFile("lag.json", BatchCases.ThicknessSweep("10 um", "20 um", "40 um"));
        string[] small = ["--plot-width", "400", "--plot-height", "300"];
        CliRun.Invoke(["run", sweep, "--out", temp.Combine("s1"), "--shard", "1/2", .. small]);
        CliRun.Invoke(["run", sweep, "--out", temp.Combine("s2"), "--shard", "2/2", .. small]);

        // The sweep file is in a temporary folder, outside the current folder, so merge needs leave to read it again.
        var merge = CliRun.Invoke("merge", temp.Combine("s1"), temp.Combine("s2"), "--out", temp.Combine("merged"), "--allow-outside-files");

        Assert.True(merge.ExitCode == ExitCodes.Success, merge.Error);
        Assert.False(File.Exists(temp.Combine("s1", "lag.sweep.png")));
        Assert.True(File.Exists(temp.Combine("merged", "lag.sweep.png")));
        Assert.Equal(3, SummaryCsv.Read(temp.Combine("merged", "summary.csv")).Count);
    }

    [Fact]
    public void Two_cases_with_one_name_keep_the_first_and_refuse_the_second()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("a", "same.json"), BatchCases.Membrane);
        temp.WriteFile(Path.Combine("b", "same.json"), BatchCases.Membrane);

        var outcome = CliRun.Invoke("run", temp.Combine("b"), temp.Combine("a"), "--out", temp.Combine("out"), "--no-plots");

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal(["succeeded", "invalid"], rows.Select(row => row["status"]));
        Assert.EndsWith(Path.Combine("a", "same.json"), rows[0]["file"], StringComparison.Ordinal);
        Assert.Contains("is already used by", rows[1]["message"], StringComparison.Ordinal);
        var markdown = File.ReadAllText(temp.Combine("out", "summary.md"));
        Assert.Contains(@"solve \[s\]", markdown, StringComparison.Ordinal);
        Assert.Contains(Layers.Core.Reports.CautionText.Paragraph, markdown, StringComparison.Ordinal);
    }

    [Fact]
    public void Merge_refuses_a_case_found_in_two_shards()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "one.json"), BatchCases.Membrane);
        CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("a"), "--no-plots", "--shard", "1/1");

        var outcome = CliRun.Invoke("merge", temp.Combine("a"), temp.Combine("a"), "--out", temp.Combine("merged"));

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Contains("is also in", outcome.Error, StringComparison.Ordinal);
        Assert.False(File.Exists(temp.Combine("merged", "summary.csv")));
    }

    [Fact]
    public void A_bad_shard_is_a_usage_error_with_its_own_code()
    {
        var outcome = CliRun.Invoke("run", "x.json", "--shard", "3/2");

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        Assert.Contains("--shard must be I/N", outcome.Error, StringComparison.Ordinal);
    }
}
