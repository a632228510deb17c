using Layers.Core.Cases;

namespace Layers.Core.Batch;

/// <summary>Where and how a batch runs (<see cref="BatchRunner.Run"/>).</summary>
/// <param name="OutputRoot">The folder that receives one folder per case.</param>
/// <param name="Jobs">How many cases run at once (at least 1).</param>
public sealed record BatchRunOptions(string OutputRoot, int Jobs)
{
    /// <summary>Which files a case may name (its measured data); by default only those in its own folder.</summary>
    public CaseFileAccess Access { get; init; } = CaseFileAccess.InsideCaseFolder;
}
