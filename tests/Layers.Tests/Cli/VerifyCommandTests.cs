using Layers.Cli;
using Layers.Cli.Commands;
using Layers.Core.Batch;
using Layers.Core.Domain;
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
        Assert.Contains("all 28 benchmarks pass", outcome.Output, StringComparison.Ordinal);
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

    [Fact]
    public void The_title_names_the_fixed_mesh_and_step_tolerance_the_benchmarks_run_at()
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        var cells = Assert.IsType<CellCountMesh>(VerificationSuite.BenchmarkNumerics.Grid).TotalCells;
        Assert.Equal(1e-6, VerificationSuite.BenchmarkNumerics.Solver.RelativeTolerance);

        var code = VerifyCommand.Execute(null, output, error, _ => [new BenchmarkResult("b", "s", "q", 1.0, 1.0005, 1e-3)], CancellationToken.None);

        // The console table wraps its title to the table's width: the words are compared, not the lines.
        var words = string.Join(' ', output.ToString().Split([' ', '\n', '\r'], StringSplitOptions.RemoveEmptyEntries));
        Assert.Equal(ExitCodes.Success, code);
        Assert.Contains($"Analytic benchmarks at fixed numerics ({cells} cells, relative step tolerance 1e-6)", words, StringComparison.Ordinal);
        Assert.DoesNotContain("default accuracy", words, StringComparison.Ordinal);
        Assert.Contains($"at fixed numerics ({cells} cells, relative step tolerance 1e-6)", ValidationMarkdown.Write([], new Dictionary<int, string>()), StringComparison.Ordinal);
    }

    [Fact]
    public void Verify_cancelled_while_the_benchmarks_run_keeps_the_earlier_report_and_exits_130()
    {
        using var temp = new TempFolder();
        var earlier = temp.WriteFile("validation.md", "earlier report");
        using var cancellation = new CancellationTokenSource();
        using var output = new StringWriter();
        using var error = new StringWriter();
        IReadOnlyList<BenchmarkResult> CancelWhileRunning(CancellationToken token)
        {
            cancellation.Cancel(); // as if Ctrl+C came during the last benchmark
            return [new BenchmarkResult("b", "s", "q", 1.0, 1.5, 1e-3)];
        }

        var code = VerifyCommand.Execute(temp.Path, output, error, CancelWhileRunning, cancellation.Token);

        Assert.Equal(ExitCodes.Cancelled, code);
        Assert.Contains(CaseRun.CancelledMessage, error.ToString(), StringComparison.Ordinal);
        Assert.Equal("earlier report", File.ReadAllText(earlier));
        Assert.Equal([earlier], Directory.GetFileSystemEntries(temp.Path));
        Assert.Empty(output.ToString());
    }
}
