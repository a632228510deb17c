namespace Layers.Core.TimeStepping;

/// <summary>Receives the solution as the time loop advances. Implementations copy what they keep.</summary>
public interface ITimeLoopObserver
{
    /// <summary>
    /// Called at t = 0 and at every output time, in order. The state is exact where the loop lands (the end, the times
    /// of state events) and interpolated within the accepted step elsewhere (<see cref="TimeLoopPlan"/>).
    /// </summary>
    /// <param name="timeSeconds">The output time.</param>
    /// <param name="state">u at every node; valid only during the call.</param>
    /// <param name="bathInflow">Mass per area that has entered the stack from each bath since t = 0, kg/m2.</param>
    void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow);

    /// <summary>Called after every accepted step, including steps beyond the end time.</summary>
    /// <param name="timeSeconds">The time at the end of the step.</param>
    /// <param name="state">u at every node at the end of the step; valid only during the call.</param>
    /// <param name="bathInflow">Mass per area that has entered the stack from each bath since t = 0, kg/m2.</param>
    /// <param name="dense">The solution inside the step, for placing a time within it; valid only during the call.</param>
    void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense);

    /// <summary>
    /// Asked after the end time is reached and after each later step: true to keep integrating (no outputs) until
    /// the horizon, for example to find when equilibrium is reached.
    /// </summary>
    bool WantsMoreTime { get; }
}

/// <summary>Cumulative mass per area that entered the stack from the left and right baths, kg/m2.</summary>
/// <param name="LeftPerArea">From the left bath.</param>
/// <param name="RightPerArea">From the right bath.</param>
public readonly record struct BathTotals(double LeftPerArea, double RightPerArea);
