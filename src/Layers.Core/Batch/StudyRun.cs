using System.Text.Json.Nodes;
using Layers.Core.Domain;
using Layers.Core.Studies;

namespace Layers.Core.Batch;

/// <summary>What a study run gave: how the pipeline ended (message and folder worded as for a case) and the study itself.</summary>
/// <param name="Run">How it ended, with the files and folder written on success; the same statuses and messages as a case.</param>
/// <param name="Study">The study's outcome; null when it was not run (an invalid case, cancelled before).</param>
public sealed record StudyRunOutcome<T>(CaseRunOutcome Run, T? Study)
    where T : class, IStudyOutcome
{
    /// <summary>The case as written in the file; null when it was not read here (a fit reads its own) or is invalid.</summary>
    public SimulationCase? Case { get; init; }
}

/// <summary>
/// The pipeline of a study (design, uncertainty, fit), the one of a case (<see cref="CaseRun"/>) with the study in
/// place of the single solve: read the case file once (<see cref="CaseDocument.ReadFileWithRoot"/>), check that it
/// declares the study, run the study, have the caller make its files, commit the study's folder as a whole
/// (<see cref="CaseRun.Commit"/>). Cancellation is honoured in every phase and leaves nothing written; the messages
/// are those of a case run.
/// </summary>
public static class StudyRun
{
    /// <summary>Runs a study that the case file declares in its section <paramref name="section"/>.</summary>
    /// <param name="request">The case file and where the study's folder goes (<see cref="CaseRunRequest.Name"/>).</param>
    /// <param name="section">The study key the case must declare: "design" or "uncertainty".</param>
    /// <param name="solve">Runs the study on the valid case and its document.</param>
    /// <param name="buildFiles">
    /// The files of a finished study of the case, by name; may throw <see cref="OperationCanceledException"/> once
    /// cancelled.
    /// </param>
    /// <param name="cancellation">Stops the study; nothing is written once it fires before the commit.</param>
    public static StudyRunOutcome<T> Execute<T>(
        CaseRunRequest request,
        string section,
        Func<SimulationCase, JsonObject, CancellationToken, T> solve,
        Func<SimulationCase, T, CancellationToken, IReadOnlyDictionary<string, byte[]>> buildFiles,
        CancellationToken cancellation)
        where T : class, IStudyOutcome
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(solve);
        ArgumentNullException.ThrowIfNull(buildFiles);
        var read = CaseDocument.ReadFileWithRoot(request.File, request.Access);
        if (read.Read.Case is not { } simulation || read.Root is not { } root)
        {
            return new StudyRunOutcome<T>(CaseRun.InvalidCase(read.Read), null);
        }

        if (!root.ContainsKey(section))
        {
            return new StudyRunOutcome<T>(
                new CaseRunOutcome(CaseRunStatus.Invalid, $"$.{section}: the case declares no {section} study; see docs/case-format.md, section \"{char.ToUpperInvariant(section[0])}{section[1..]}\""),
                null);
        }

        return Finish(request, token => solve(simulation, root, token), (study, token) => buildFiles(simulation, study, token), cancellation) with
        {
            Case = simulation,
        };
    }

    /// <summary>
    /// The phases after reading, for a study whose inputs the caller has read and checked (a fit, with its measured
    /// data): run it, make its files, commit its folder.
    /// </summary>
    /// <param name="request">Where the study's folder goes.</param>
    /// <param name="solve">Runs the study.</param>
    /// <param name="buildFiles">The files of a finished study, by name; may throw <see cref="OperationCanceledException"/> once cancelled.</param>
    /// <param name="cancellation">Stops the study; nothing is written once it fires before the commit.</param>
    public static StudyRunOutcome<T> Finish<T>(
        CaseRunRequest request,
        Func<CancellationToken, T> solve,
        Func<T, CancellationToken, IReadOnlyDictionary<string, byte[]>> buildFiles,
        CancellationToken cancellation)
        where T : class, IStudyOutcome
    {
        ArgumentNullException.ThrowIfNull(solve);
        ArgumentNullException.ThrowIfNull(buildFiles);
        if (cancellation.IsCancellationRequested)
        {
            return new StudyRunOutcome<T>(CaseRun.Cancelled, null);
        }

        var study = solve(cancellation);
        switch (study.Status)
        {
            case StudyStatus.Cancelled:
                return new StudyRunOutcome<T>(CaseRun.Cancelled, study);
            case StudyStatus.Invalid:
                return new StudyRunOutcome<T>(new CaseRunOutcome(CaseRunStatus.Invalid, $"{study.Message}; no results were written.") { Errors = study.Errors }, study);
            case StudyStatus.SolverFailed:
                return new StudyRunOutcome<T>(new CaseRunOutcome(CaseRunStatus.SolverFailed, $"{study.Message}; no results were written."), study);
            case StudyStatus.Done:
            case StudyStatus.NotReached:
                return new StudyRunOutcome<T>(CaseRun.Commit(request, token => buildFiles(study, token), phaseEnded: null, cancellation), study);
            default:
                throw new ArgumentOutOfRangeException(nameof(solve), study.Status, "unknown study status");
        }
    }
}
