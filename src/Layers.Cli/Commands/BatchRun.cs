using Layers.Core.Batch;
using Layers.Core.Reports;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers run</c> with several cases: collect and expand them, take this shard's part, run them in parallel,
/// draw the sweep plots, write summary.csv/.json/.md and timing.csv into the output folder, print the summary table.
/// </summary>
internal static class BatchRun
{
    public static int Execute(RunSettings settings, TextWriter output, TextWriter error, CancellationToken cancellation)
    {
        var collection = BatchCollector.Collect(settings.CasePaths, settings.Recursive).Shard(settings.Shard ?? ShardSpec.Whole);
        if (collection.Items.Count == 0)
        {
            error.WriteLine($"no case files in {string.Join(", ", settings.CasePaths)} (a folder stands for the *.json in it; --recursive looks into sub-folders)");
            return ExitCodes.InvalidInput;
        }

        var rows = BatchProgressDisplay.Run(collection.Items, settings, output, error, progress => BatchRunner.Run(
            collection.Items,
            new BatchRunOptions(settings.OutputRoot, settings.Jobs) { Access = settings.Access, CheckExactByFiniteVolumes = settings.CheckEveryCase },
            (result, item) => CaseFiles.Build(result, settings with { CasePath = item.File }, cancellation),
            progress,
            cancellation));
        try
        {
            if (settings.Plots && !cancellation.IsCancellationRequested)
            {
                WriteSweepPlots(collection.Sweeps, rows, settings);
            }

            BatchSummaryFiles.WriteTo(settings.OutputRoot, rows);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"cannot write the batch summary under '{settings.OutputRoot}': {exception.Message}");
            return ExitCodes.OutputFailed;
        }

        Report(rows, settings, output, error, cancellation.IsCancellationRequested);
        return OutcomeCode(rows, cancellation.IsCancellationRequested);
    }

    /// <summary>The exit code of a batch: cancelled, else 2 for any invalid or failed case, else 1 for any limit exceeded.</summary>
    public static int OutcomeCode(IReadOnlyList<BatchRow> rows, bool cancelled) =>
        cancelled ? ExitCodes.Cancelled
        : rows.Any(row => row.Status is BatchStatus.Invalid or BatchStatus.Failed or BatchStatus.Cancelled) ? ExitCodes.InvalidInput
        : rows.Any(row => row.Limit?.Exceeded == true) ? ExitCodes.LimitExceeded
        : ExitCodes.Success;

    /// <summary>Prints the summary table (or summary.json), the problems on stderr, and where the summary is.</summary>
    public static void Report(IReadOnlyList<BatchRow> rows, RunSettings settings, TextWriter output, TextWriter error, bool cancelled)
    {
        foreach (var row in rows.Where(row => row.Status != BatchStatus.Succeeded && (!cancelled || row.Status != BatchStatus.Cancelled)))
        {
            error.WriteLine($"{row.Name}: {BatchColumns.StatusName(row.Status)}: {row.Message}");
        }

        if (cancelled)
        {
            var finished = rows.Where(row => row.Status == BatchStatus.Succeeded).Select(row => row.Name).ToList();
            error.WriteLine($"cancelled: {finished.Count} of {rows.Count} cases had finished and keep their results" +
                (finished.Count > 0 ? ": " + string.Join(", ", finished) : "."));
        }

        if (settings.Json)
        {
            output.Write(BatchSummaryJson.Write(rows));
        }
        else if (!settings.Quiet)
        {
            ConsoleTables.Write(output, BatchTable.Of(rows));
            if (!cancelled && BatchTable.ExitCodeLine(rows) is { } why)
            {
                output.WriteLine(why);
            }

            output.WriteLine($"summary: {Path.Combine(settings.OutputRoot, BatchSummaryFiles.Markdown)}");
            output.WriteLine();
            output.WriteLine(CautionText.Paragraph);
        }
    }

    public static void WriteSweepPlots(IReadOnlyList<SweepGroup> sweeps, IReadOnlyList<BatchRow> rows, RunSettings settings)
    {
        foreach (var sweep in sweeps)
        {
            if (SweepPlot.Render(sweep, rows, settings.PlotOptions) is { } png)
            {
                AtomicFile.Write(Path.Combine(settings.OutputRoot, SweepPlotName(sweep)), png);
            }
        }
    }

    /// <summary>The plot of a sweep, beside the sub-case folders: <c>&lt;sweep file name&gt;.sweep.png</c>.</summary>
    public static string SweepPlotName(SweepGroup sweep) => $"{sweep.Name}.sweep.png";
}
