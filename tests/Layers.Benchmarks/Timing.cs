using System.Diagnostics;

namespace Layers.Benchmarks;

/// <summary>Median wall time of repeated runs, for the work-precision diagram (BenchmarkDotNet does the benchmarks).</summary>
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

    private static double Time(Action action)
    {
        var clock = Stopwatch.StartNew();
        action();
        return clock.Elapsed.TotalSeconds;
    }
}
