using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Finds the first time a monotone-ish fraction reaches each threshold: the accepted step in which it crosses, then the
/// time within that step on the step's own interpolant (<see cref="DenseCrossing"/>), so the time is as accurate as the
/// solution rather than limited by a straight line between the step's ends.
/// </summary>
internal sealed class CrossingTracker
{
    private readonly IReadOnlyList<double> _levels;
    private readonly double?[] _times;
    private readonly StateMeasure _measure;

    /// <param name="levels">The thresholds, ascending.</param>
    /// <param name="initialFraction">The fraction at t = 0; thresholds it already reaches are reached at 0.</param>
    /// <param name="measure">The fraction of a state, evaluated on the interpolant of the step that crosses.</param>
    public CrossingTracker(IReadOnlyList<double> levels, double initialFraction, StateMeasure measure)
    {
        _levels = levels;
        _measure = measure;
        _times = new double?[levels.Count];
        for (var i = 0; i < levels.Count; i++)
        {
            if (initialFraction >= levels[i])
            {
                _times[i] = 0;
            }
        }
    }

    /// <summary>Times found so far, in the order of the levels.</summary>
    public IReadOnlyList<double?> Times => _times;

    /// <summary>True when every level has been reached.</summary>
    public bool AllReached => _times.All(time => time.HasValue);

    /// <summary>Feeds the fraction at the end of an accepted step, with the step's dense output.</summary>
    public void Observe(double fraction, IDenseOutput dense)
    {
        for (var i = 0; i < _levels.Count; i++)
        {
            if (_times[i] is null && fraction >= _levels[i])
            {
                _times[i] = DenseCrossing.Time(dense, _measure, _levels[i]);
            }
        }
    }
}
