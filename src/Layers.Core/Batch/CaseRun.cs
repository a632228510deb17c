using System.Diagnostics;
using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Core.TimeStepping;

namespace Layers.Core.Batch;

/// <summary>
/// The pipeline of one case, shared by <c>layers run</c> and batches: read, solve (the run's own checks included),
/// make the files through the caller's delegate (plots are the caller's business), commit the case folder as a whole
/// (<see cref="CaseOutputFolder"/>). Cancellation is honoured in every phase and leaves nothing written. The outcome
/// carries the status and the message, worded once for both callers.
/// </summary>
public static class CaseRun
{
    /// <summary>The message of a run cancelled before its folder was committed.</summary>
    public const string CancelledMessage = "cancelled; no results were written.";

    /// <summary>Runs one case.</summary>
    /// <param name="request">The case and where its folder goes.</param>
    /// <param name="buildFiles">
    /// The files to write for the solved case, by name (summary.json, CSV, plots ...); it may throw
    /// <see cref="OperationCanceledException"/> once <paramref name="cancellation"/> fires.
    /// </param>
    /// <param name="phaseEnded">Told as each phase ends; may be null.</param>
    /// <param name="cancellation">Stops the run; nothing is written once it fires before the commit.</param>
    public static CaseRunOutcome Execute(
        CaseRunRequest request,
        Func<SimulationResult, CancellationToken, IReadOnlyDictionary<string, byte[]>> buildFiles,
        Action<CaseRunPhase>? phaseEnded,
        CancellationToken cancellation)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(buildFiles);
        var read = Read(request);
        phaseEnded?.Invoke(CaseRunPhase.Read);
        if (read.Case is not { } simulation)
        {
            return InvalidCase(read);
        }

        if (cancellation.IsCancellationRequested)
        {
            return Cancelled;
        }

        var clock = Stopwatch.StartNew();
        var result = Simulator.Run(simulation, request.CheckExactByFiniteVolumes, cancellation);
        var seconds = clock.Elapsed.TotalSeconds;
        phaseEnded?.Invoke(CaseRunPhase.Solve);
        if (result.Statistics.StopReason == StopReason.Cancelled)
        {
            return Cancelled with { SolveSeconds = seconds };
        }

        if (!result.Completed)
        {
            return new CaseRunOutcome(CaseRunStatus.SolverFailed, $"{result.FailureReason}; no results were written.") { Result = result, SolveSeconds = seconds };
        }

        var written = Commit(request, token => buildFiles(result, token), phaseEnded, cancellation);
        return written with { Result = result, SolveSeconds = seconds };
    }

    /// <summary>
    /// The last phases of a run, shared with the studies: makes the files (the delegate may throw
    /// <see cref="OperationCanceledException"/> once <paramref name="cancellation"/> fires) and commits the folder
    /// <c>OutputRoot/Name</c> of the request as a whole. Succeeded with the files and the folder, or cancelled or
    /// failed with nothing written.
    /// </summary>
    /// <param name="request">Where the folder goes.</param>
    /// <param name="buildFiles">The files, by name.</param>
    /// <param name="phaseEnded">Told as each phase ends; may be null.</param>
    /// <param name="cancellation">Checked before each file and before the folder is committed.</param>
    public static CaseRunOutcome Commit(
        CaseRunRequest request,
        Func<CancellationToken, IReadOnlyDictionary<string, byte[]>> buildFiles,
        Action<CaseRunPhase>? phaseEnded,
        CancellationToken cancellation)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(buildFiles);
        try
        {
            cancellation.ThrowIfCancellationRequested();
            var files = buildFiles(cancellation);
            phaseEnded?.Invoke(CaseRunPhase.BuildFiles);
            var folder = CaseOutputFolder.Write(request.OutputRoot, request.Name, files, cancellation);
            phaseEnded?.Invoke(CaseRunPhase.Write);
            return new CaseRunOutcome(CaseRunStatus.Succeeded, string.Empty) { Files = files, Folder = folder };
        }
        catch (OperationCanceledException) when (cancellation.IsCancellationRequested)
        {
            return Cancelled;
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return new CaseRunOutcome(CaseRunStatus.OutputFailed, $"cannot write results under '{request.OutputRoot}': {exception.Message}");
        }
    }

    /// <summary>The outcome of a run cancelled before its folder was committed.</summary>
    public static CaseRunOutcome Cancelled { get; } = new(CaseRunStatus.Cancelled, CancelledMessage);

    /// <summary>
    /// The outcome of a case file that cannot be read or breaks a rule: the errors joined as its message (a batch
    /// row), a line that counts them as its heading (a single run lists them below).
    /// </summary>
    public static CaseRunOutcome InvalidCase(CaseReadResult read)
    {
        ArgumentNullException.ThrowIfNull(read);
        return new CaseRunOutcome(CaseRunStatus.Invalid, Describe(read.Errors, read.FileName))
        {
            Errors = read.Errors,
            Heading = CaseRunOutcome.InvalidCaseHeading(read.Errors.Count),
        };
    }

    private static CaseReadResult Read(CaseRunRequest request)
    {
        if (request.Errors.Count > 0)
        {
            return new CaseReadResult(request.File, null, request.Errors);
        }

        return request.Json is { } json
            ? CaseDocument.ReadText(json, request.File, request.Access)
            : CaseDocument.ReadFile(request.File, request.Access);
    }

    private static string Describe(IReadOnlyList<CaseError> errors, string file) =>
        string.Join("; ", errors.Select(error => error.Format(file)));
}
