using MathNet.Numerics.RootFinding;

namespace Layers.Core.Laplace;

/// <summary>
/// The first times a quantity of the exact solution reaches each of several levels (or one): one scan on log t shared by all
/// levels, then Brent's method on log t inside each level's first bracket.
/// </summary>
/// <remarks>
/// The scan takes the values a run already has at its output times (25 per decade over the last four decades of the
/// duration) and looks at six more times per decade beyond them up to the end of the search, or, with none known, six
/// per decade from twelve decades below the end; a level already reached at the first point of the scan is bracketed
/// by stepping down a decade at a time (down to thirty decades below the end). A level is missed only if the quantity
/// reaches it and falls back between two points of the scan.
/// </remarks>
internal static class FirstCrossings
{
    private const int PointsPerDecade = 6;
    private const int ScanDecades = 12;
    private const int DeepestDecades = 30;
    private const double LogTimeAccuracy = 1e-11;

    /// <summary>For each level (ascending), the first time in (0, upTo] where the quantity reaches it, or null.</summary>
    /// <param name="value">The quantity at a time.</param>
    /// <param name="levels">The levels, ascending.</param>
    /// <param name="upToSeconds">The end of the search.</param>
    /// <param name="known">
    /// Values already computed, at ascending times (a run's output times): the scan takes them as they are where they
    /// lie, and adds its own points only beyond them.
    /// </param>
    public static double?[] Find(Func<double, double> value, IReadOnlyList<double> levels, double upToSeconds, IReadOnlyList<(double TimeSeconds, double Value)>? known = null)
    {
        ArgumentNullException.ThrowIfNull(value);
        ArgumentNullException.ThrowIfNull(levels);
        var times = new double?[levels.Count];
        var end = Math.Log(upToSeconds);
        var step = Math.Log(10) / PointsPerDecade;
        var scan = new List<(double LogTime, double Value)>();
        var start = known is { Count: > 0 } ? Math.Log(known[^1].TimeSeconds) : end - (ScanDecades * PointsPerDecade * step);
        if (known is { Count: > 0 })
        {
            scan.AddRange(known.Where(point => point.TimeSeconds > 0).Select(point => (Math.Log(point.TimeSeconds), point.Value)));
        }
        else
        {
            scan.Add((start, value(Math.Exp(start))));
        }

        for (var next = start + step; next < end + (0.5 * step); next += step)
        {
            var logTime = Math.Min(next, end);
            scan.Add((logTime, value(Math.Exp(logTime))));
        }

        for (var level = 0; level < levels.Count; level++)
        {
            var target = levels[level];
            double Gap(double logTime) => value(Math.Exp(logTime)) - target;
            if (scan[0].Value >= target)
            {
                times[level] = BelowScan(Gap, scan[0].LogTime, step * PointsPerDecade, end);
                continue;
            }

            for (var i = 1; i < scan.Count; i++)
            {
                if (scan[i].Value >= target)
                {
                    times[level] = Root(Gap, scan[i - 1].LogTime, scan[i].LogTime);
                    break;
                }
            }
        }

        return times;
    }

    /// <summary>
    /// The first time in (0, upTo] where the quantity crosses one level from the side it starts on (the value twelve
    /// decades before the end): upward for a quantity that starts below it, downward for one that starts above; null
    /// when it does not.
    /// </summary>
    public static double? First(Func<double, double> value, double level, double upToSeconds)
    {
        ArgumentNullException.ThrowIfNull(value);
        var start = Math.Exp(Math.Log(upToSeconds) - (ScanDecades * Math.Log(10)));
        // The scan starts from this point as a known value, so the quantity is not evaluated there twice.
        var initial = value(start);
        return initial == level ? start
            : initial < level ? Find(value, [level], upToSeconds, [(start, initial)])[0]
            : Find(time => -value(time), [-level], upToSeconds, [(start, -initial)])[0];
    }

    /// <summary>A level reached before the scan starts: step down a decade at a time until it is not, then bracket.</summary>
    private static double? BelowScan(Func<double, double> gap, double scanStart, double decade, double end)
    {
        var upper = scanStart;
        while (end - upper < DeepestDecades * decade)
        {
            var lower = upper - decade;
            if (gap(lower) < 0)
            {
                return Root(gap, lower, upper);
            }

            upper = lower;
        }

        // Reached within the first thirty decades below the end: as good as from the start.
        return Math.Exp(upper);
    }

    private static double Root(Func<double, double> gap, double lower, double upper)
        => Brent.TryFindRoot(gap, lower, upper, LogTimeAccuracy, 200, out var root) ? Math.Exp(root) : Math.Exp(upper);
}
