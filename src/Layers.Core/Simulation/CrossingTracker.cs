namespace Layers.Core.Simulation;

/// <summary>
/// Finds the first time a monotone-ish fraction reaches each threshold, interpolating linearly within the step in
/// which it crosses (steps are small where the fraction changes fast, so the error is that of the step).
/// </summary>
internal sealed class CrossingTracker
{
    private readonly IReadOnlyList<double> _levels;
    private readonly double?[] _times;
    private double _previousTime;
    private double _previousFraction;

    public CrossingTracker(IReadOnlyList<double> levels, double initialFraction)
    {
        _levels = levels;
        _times = new double?[levels.Count];
        _previousFraction = initialFraction;
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

    /// <summary>Feeds the fraction after an accepted step.</summary>
    public void Observe(double timeSeconds, double fraction)
    {
        for (var i = 0; i < _levels.Count; i++)
        {
            if (_times[i] is null && fraction >= _levels[i])
            {
                var span = fraction - _previousFraction;
                var weight = span > 0 ? (_levels[i] - _previousFraction) / span : 1;
                _times[i] = _previousTime + (Math.Clamp(weight, 0, 1) * (timeSeconds - _previousTime));
            }
        }

        _previousTime = timeSeconds;
        _previousFraction = fraction;
    }
}
