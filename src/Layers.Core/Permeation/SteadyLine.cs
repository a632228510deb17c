using System.Globalization;
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
/// <para>
/// A line through the last part of Q(t) is a steady flux only where Q(t) has become straight and the donor keeps its
/// level. The fitted line is reported as J_ss, lag time and k_p only when (1) the donor has lost at most
/// <see cref="DepletionLimit"/> of its content by the last time (an unlimited donor, a bath, loses nothing; "at most a
/// tenth of the dose depleted" is the usual reading of an infinite dose, common practice, no source), (2) the slopes
/// of the lines through the earlier and the later half of the steady part differ by at most
/// <see cref="StraightnessTolerance"/> of the fitted slope (a Daynes-Barrer curve from three lag times on differs by
/// under 1.5 %: the slope there is J (1 - 2 exp(-pi^2/2)), Crank, ch. 4, from memory), and (3) the lag time is not
/// negative (a line that meets the time axis before t = 0 comes from a curve that bends down, as a depleting donor's
/// does). Otherwise <see cref="PermeationMetrics.NoSteadyLineReason"/> says why there is no steady line.
/// </para>
/// </remarks>
public static class SteadyLine
{
    /// <summary>The steady part starts at this many lag times.</summary>
    public const double LagMultiple = 3;

    /// <summary>Largest fraction of the donor's content that may have left it for Q(t) to count as steady.</summary>
    public const double DepletionLimit = 0.10;

    /// <summary>Largest difference between the slopes of the two halves of the steady part, as a fraction of its slope.</summary>
    public const double StraightnessTolerance = 0.05;

    /// <summary>Fits the steady part; null when fewer than three points with t &gt; 0 are given or Q does not rise.</summary>
    /// <param name="source">"simulated" or "measured".</param>
    /// <param name="timesSeconds">Times of Q, s.</param>
    /// <param name="cumulativePerArea">Q at those times, kg/m2.</param>
    /// <param name="donorConcentrationKgPerCubicMeter">C_donor for k_p, or null.</param>
    /// <param name="donorContentPerArea">
    /// What the donor holds at the start per contact area, kg/m2, against which Q tells how far it has depleted; null
    /// for an unlimited donor (a bath).
    /// </param>
    public static PermeationMetrics? Fit(
        string source,
        IReadOnlyList<double> timesSeconds,
        IReadOnlyList<double> cumulativePerArea,
        double? donorConcentrationKgPerCubicMeter,
        double? donorContentPerArea = null)
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

        var steadyPart = points.AsSpan(points.Length - used);
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
            points[^1].Second)
        {
            NoSteadyLineReason = WhyNotSteady(steadyPart, line.Slope, -line.Intercept / line.Slope, donorContentPerArea),
        };
    }

    /// <summary>Why the line through the steady part is not a steady flux, or null when it is (see the remarks).</summary>
    private static string? WhyNotSteady(ReadOnlySpan<(double First, double Second)> part, double slope, double lagSeconds, double? donorContentPerArea)
    {
        var reasons = new List<string>();
        var depleted = donorContentPerArea is > 0 ? part[^1].Second / donorContentPerArea.Value : 0;
        if (depleted > DepletionLimit)
        {
            reasons.Add(string.Create(
                CultureInfo.InvariantCulture,
                $"the donor lost {100 * depleted:G3} % of its content by the last time (more than {100 * DepletionLimit:G3} %), so its flux falls"));
        }

        var half = (part.Length + 1) / 2;
        var earlier = LeastSquares(part[..half]).Slope;
        var later = LeastSquares(part[^half..]).Slope;
        var bend = Math.Abs(later - earlier) / slope;
        if (bend > StraightnessTolerance)
        {
            reasons.Add(string.Create(
                CultureInfo.InvariantCulture,
                $"Q(t) is not straight over its last part (the slopes of its earlier and later half differ by {100 * bend:G3} %, more than {100 * StraightnessTolerance:G3} %)"));
        }

        if (lagSeconds < 0)
        {
            reasons.Add("the line meets the time axis before t = 0 (a negative lag time)");
        }

        return reasons.Count > 0 ? string.Join("; ", reasons) : null;
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
