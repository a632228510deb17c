using Layers.Core.Cases;

namespace Layers.Core.Batch;

/// <summary>One case to run through <see cref="CaseRun"/>.</summary>
/// <param name="File">The case file as given: named in messages, and the folder the files it names are looked up in.</param>
/// <param name="Name">The name of its result folder under <paramref name="OutputRoot"/>.</param>
/// <param name="OutputRoot">The folder that receives the case folder.</param>
public sealed record CaseRunRequest(string File, string Name, string OutputRoot)
{
    /// <summary>The document, already in memory (a batch item, a sweep's sub-case); null to read <see cref="File"/>.</summary>
    public string? Json { get; init; }

    /// <summary>Problems found before reading (an unreadable file, a broken sweep); when any, the case is invalid.</summary>
    public IReadOnlyList<CaseError> Errors { get; init; } = [];

    /// <summary>
    /// Whether a case the exact method solves is also solved by the finite volumes and compared (the independent check;
    /// <see cref="Simulation.Simulator.Run(Domain.SimulationCase, bool, CancellationToken)"/>): on for a single run, off in a batch unless asked for.
    /// </summary>
    public bool CheckExactByFiniteVolumes { get; init; } = true;

    /// <summary>Which files the case may name (its measured data).</summary>
    public CaseFileAccess Access { get; init; } = CaseFileAccess.InsideCaseFolder;
}
