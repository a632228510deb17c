using System.Text.Json;
using Layers.Cli;
using Layers.Core.Reports;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>The output options of <c>layers run</c>: --quiet, --json, --no-plots, plot size, and report.html.</summary>
public sealed class RunOutputOptionsTests
{
    private const string CaseName = "membrane-time-lag";

    private static string Case => RepoRoot.File("cases", CaseName + ".json");

    [Fact]
    public void Quiet_prints_nothing_and_still_writes_the_results()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Case, "--out", temp.Path, "--quiet", "--no-plots");

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Equal(string.Empty, outcome.Output);
        Assert.True(File.Exists(temp.Combine(CaseName, "summary.json")));
    }

    [Fact]
    public void Json_prints_exactly_the_summary_file()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Case, "--out", temp.Path, "--json", "--no-plots");

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Equal(File.ReadAllText(temp.Combine(CaseName, "summary.json")), outcome.Output);
        using var document = JsonDocument.Parse(outcome.Output);
        Assert.Equal(CautionText.Paragraph, document.RootElement.GetProperty("caution").GetString());
    }

    [Fact]
    public void No_plots_writes_no_png_and_a_report_without_pictures()
    {
        using var temp = new TempFolder();

        CliRun.Invoke("run", Case, "--out", temp.Path, "--no-plots", "-q");

        Assert.Empty(Directory.GetFiles(temp.Combine(CaseName), "*.png"));
        Assert.DoesNotContain("data:image/png", File.ReadAllText(temp.Combine(CaseName, "report.html")), StringComparison.Ordinal);
    }

    [Fact]
    public void Report_is_self_contained_with_pictures_inputs_results_and_the_caution()
    {
        using var temp = new TempFolder();

        CliRun.Invoke("run", Case, "--out", temp.Path, "-q", "--plot-width", "640", "--plot-height", "400");

        var html = File.ReadAllText(temp.Combine(CaseName, "report.html"));
        Assert.Equal(3, html.Split("data:image/png;base64,").Length - 1);
        Assert.DoesNotContain("src=\"http", html, StringComparison.Ordinal);
        Assert.DoesNotContain("<link", html, StringComparison.Ordinal);
        Assert.Contains(System.Net.WebUtility.HtmlEncode(CautionText.Paragraph), html, StringComparison.Ordinal);
        Assert.Contains("membrane", html, StringComparison.Ordinal);
        Assert.Contains("lag time", html, StringComparison.Ordinal);
        var png = File.ReadAllBytes(temp.Combine(CaseName, "profile.png"));
        // PNG IHDR: width and height are big-endian 32-bit integers at bytes 16 and 20 (ISO/IEC 15948, 11.2.2).
        Assert.Equal(640, (png[16] << 24) | (png[17] << 16) | (png[18] << 8) | png[19]);
        Assert.Equal(400, (png[20] << 24) | (png[21] << 16) | (png[22] << 8) | png[23]);
    }

    [Theory]
    [InlineData("--plot-width", "50")]
    [InlineData("--plot-height", "20000")]
    public void Plot_size_outside_the_range_is_a_usage_error(string option, string value)
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Case, "--out", temp.Path, option, value);

        Assert.Equal(ExitCodes.Usage, outcome.ExitCode);
        Assert.Contains("must be from 200 to 10000 pixels", outcome.Error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(temp.Combine(CaseName)));
    }

    [Fact]
    public void Timing_goes_to_stderr_and_leaves_the_json_on_stdout_intact()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Case, "--out", temp.Path, "--json", "--no-plots", "--timing");

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Matches(@"^timing: time loop [0-9.]+ ms \([0-9]+ steps accepted, [0-9]+ rejected, [0-9]+ cells", outcome.Error);
        Assert.Equal(File.ReadAllText(temp.Combine(CaseName, "summary.json")), outcome.Output);
    }

    [Fact]
    public void Timing_names_each_phase_of_the_run_and_the_time_since_the_process_started()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Case, "--out", temp.Path, "--no-plots", "--quiet", "--timing");

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Matches(
            @"(?m)^timing: phases read [0-9.]+ ms, solve [0-9.]+ ms, files [0-9.]+ ms, write [0-9.]+ ms, print [0-9.]+ ms, process start to here [0-9]+ ms$",
            outcome.Error);
    }
}
