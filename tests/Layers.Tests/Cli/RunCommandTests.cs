using Layers.Cli;
using Layers.Core.Reports;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// <c>layers run CASE --out DIR</c>: exit codes, what goes to stdout and stderr, and the results folder, which is
/// written whole or not at all (exit codes from ExitCodes: 0 ok, 2 invalid input, 4 output failed).
/// </summary>
public sealed class RunCommandTests
{
    private const string CaseName = "laminate-fatty-food";
    private static readonly string[] ResultFiles =
        ["equilibrium.png", "profile.png", "profiles.csv", "report.html", "summary.json", "timeseries.csv", "transfer.png"];

    private static string Demo => RepoRoot.File("cases", CaseName + ".json");

    [Fact]
    public void Running_the_demo_writes_the_result_files_and_exits_0()
    {
        using var temp = new TempFolder();
        var root = temp.Combine("results");

        var outcome = CliRun.Invoke("run", Demo, "--out", root);

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
        Assert.Equal(string.Empty, outcome.Error);
        var folder = Path.Combine(root, CaseName);
        Assert.Equal(ResultFiles, Directory.GetFiles(folder).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.All(ResultFiles, name => Assert.True(new FileInfo(Path.Combine(folder, name)).Length > 0, $"{name} is empty"));
    }

    [Fact]
    public void Stdout_names_the_results_folder_and_carries_the_caution()
    {
        using var temp = new TempFolder();
        var root = temp.Combine("results");

        var outcome = CliRun.Invoke("run", Demo, "--out", root);

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Contains(Path.Combine(root, CaseName), outcome.Output, StringComparison.Ordinal);
        Assert.Contains(CautionText.Paragraph, outcome.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void The_short_option_o_is_the_same_as_out()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Demo, "-o", temp.Path);

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.True(File.Exists(temp.Combine(CaseName, "summary.json")));
    }

    [Fact]
    public void Running_again_replaces_the_case_folder_wholesale_and_leaves_no_hidden_folders()
    {
        using var temp = new TempFolder();
        var root = temp.Combine("results");
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", Demo, "--out", root).ExitCode);
        var stray = Path.Combine(root, CaseName, "notes-from-last-week.txt");
        File.WriteAllText(stray, "planted by the test");

        var second = CliRun.Invoke("run", Demo, "--out", root);

        Assert.True(second.ExitCode == ExitCodes.Success, second.Error);
        Assert.False(File.Exists(stray), "a file of the earlier folder survived the second run");
        Assert.Equal(ResultFiles, Directory.GetFiles(Path.Combine(root, CaseName)).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.Equal([CaseName], Directory.GetFileSystemEntries(root).Select(Path.GetFileName));
    }

    [Fact]
    public void Other_case_folders_under_the_same_root_are_left_alone()
    {
        using var temp = new TempFolder();
        var other = Path.Combine(temp.Path, "another-case");
        Directory.CreateDirectory(other);
        File.WriteAllText(Path.Combine(other, "summary.json"), "{}");

        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", Demo, "--out", temp.Path).ExitCode);

        Assert.Equal("{}", File.ReadAllText(Path.Combine(other, "summary.json")));
    }

    [Fact]
    public void An_invalid_case_exits_2_lists_every_error_on_stderr_prints_nothing_and_writes_no_folder()
    {
        using var temp = new TempFolder();
        var casePath = temp.WriteFile("film.json", CaseJson.MinimalWith(
            ("$.layers[0].thickness", "\"-5 um\""),
            ("$.layers[0].diffusionCoefficient", "\"2 mm\""),
            ("$.right.kind", "\"pipe\"")));
        var root = temp.Combine("results");

        var outcome = CliRun.Invoke("run", casePath, "--out", root);

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Equal(string.Empty, outcome.Output);
        foreach (var path in new[] { "$.layers[0].thickness", "$.layers[0].diffusionCoefficient", "$.right.kind" })
        {
            Assert.Contains(outcome.ErrorLines, line => line.StartsWith($"{casePath}: {path} (line ", StringComparison.Ordinal));
        }

        // docs/case-format.md, Validation messages: a first line counting the problems, then one line each.
        Assert.Equal($"{casePath}: invalid case (3 problems):", outcome.ErrorLines[0]);
        Assert.Equal(4, outcome.ErrorLines.Count);
        Assert.False(Directory.Exists(root), "an output folder was created for an invalid case");
    }

    [Fact]
    public void An_invalid_case_leaves_earlier_results_of_that_case_untouched()
    {
        using var temp = new TempFolder();
        var folder = temp.Combine(CaseName);
        Directory.CreateDirectory(folder);
        File.WriteAllText(Path.Combine(folder, "summary.json"), "earlier");
        var casePath = temp.WriteFile(Path.Combine("broken", CaseName + ".json"), CaseJson.MinimalWith(("$.duration", "\"0 d\"")));

        var outcome = CliRun.Invoke("run", casePath, "--out", temp.Path);

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Equal("earlier", File.ReadAllText(Path.Combine(folder, "summary.json")));
    }

    [Fact]
    public void A_missing_case_file_exits_2_with_the_file_named_on_stderr()
    {
        using var temp = new TempFolder();
        var casePath = temp.Combine("nowhere.json");

        var outcome = CliRun.Invoke("run", casePath, "--out", temp.Combine("results"));

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Equal(string.Empty, outcome.Output);
        Assert.Contains(outcome.ErrorLines, line => line.StartsWith($"{casePath}: $: cannot read the file", StringComparison.Ordinal));
        Assert.False(Directory.Exists(temp.Combine("results")));
    }

    [Fact]
    public void An_output_root_that_is_a_file_exits_4_and_leaves_the_file_as_it_was()
    {
        using var temp = new TempFolder();
        var blocker = temp.WriteFile("results", "not a folder");

        var outcome = CliRun.Invoke("run", Demo, "--out", blocker);

        Assert.Equal(ExitCodes.OutputFailed, outcome.ExitCode);
        Assert.Equal(string.Empty, outcome.Output);
        Assert.Contains(blocker, outcome.Error, StringComparison.Ordinal);
        Assert.Equal("not a folder", File.ReadAllText(blocker));
        Assert.Equal([blocker], Directory.GetFileSystemEntries(temp.Path));
    }

    [Fact]
    public void A_failed_write_leaves_the_earlier_results_byte_for_byte()
    {
        using var temp = new TempFolder();
        var root = temp.Combine("results");
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", Demo, "--out", root).ExitCode);
        var folder = Path.Combine(root, CaseName);
        var before = ResultFiles.ToDictionary(name => name, name => File.ReadAllBytes(Path.Combine(folder, name)));

        // An output root inside a file cannot be created.
        var outcome = CliRun.Invoke("run", Demo, "--out", Path.Combine(folder, "summary.json", "nested"));

        Assert.Equal(ExitCodes.OutputFailed, outcome.ExitCode);
        Assert.Equal(ResultFiles, Directory.GetFiles(folder).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.All(ResultFiles, name => Assert.Equal(before[name], File.ReadAllBytes(Path.Combine(folder, name))));
    }

    [Fact]
    public void When_the_case_folder_name_is_taken_by_a_file_the_run_exits_4_and_cleans_up_its_staging_folder()
    {
        using var temp = new TempFolder();
        var taken = temp.WriteFile(CaseName, "a file where the results folder would go");

        var outcome = CliRun.Invoke("run", Demo, "--out", temp.Path);

        Assert.Equal(ExitCodes.OutputFailed, outcome.ExitCode);
        Assert.Equal("a file where the results folder would go", File.ReadAllText(taken));
        Assert.Equal([taken], Directory.GetFileSystemEntries(temp.Path));
    }

    [Fact]
    public void A_missing_case_argument_is_a_usage_error()
    {
        var outcome = CliRun.Invoke("run");

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        Assert.NotEqual(string.Empty, outcome.Error);
    }
}
