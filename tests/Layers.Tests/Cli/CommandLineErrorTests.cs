using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// Mistakes on the command line: each is a usage error, exit 64 (EX_USAGE of the BSD sysexits.h, from memory), with one
/// line on stderr naming the mistake, and nothing runs or is written.
/// </summary>
public sealed class CommandLineErrorTests
{
    private static string Case => RepoRoot.File("cases", "membrane-time-lag.json");

    [Theory]
    [InlineData("run", "--frobnicate")]
    [InlineData("run", "--no-plot")]
    [InlineData("check", "--frobnicate")]
    [InlineData("design", "--frobnicate")]
    [InlineData("uncertainty", "--frobnicate")]
    public void An_unknown_option_is_a_usage_error_and_not_a_case_file(string command, string option)
    {
        using var temp = new TempFolder();

        var outcome = command == "run"
            ? CliRun.Invoke(command, Case, option, "--out", temp.Path)
            : CliRun.Invoke(command, option);

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        var line = Assert.Single(outcome.ErrorLines);
        Assert.Contains($"unknown option '{option}'", line, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFileSystemEntries(temp.Path));
    }

    [Fact]
    public void An_unknown_option_among_merge_folders_is_a_usage_error()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("merge", temp.Path, "--frobnicate", "--out", temp.Combine("merged"));

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        Assert.Contains("unknown option '--frobnicate'", Assert.Single(outcome.ErrorLines), StringComparison.Ordinal);
        Assert.False(Directory.Exists(temp.Combine("merged")));
    }

    [Theory]
    [InlineData("99999999999")] // beyond the largest 32-bit integer, 2147483647
    [InlineData("-99999999999")]
    [InlineData("abc")]
    [InlineData("2.5")]
    public void A_jobs_value_that_is_no_whole_number_in_range_is_a_usage_error_without_a_stack_trace(string value)
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Case, "--jobs", value, "--out", temp.Path);

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        var line = Assert.Single(outcome.ErrorLines);
        Assert.Contains($"--jobs must be from 1 to 1024; got '{value}'", line, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFileSystemEntries(temp.Path));
    }

    [Fact]
    public void A_seed_beyond_the_integer_range_is_a_usage_error()
    {
        var outcome = CliRun.Invoke("uncertainty", RepoRoot.File("cases", "membrane-uncertain-diffusion.json"), "--seed", "99999999999");

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        Assert.Contains("--seed must be from 0 to", Assert.Single(outcome.ErrorLines), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("run", "--out")]
    [InlineData("design", "--out")]
    [InlineData("merge", "--out")]
    public void An_empty_output_folder_is_a_usage_error(string command, string option)
    {
        using var temp = new TempFolder();
        var argument = command == "merge" ? temp.Path : Case;

        var outcome = CliRun.Invoke(command, argument, option, string.Empty);

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        Assert.Contains($"{option} needs a path; got an empty value", Assert.Single(outcome.ErrorLines), StringComparison.Ordinal);
    }

    [Fact]
    public void A_usage_error_prints_one_line_and_not_the_help_text()
    {
        var outcome = CliRun.Invoke("run", Case, "--plot-width", "50");

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        Assert.Equal("layers run: --plot-width must be from 200 to 10000 pixels; got '50' (layers run --help lists the options)", Assert.Single(outcome.ErrorLines));
        Assert.Equal(string.Empty, outcome.Output);
    }

    [Fact]
    public void A_case_file_whose_name_starts_with_a_dash_runs_when_given_as_a_relative_path()
    {
        using var temp = new TempFolder();
        var file = temp.Combine("-dash.json");
        File.Copy(Case, file);

        var outcome = CliRun.Invoke("check", Path.Combine(temp.Path, ".", "-dash.json"));

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
    }
}
