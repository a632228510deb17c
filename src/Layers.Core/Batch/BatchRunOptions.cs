using Layers.Core.Cases;

namespace Layers.Core.Batch;

/// <summary>Where and how a batch runs (<see cref="BatchRunner.Run"/>).</summary>
/// <param name="OutputRoot">The folder that receives one folder per case.</param>
/// <param name="Jobs">How many cases run at once (at least 1).</param>
public sealed record BatchRunOptions(string OutputRoot, int Jobs)
{
    /// <summary>
    /// Whether each case the exact method solves is also solved by the finite volumes and compared; off by default in a
    /// batch, whose cases would otherwise cost the finite volumes' time as well.
    /// </summary>
    public bool CheckExactByFiniteVolumes { get; init; }

    /// <summary>Which files a case may name (its measured data); by default only those in its own folder.</summary>
    public CaseFileAccess Access { get; init; } = CaseFileAccess.InsideCaseFolder;
}
