using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>What the runner tells its caller as cases start and end (called from worker threads).</summary>
public interface IBatchProgress
{
    /// <summary>A case has started.</summary>
    void Started(BatchItem item);

    /// <summary>A case has ended, with its row.</summary>
    void Finished(BatchRow row);
}

/// <summary>
/// Runs the cases of a batch in parallel, at most <see cref="BatchRunOptions.Jobs"/> at a time. Each case is read, solved and written on
/// its own by the pipeline a single run uses (<see cref="CaseRun"/>): a bad or failing case becomes a row with its
/// message and never stops the others. Each case folder is written as a whole (<see cref="Reports.CaseOutputFolder"/>). On cancellation the cases running are stopped (in their solve,
/// or while their files are made or written: nothing of theirs is committed), the ones not started are marked
/// cancelled, and the cases already written keep their results.
/// </summary>
public static class BatchRunner
{
    /// <summary>Runs the cases and returns one row per case, in the order of <see cref="BatchRow.Ordered"/>.</summary>
    /// <param name="items">The cases.</param>
    /// <param name="options">Where the case folders go, how many cases run at once, which files a case may name.</param>
    /// <param name="buildFiles">
    /// The files to write for a solved case, by name (summary.json, CSV, plots ...); it may throw
    /// <see cref="OperationCanceledException"/> once <paramref name="cancellation"/> fires.
    /// </param>
    /// <param name="progress">Told about starts and ends; may be null.</param>
    /// <param name="cancellation">Stops the batch.</param>
    public static IReadOnlyList<BatchRow> Run(
        IReadOnlyList<BatchItem> items,
        BatchRunOptions options,
        Func<SimulationResult, BatchItem, IReadOnlyDictionary<string, byte[]>> buildFiles,
        IBatchProgress? progress,
        CancellationToken cancellation)
    {
        ArgumentNullException.ThrowIfNull(items);
        ArgumentNullException.ThrowIfNull(options);
        var rows = new BatchRow[items.Count];
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, options.Jobs) };
        // The token is checked per case rather than given to Parallel.For, which would throw instead of letting the
        // cases not started get their cancelled rows.
        Parallel.For(0, items.Count, parallel, index =>
        {
            var item = items[index];
            if (cancellation.IsCancellationRequested)
            {
                rows[index] = Row(item, BatchStatus.Cancelled, "not started: the run was cancelled");
                return;
            }

            progress?.Started(item);
            rows[index] = RunOne(item, options, buildFiles, cancellation);
            progress?.Finished(rows[index]);
        });
        return BatchRow.Ordered(rows);
    }

    private static BatchRow RunOne(
        BatchItem item,
        BatchRunOptions options,
        Func<SimulationResult, BatchItem, IReadOnlyDictionary<string, byte[]>> buildFiles,
        CancellationToken cancellation)
    {
        var request = new CaseRunRequest(item.File, item.Name, options.OutputRoot) { Json = item.Json, Errors = item.Errors, Access = options.Access, CheckExactByFiniteVolumes = options.CheckExactByFiniteVolumes };
        CaseRunOutcome outcome;
        try
        {
            outcome = CaseRun.Execute(request, (result, _) => buildFiles(result, item), phaseEnded: null, cancellation);
        }
#pragma warning disable CA1031 // One case's unexpected failure (a bug) must not stop the other cases: it becomes its row.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            return Row(item, BatchStatus.Failed, $"unexpected error: {exception.GetType().Name}: {exception.Message}");
        }

        return outcome.Status switch
        {
            CaseRunStatus.Succeeded => new BatchRow(item.Name, item.File, item.Parameters, BatchStatus.Succeeded, string.Empty, BatchKeyResults.From(outcome.Result!))
            {
                SolveSeconds = outcome.SolveSeconds,
                Limit = outcome.Limit,
                Inputs = item.Inputs,
                PeriodFigure = item.PeriodFigure is { } figure ? new PeriodFigureValue(figure, figure.Read(outcome.Result!)) : null,
            },
            CaseRunStatus.Invalid => Row(item, BatchStatus.Invalid, outcome.Message),
            CaseRunStatus.SolverFailed or CaseRunStatus.OutputFailed => Row(item, BatchStatus.Failed, outcome.Message),
            CaseRunStatus.Cancelled => Row(item, BatchStatus.Cancelled, outcome.Message),
            _ => throw new InvalidOperationException($"unknown status {outcome.Status}"),
        };
    }

    private static BatchRow Row(BatchItem item, BatchStatus status, string message) =>
        new(item.Name, item.File, item.Parameters, status, message, null) { Inputs = item.Inputs };
}
