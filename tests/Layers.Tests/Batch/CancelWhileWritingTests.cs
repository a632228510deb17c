using Layers.Cli;
using Layers.Cli.Commands;
using Layers.Core.Batch;
using Layers.Core.Results;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// Cancellation (Ctrl+C, SIGTERM) that comes after the solve, while plots and files are made or written, is honoured
/// as in the solve: nothing new is committed and the run reports itself cancelled, exit 130 (the shell's 128 +
/// SIGINT; common practice, no source).
/// </summary>
public sealed class CancelWhileWritingTests
{
    [Fact]
    public void A_batch_cancelled_while_a_case_makes_its_files_commits_nothing_and_marks_the_case_cancelled()
    {
        using var temp = new TempFolder();
        var items = new[] { new BatchItem("only", "only.json", BatchCases.Membrane, [], []) };
        using var cancellation = new CancellationTokenSource();
        Dictionary<string, byte[]> CancelThenFiles(SimulationResult result, BatchItem item)
        {
            cancellation.Cancel(); // as if Ctrl+C came while the plots were drawn
            return new() { ["summary.json"] = [1, 2, 3] };
        }

        var rows = BatchRunner.Run(items, new BatchRunOptions(temp.Path, Jobs: 1), CancelThenFiles, progress: null, cancellation.Token);

        var row = Assert.Single(rows);
        Assert.Equal(BatchStatus.Cancelled, row.Status);
        Assert.Empty(Directory.GetFileSystemEntries(temp.Path));
        Assert.Equal(ExitCodes.Cancelled, BatchRun.OutcomeCode(rows, cancelled: true));
    }

    [Fact]
    public void A_single_case_cancelled_while_its_plots_are_drawn_writes_nothing_and_exits_130()
    {
        using var temp = new TempFolder();
        var casePath = temp.WriteFile("membrane.json", BatchCases.Membrane);
        var root = temp.Combine("results");
        using var cancellation = new CancellationTokenSource();
        using var output = new StringWriter();
        using var error = new StringWriter();
        Dictionary<string, byte[]> CancelThenBuild(SimulationResult result, RunSettings settings, CancellationToken token)
        {
            cancellation.Cancel(); // as if Ctrl+C came just after the solve
            return CaseFiles.Build(result, settings, token);
        }

        var code = RunCommand.Execute(new RunSettings(casePath, root) { CasePaths = [casePath] }, output, error, CancelThenBuild, cancellation.Token);

        Assert.Equal(ExitCodes.Cancelled, code);
        Assert.Contains("cancelled; no results were written", error.ToString(), StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(root, "membrane")));
        Assert.True(!Directory.Exists(root) || Directory.GetFileSystemEntries(root).Length == 0);
    }
}
