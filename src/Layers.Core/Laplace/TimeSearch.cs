using MathNet.Numerics.RootFinding;

namespace Layers.Core.Laplace;

/// <summary>
/// The first time a quantity of the inverted solution reaches a target: a scan on log t for the first change of
/// side, then Brent's method on log t inside that bracket.
/// </summary>
internal static class TimeSearch
{
    // The scan starts twelve decades below the end and looks at six times per decade: a crossing is missed only if
    // the quantity crosses the target and back within a sixth of a decade of time.
    private const double StartDecadesBelow = 12;
    private const int PointsPerDecade = 6;
    private const double LogTimeAccuracy = 1e-11;

    /// <summary>The first time in (0, upTo] where value(t) reaches target, or null when it does not.</summary>
    public static double? FirstCrossing(Func<double, double> value, double target, double upToSeconds)
    {
        if (!(upToSeconds > 0) || double.IsInfinity(upToSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(upToSeconds), upToSeconds, "The search needs a finite end above zero.");
        }

        double Gap(double logTime) => value(Math.Exp(logTime)) - target;

        var end = Math.Log(upToSeconds);
        var step = Math.Log(10) / PointsPerDecade;
        var count = (int)(StartDecadesBelow * PointsPerDecade);
        var previous = end - (count * step);
        var previousGap = Gap(previous);
        if (previousGap == 0)
        {
            return Math.Exp(previous);
        }

        for (var i = 1; i <= count; i++)
        {
            var next = end - ((count - i) * step);
            var nextGap = Gap(next);
            if (nextGap == 0)
            {
                return Math.Exp(next);
            }

            if (Math.Sign(nextGap) != Math.Sign(previousGap))
            {
                return Brent.TryFindRoot(Gap, previous, next, LogTimeAccuracy, 200, out var root)
                    ? Math.Exp(root)
                    : Math.Exp(0.5 * (previous + next));
            }

            previous = next;
            previousGap = nextGap;
        }

        return null;
    }
}
