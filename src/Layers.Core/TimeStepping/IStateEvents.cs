namespace Layers.Core.TimeStepping;

/// <summary>
/// Instant changes of the state at output times, such as withdrawing a sample from a compartment and replacing it
/// with fresh medium. The loop lands on every output time, reports the state there, then lets the events change it
/// before the next step.
/// </summary>
public interface IStateEvents
{
    /// <summary>Applies whatever happens at <paramref name="timeSeconds"/> to <paramref name="state"/> (u at every node).</summary>
    void Apply(double timeSeconds, Span<double> state);
}
