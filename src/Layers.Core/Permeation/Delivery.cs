using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Permeation;

/// <summary>
/// Delivered amount per whole day of the duration (from the cumulative amount received at the day boundaries, which
/// are output times when the case asks for permeation metrics) and the span over which the mean delivery rate
/// between consecutive output times stays at or above a target.
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
                var rate = (cumulativePerArea[i] - cumulativePerArea[i - 1]) / (timesSeconds[i] - timesSeconds[i - 1]);
                if (rate >= target)
                {
                    reached ??= timesSeconds[i];
                    heldUntil = timesSeconds[i];
                }
                else if (reached is not null)
                {
                    break;
                }
            }
        }

        return new DeliverySummary(perDay, test.DeliveryAreaSquareMeters, test.TargetFluxKgPerSquareMeterSecond, reached, heldUntil);
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
