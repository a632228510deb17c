using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Permeation;

/// <summary>
/// Delivered amount per whole day of the duration (from the cumulative amount received at the day boundaries, which
/// are output times when the case asks for permeation metrics) and the span over which the mean delivery rate
/// between consecutive output times stays at or above a target, with the moment it falls below interpolated.
/// </summary>
public static class Delivery
{
    /// <summary>Seconds in a day.</summary>
    public const double DaySeconds = 86400;

    /// <summary>The delivery figures from Q(t) at the output times (t = 0 first).</summary>
    public static DeliverySummary Of(PermeationTest test, IReadOnlyList<double> timesSeconds, IReadOnlyList<double> cumulativePerArea)
    {
        var perDay = new List<double>();
        var previous = 0.0;
        for (var day = 1; ; day++)
        {
            var at = IndexOf(timesSeconds, day * DaySeconds);
            if (at < 0)
            {
                break;
            }

            perDay.Add(cumulativePerArea[at] - previous);
            previous = cumulativePerArea[at];
        }

        double? reached = null;
        double? heldUntil = null;
        if (test.TargetFluxKgPerSquareMeterSecond is { } target)
        {
            for (var i = 1; i < timesSeconds.Count; i++)
            {
                var rate = MeanRate(timesSeconds, cumulativePerArea, i);
                if (rate >= target)
                {
                    reached ??= timesSeconds[i];
                    heldUntil = timesSeconds[i];
                }
                else if (reached is not null)
                {
                    heldUntil = FallsBelow(timesSeconds, cumulativePerArea, i, target);
                    break;
                }
            }
        }

        return new DeliverySummary(perDay, test.DeliveryAreaSquareMeters, test.TargetFluxKgPerSquareMeterSecond, reached, heldUntil);
    }

    /// <summary>Mean rate over the interval that ends at output i, kg/(m2 s).</summary>
    private static double MeanRate(IReadOnlyList<double> times, IReadOnlyList<double> cumulative, int i)
        => (cumulative[i] - cumulative[i - 1]) / (times[i] - times[i - 1]);

    /// <summary>
    /// When the rate fell to the target, between interval i - 1 (at or above it; i &gt;= 2) and interval i (below): the interval
    /// means stand for the rate at the interval mid-times and are joined by a straight line. A depleting matrix loses
    /// rate steadily, so this is much finer than the output spacing, which in a long run is a tenth of the time.
    /// </summary>
    private static double FallsBelow(IReadOnlyList<double> times, IReadOnlyList<double> cumulative, int i, double target)
    {
        var above = MeanRate(times, cumulative, i - 1);
        var below = MeanRate(times, cumulative, i);
        var middleAbove = (times[i - 2] + times[i - 1]) / 2;
        var middleBelow = (times[i - 1] + times[i]) / 2;
        return middleAbove + ((above - target) / (above - below) * (middleBelow - middleAbove));
    }

    private static int IndexOf(IReadOnlyList<double> times, double time)
    {
        for (var i = 0; i < times.Count; i++)
        {
            if (Math.Abs(times[i] - time) <= 1e-9 * time)
            {
                return i;
            }
        }

        return -1;
    }
}
