namespace Layers.Core.Studies;

/// <summary>
/// Sample percentiles by linear interpolation between order statistics (Hyndman and Fan 1996, definition 7: the
/// default of spreadsheets and NumPy). Infinite values (a limit never reached) are allowed and sort last.
/// </summary>
public static class Percentile
{
    /// <summary>The <paramref name="percent"/>-th percentile of values sorted ascending; NaN when there are none.</summary>
    public static double OfSorted(IReadOnlyList<double> sorted, double percent)
    {
        ArgumentNullException.ThrowIfNull(sorted);
        if (sorted.Count == 0)
        {
            return double.NaN;
        }

        var position = (sorted.Count - 1) * percent / 100;
        var below = (int)Math.Floor(position);
        var fraction = position - below;
        if (fraction == 0 || below + 1 >= sorted.Count)
        {
            return sorted[below];
        }

        var (low, high) = (sorted[below], sorted[below + 1]);
        return low == high || double.IsInfinity(high) ? high : low + (fraction * (high - low));
    }

    /// <summary>The percentiles of the finite and infinite values (NaN left out), one per entry of <paramref name="percents"/>.</summary>
    public static double[] Of(IEnumerable<double> values, IReadOnlyList<double> percents)
    {
        var sorted = values.Where(value => !double.IsNaN(value)).Order().ToArray();
        return percents.Select(percent => OfSorted(sorted, percent)).ToArray();
    }
}
