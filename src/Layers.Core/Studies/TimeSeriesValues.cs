using Layers.Core.Results;

namespace Layers.Core.Studies;

/// <summary>Reading a run's time series at a given time.</summary>
public static class TimeSeriesValues
{
    /// <summary>Relative closeness at which a sample counts as taken at the time asked for.</summary>
    private const double SameTime = 1e-9;

    /// <summary>
    /// The sample taken at <paramref name="seconds"/> (to 1e-9 relative), or null when the run has no output then.
    /// Studies add the times they read to the outputs of every run, so the values are the solver's own, not
    /// interpolated.
    /// </summary>
    public static StateSample? At(IReadOnlyList<StateSample> series, double seconds)
    {
        ArgumentNullException.ThrowIfNull(series);
        var low = 0;
        var high = series.Count - 1;
        while (low <= high)
        {
            var middle = (low + high) / 2;
            var time = series[middle].TimeSeconds;
            if (Math.Abs(time - seconds) <= SameTime * Math.Max(Math.Abs(seconds), 1e-300))
            {
                return series[middle];
            }

            if (time < seconds)
            {
                low = middle + 1;
            }
            else
            {
                high = middle - 1;
            }
        }

        return null;
    }
}
