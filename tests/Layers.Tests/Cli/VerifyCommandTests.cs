using Layers.Cli;
using Layers.Core.Verification;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// <c>layers verify</c>: the shipped benchmarks (each against a published analytic solution named in
/// VerificationSuite) pass, and the report it writes is the committed docs/validation.md.
/// </summary>
public sealed class VerifyCommandTests
{
    [Fact]
    public void Every_benchmark_passes_and_the_report_matches_the_committed_validation_page()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("verify", "--report", temp.Path);

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Output + outcome.Error);
        Assert.Contains("all 11 benchmarks pass", outcome.Output, StringComparison.Ordinal);
        Assert.Equal(
            File.ReadAllText(RepoRoot.File("docs", "validation.md")),
            File.ReadAllText(temp.Combine("validation.md")));
        Assert.NotEmpty(Directory.GetFiles(temp.Combine("validation"), "*.png"));
    }

    [Fact]
    public void A_benchmark_outside_its_tolerance_is_reported_as_failing()
    {
        var exact = new BenchmarkResult("b", "s", "q", 1.0, 1.0005, 1e-3);
        var off = exact with { Computed = 1.01 };

        Assert.True(exact.Passed);
        Assert.False(off.Passed);
        Assert.Contains("| FAIL |", ValidationMarkdown.Write([exact, off], new Dictionary<int, string>()), StringComparison.Ordinal);
    }
}
