namespace Layers.Core.Laplace;

/// <summary>
/// Groups increasing times into windows, each served by one <see cref="HyperbolicContour"/>, so that the total number
/// of evaluations of the transform is least: a window of ratio Lambda costs about ln(10 Lambda / tolerance) / rate(Lambda)
/// evaluations, fewer per time the more times it holds but more per decade the wider it is.
/// </summary>
internal static class ContourWindows
{
    /// <summary>The windows as ranges of indices [First, Last] into the increasing, positive times.</summary>
    public static IReadOnlyList<(int First, int Last)> Plan(IReadOnlyList<double> increasingTimes, double tolerance)
    {
        var count = increasingTimes.Count;

        // cost[j]: least evaluations for the first j times; start[j]: where the last window of that plan begins.
        var cost = new int[count + 1];
        var start = new int[count + 1];
        for (var j = 1; j <= count; j++)
        {
            cost[j] = int.MaxValue;
            var last = increasingTimes[j - 1];
            for (var i = j - 1; i >= 0; i--)
            {
                var ratio = last / increasingTimes[i];
                if (ratio > HyperbolicContour.WidestWindowRatio)
                {
                    break;
                }

                var total = cost[i] + HyperbolicContour.EvaluationsFor(ratio, tolerance);
                if (total < cost[j])
                {
                    cost[j] = total;
                    start[j] = i;
                }
            }
        }

        var windows = new List<(int First, int Last)>();
        for (var j = count; j > 0; j = start[j])
        {
            windows.Add((start[j], j - 1));
        }

        windows.Reverse();
        return windows;
    }
}
