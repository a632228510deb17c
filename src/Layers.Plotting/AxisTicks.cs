using OxyPlot.Axes;

namespace Layers.Plotting;

/// <summary>
/// Tick labels in one notation per axis: plain ("0.002", "150") when every labelled tick reads well that way,
/// powers of ten ("2×10⁻⁴", "10⁻³") for all of them otherwise, so that no axis shows "0.001" beside "10⁻⁴".
/// </summary>
internal static class AxisTicks
{
    /// <summary>
    /// Makes the axis label its ticks in one notation, chosen from the ticks it shows; ticks for which
    /// <paramref name="shown"/> is false get no label and do not take part in the choice.
    /// </summary>
    /// <remarks>
    /// On a log axis over two decades or more in power-of-ten notation only the powers of ten carry labels: "2×10⁻³"
    /// and "3×10⁻³" side by side run into each other, and the unlabelled ticks between still show the scale.
    /// </remarks>
    public static void OneFormat(Axis axis, Func<double, bool>? shown = null)
    {
        var labelled = shown ?? (_ => true);
        axis.LabelFormatter = value =>
        {
            if (!labelled(value))
            {
                return string.Empty;
            }

            var powers = PowersOfTen(axis, labelled);
            return powers && DecadesOnly(axis) && !IsPowerOfTen(value) ? string.Empty : DisplayText.Tick(value, powers);
        };
    }

    private static bool DecadesOnly(Axis axis) =>
        axis is LogarithmicAxis && axis.ActualMinimum > 0 && axis.ActualMaximum / axis.ActualMinimum >= 100;

    private static bool IsPowerOfTen(double value)
    {
        var exponent = Math.Log10(Math.Abs(value));
        return Math.Abs(exponent - Math.Round(exponent)) < 1e-9;
    }

    /// <summary>Whether any labelled tick the axis shows needs power-of-ten notation.</summary>
    public static bool PowersOfTen(Axis axis, Func<double, bool> shown)
    {
        axis.GetTickValues(out var labels, out _, out _);
        // Ticks just outside the range are not drawn; a relative slack keeps the ends themselves.
        var slack = Math.Abs(axis.ActualMaximum - axis.ActualMinimum) * 1e-9;
        return labels
            .Where(value => value >= axis.ActualMinimum - slack && value <= axis.ActualMaximum + slack && shown(value))
            .Any(value => DisplayText.NeedsPowerOfTen(value));
    }
}
