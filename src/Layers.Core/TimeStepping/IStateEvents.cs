namespace Layers.Core.TimeStepping;

/// <summary>
/// Instant changes of the state at given times, such as withdrawing a sample from a compartment and replacing it
/// with fresh medium. The loop lands exactly on each of these times, reports any output due there, then lets the
/// events change the state before the next step.
/// </summary>
public interface IStateEvents
{
    /// <summary>The times at which the state changes, s, ascending, on the clock of the loop that applies them.</summary>
    IReadOnlyList<double> TimesSeconds { get; }

    /// <summary>Applies whatever happens at <paramref name="timeSeconds"/> to <paramref name="state"/> (u at every node).</summary>
    void Apply(double timeSeconds, Span<double> state);
}
