namespace Layers.Core.TimeStepping;

/// <summary>
/// The solution inside the step just accepted (dense output): what an observer reads to place a time within a step,
/// such as when a quantity crosses a level, as accurately as the step itself. Valid only during
/// <see cref="ITimeLoopObserver.OnStep"/>.
/// </summary>
public interface IDenseOutput
{
    /// <summary>Start of the step, s (on the observer's clock).</summary>
    double StartSeconds { get; }

    /// <summary>End of the step, s (on the observer's clock).</summary>
    double EndSeconds { get; }

    /// <summary>u at every node at a time within the step (clamped to it); valid until the next call.</summary>
    ReadOnlySpan<double> StateAt(double timeSeconds);
}

/// <summary>A scalar read from a state, such as a fraction of the way to the final state.</summary>
/// <param name="state">u at every node.</param>
public delegate double StateMeasure(ReadOnlySpan<double> state);
