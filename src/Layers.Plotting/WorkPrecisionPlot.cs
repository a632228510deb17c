using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>One point of a work-precision diagram: a run's solve time and its error.</summary>
/// <param name="Seconds">Solve time, s.</param>
/// <param name="Error">Error against the trusted answer (dimensionless, greater than zero).</param>
public readonly record struct WorkPrecisionPoint(double Seconds, double Error);

/// <summary>A line of a work-precision diagram: one solver at a family of settings.</summary>
/// <param name="Name">Legend text.</param>
/// <param name="Points">The runs, in order of refinement.</param>
/// <param name="IsReference">True for the plain reference, drawn dashed in near black so it stands apart.</param>
public sealed record WorkPrecisionSeries(string Name, IReadOnlyList<WorkPrecisionPoint> Points, bool IsReference = false);

/// <summary>
/// A work-precision diagram: error against solve time, both on logarithmic axes, one line per solver setting
/// family. Lower and further left is better; at equal height, the horizontal distance between two lines is the
/// ratio of their costs at equal accuracy.
/// </summary>
public static class WorkPrecisionPlot
{
    /// <summary>The PNG.</summary>
    /// <param name="title">Title line.</param>
    /// <param name="subtitleLines">Lines under the title: problem, reference, machine.</param>
    /// <param name="series">The lines; points with a non-positive time or error are left out.</param>
    /// <param name="options">Picture size.</param>
    public static byte[] Render(string title, IEnumerable<string> subtitleLines, IReadOnlyList<WorkPrecisionSeries> series, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(series);
        var model = PlotFrame.Create(title, subtitleLines, options);
        var time = PlotFrame.Logarithmic(AxisPosition.Bottom, "solve time (s), median of repeated runs");
        // Wide labels such as 3x10^-4 overlap at OxyPlot's default spacing when the axis spans few decades.
        time.IntervalLength = 110;
        model.Axes.Add(time);
        model.Axes.Add(PlotFrame.Logarithmic(AxisPosition.Left, "error (largest difference / reference amount)"));
        var colour = 0;
        foreach (var line in series)
        {
            var color = line.IsReference ? PlotStyle.Reference : PlotStyle.SeriesColor(colour);
            var drawn = new LineSeries
            {
                Title = line.Name,
                Color = color,
                LineStyle = line.IsReference ? LineStyle.Dash : LineStyle.Solid,
                StrokeThickness = PlotStyle.SeriesThickness,
                MarkerType = line.IsReference ? MarkerType.Square : PlotStyle.Markers[colour % PlotStyle.Markers.Count],
                MarkerSize = PlotStyle.MarkerSize,
                MarkerFill = color,
            };
            drawn.Points.AddRange(line.Points
                .Where(point => point.Seconds > 0 && point.Error > 0)
                .Select(point => new DataPoint(point.Seconds, point.Error)));
            model.Series.Add(drawn);
            colour += line.IsReference ? 0 : 1;
        }

        return PngRenderer.Render(model, options);
    }
}
