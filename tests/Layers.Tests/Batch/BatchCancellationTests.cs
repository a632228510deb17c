using Layers.Core.Batch;
using Layers.Core.Results;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>Cancelling a batch: finished cases keep their results, the rest are marked and leave nothing behind.</summary>
public sealed class BatchCancellationTests
{
    [Fact]
    public void Cancelling_after_the_first_case_keeps_its_results_and_marks_the_others_cancelled()
    {
        using var temp = new TempFolder();
        var items = new[] { "one", "two", "three" }
            .Select(name => new BatchItem(name, $"{name}.json", BatchCases.Membrane, [], []))
            .ToList();
        using var cancellation = new CancellationTokenSource();

        var rows = BatchRunner.Run(items, new BatchRunOptions(temp.Path, Jobs: 1), Files, new CancelAfterFirst(cancellation), cancellation.Token);

        var finished = Assert.Single(rows, row => row.Status == BatchStatus.Succeeded);
        Assert.True(File.Exists(temp.Combine(finished.Name, "summary.json")));
        Assert.Equal(2, rows.Count(row => row.Status == BatchStatus.Cancelled));
        // Only the finished case's folder: no other folder and no half-written hidden staging folder.
        Assert.Equal([finished.Name], Directory.GetDirectories(temp.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void Summary_files_are_replaced_whole_and_leave_no_temporary_file()
    {
        using var temp = new TempFolder();
        var row = new BatchRow("a", "a.json", [], BatchStatus.Invalid, "broken", null);

        BatchSummaryFiles.WriteTo(temp.Path, [row]);
        BatchSummaryFiles.WriteTo(temp.Path, [row with { Message = "still broken" }]);

        Assert.Equal(["summary.csv", "summary.json", "summary.md", "timing.csv"], Directory.GetFiles(temp.Path).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.Contains("still broken", File.ReadAllText(temp.Combine("summary.csv")), StringComparison.Ordinal);
    }

    private static Dictionary<string, byte[]> Files(SimulationResult result, BatchItem item) =>
        new() { ["summary.json"] = System.Text.Encoding.UTF8.GetBytes(Layers.Core.Reports.SummaryJson.Write(result, item.File)) };

    private sealed class CancelAfterFirst(CancellationTokenSource source) : IBatchProgress
    {
        public void Started(BatchItem item)
        {
        }

        public void Finished(BatchRow row) => source.Cancel();
    }
}
