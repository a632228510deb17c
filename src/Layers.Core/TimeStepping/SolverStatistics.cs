using System.Globalization;

namespace Layers.Core.TimeStepping;

/// <summary>Counters of one solve.</summary>
public sealed record SolverStatistics
{
    /// <summary>Steps accepted.</summary>
    public int AcceptedSteps { get; init; }

    /// <summary>Steps rejected (error too large or a negative value) and retried smaller.</summary>
    public int RejectedSteps { get; init; }

    /// <summary>Smallest accepted step, s.</summary>
    public double SmallestStepSeconds { get; init; }

    /// <summary>Largest accepted step, s.</summary>
    public double LargestStepSeconds { get; init; }

    /// <summary>Unknowns: cells plus compartments.</summary>
    public int Unknowns { get; init; }

    /// <summary>Wall time of the time loop, s.</summary>
    public double WallSeconds { get; init; }

    /// <summary>Why the loop ended.</summary>
    public StopReason StopReason { get; init; }

    /// <inheritdoc />
    public override string ToString() => string.Create(
        CultureInfo.InvariantCulture,
        $"{AcceptedSteps} steps accepted, {RejectedSteps} rejected, {Unknowns} unknowns, " +
        $"dt {SmallestStepSeconds:G3} to {LargestStepSeconds:G3} s, {WallSeconds * 1e3:F1} ms, {StopReason}");
}
