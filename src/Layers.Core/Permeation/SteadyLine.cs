using Layers.Core.Results;

namespace Layers.Core.Permeation;

/// <summary>
/// Steady flux and lag time from a cumulative amount per area Q(t), as read from permeation data (Crank, The
/// Mathematics of Diffusion, 2nd ed., ch. 4, the time-lag method, from memory): a straight line is fitted by least
/// squares to the steady part, its slope is J_ss and its time-axis intercept the lag time; k_p = J_ss / C_donor.
/// </summary>
/// <remarks>
/// The rule for the steady part: the points at or after three lag times, with the lag time from the line through
/// those same points, found by iteration from the points in the second half of the time span; always at least the
/// last three points. For a single membrane the approach to the asymptote decays like exp(-pi^2 D t / L^2), which at
/// three lag times (t = L^2 / (2D)) leaves about 0.15 % of L K C_donor, so the intercept is read from an
/// essentially straight part (Crank, ch. 4, series for Q(t); the multiple of three is common practice, no source).
/// The same rule serves simulated and measured data, so the two are compared on equal terms.
/// </remarks>
public static class SteadyLine
{
    /// <summary>The steady part starts at this many lag times.</summary>
    public const double LagMultiple = 3;

    /// <summary>Fits the steady part; null when fewer than three points with t &gt; 0 are given or Q does not rise.</summary>
    public static PermeationMetrics? Fit(
        string source,
        IReadOnlyList<double> timesSeconds,
        IReadOnlyList<double> cumulativePerArea,
        double? donorConcentrationKgPerCubicMeter)
    {
        var points = timesSeconds.Zip(cumulativePerArea).Where(point => point.First > 0).ToArray();
        if (points.Length < 3)
        {
            return null;
        }

        var from = points[^1].First / 2;
        var used = Count(points, from);
        var line = LeastSquares(points.AsSpan(points.Length - used));
        for (var iteration = 0; iteration < 50 && line.Slope > 0; iteration++)
        {
            var next = Count(points, LagMultiple * (-line.Intercept / line.Slope));
            if (next == used)
            {
                break;
            }

            used = next;
            line = LeastSquares(points.AsSpan(points.Length - used));
        }

        if (!(line.Slope > 0))
        {
            return null;
        }

        return new PermeationMetrics(
            source,
            line.Slope,
            -line.Intercept / line.Slope,
            donorConcentrationKgPerCubicMeter is > 0 ? line.Slope / donorConcentrationKgPerCubicMeter : null,
            donorConcentrationKgPerCubicMeter,
            used,
            points[^used].First,
            points[^1].First,
            line.RSquared,
            points[^1].Second);
    }

    /// <summary>Points at or after <paramref name="from"/>, at least three.</summary>
    private static int Count((double First, double Second)[] points, double from)
        => Math.Max(3, points.Count(point => point.First >= from * (1 - 1e-12)));

    private static (double Slope, double Intercept, double RSquared) LeastSquares(ReadOnlySpan<(double First, double Second)> points)
    {
        double meanX = 0, meanY = 0;
        foreach (var (x, y) in points)
        {
            meanX += x;
            meanY += y;
        }

        meanX /= points.Length;
        meanY /= points.Length;
        double sxx = 0, sxy = 0, syy = 0;
        foreach (var (x, y) in points)
        {
            sxx += (x - meanX) * (x - meanX);
            sxy += (x - meanX) * (y - meanY);
            syy += (y - meanY) * (y - meanY);
        }

        var slope = sxy / sxx;
        var rSquared = syy > 0 ? sxy * sxy / (sxx * syy) : 1;
        return (slope, meanY - (slope * meanX), rSquared);
    }
}
