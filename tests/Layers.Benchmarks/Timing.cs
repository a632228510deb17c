using System.Diagnostics;

namespace Layers.Benchmarks;

/// <summary>
/// Wall times of repeated runs, for the work-precision diagram and the stiff-peer comparison (BenchmarkDotNet does
/// the benchmarks).
/// </summary>
public static class Timing
{
    /// <summary>
    /// Runs the action once to warm it up, then repeatedly: 31 times when one run is under 20 ms, 11 times under
    /// 200 ms, else 5; returns the median and the number of timed runs.
    /// </summary>
    public static (double MedianSeconds, int Runs) Median(Action action)
    {
        ArgumentNullException.ThrowIfNull(action);
        var first = Time(action);
        var runs = first < 0.02 ? 31 : first < 0.2 ? 11 : 5;
        var times = new double[runs];
        for (var i = 0; i < runs; i++)
        {
            times[i] = Time(action);
        }

        Array.Sort(times);
        return (times[runs / 2], runs);
    }

    /// <summary>
    /// Best wall time of repeated runs: first warm-up runs until at least 30 have run and 0.3 s have passed (or 2 s),
    /// so that the code is past the just-in-time compiler's first tier, then as many runs as fit in 0.2 s, at least 5
    /// and at most 200. The best, not the median, because the machine is shared: others can only slow a run down.
    /// </summary>
    public static double Best(Action action)
    {
        ArgumentNullException.ThrowIfNull(action);
        var warming = Stopwatch.StartNew();
        for (var runs = 0; (runs < 30 || warming.Elapsed.TotalSeconds < 0.3) && warming.Elapsed.TotalSeconds < 2; runs++)
        {
            action();
        }

        var best = double.PositiveInfinity;
        var spent = 0.0;
        for (var runs = 0; runs < 200 && (runs < 5 || spent < 0.2); runs++)
        {
            var time = Time(action);
            spent += time;
            best = Math.Min(best, time);
        }

        return best;
    }

    private static double Time(Action action)
    {
        var clock = Stopwatch.StartNew();
        action();
        return clock.Elapsed.TotalSeconds;
    }
}
