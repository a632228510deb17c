using Layers.Core.Batch;
using Layers.Core.Results;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// sweep.png: the sweep's chosen key result against its first parameter, one line per combination of the other
/// parameters. Cases that did not succeed are left out (their rows say why). Axes turn logarithmic when the values
/// are positive and span two decades or more, as a log-spaced sweep does.
/// </summary>
public static class SweepPlot
{
    private const double LogSpan = 100;

    /// <summary>The PNG, or null when no sub-case has the result.</summary>
    /// <param name="sweep">The sweep.</param>
    /// <param name="rows">Rows of the batch (those of other cases are ignored).</param>
    /// <param name="options">Picture size.</param>
    public static byte[]? Render(SweepGroup sweep, IReadOnlyList<BatchRow> rows, PlotOptions options)
    {
        var names = sweep.CaseNames.ToHashSet(StringComparer.Ordinal);
        var points = rows
            .Where(row => names.Contains(row.Name) && row.Parameters.Count > 0)
            .Select(row => (Row: row, X: row.Parameters[0].Number, Y: row.Results?.Pick(sweep.Result)))
            .Where(point => point.Y is { } y && double.IsFinite(y) && double.IsFinite(point.X))
            .ToList();
        if (points.Count == 0)
        {
            return null;
        }

        var first = points[0].Row.Parameters[0];
        var resultName = NamedResults.Words(sweep.Result);
        var resultUnit = DisplayText.Unit(NamedResults.SiUnit(sweep.Result));
        var xTitle = first.Unit.Length > 0 ? $"{first.Label} ({DisplayText.Unit(first.Unit)})" : first.Label;
        var model = PlotFrame.Create(
            $"Sweep {sweep.Name}: {resultName} against {first.Label}",
            [$"{points.Count} of {sweep.CaseNames.Count} sub-cases solved; case file {Path.GetFileName(sweep.File)}"],
            options);
        var xs = points.Select(point => point.X).ToList();
        var ys = points.Select(point => point.Y!.Value).ToList();
        model.Axes.Add(PlotFrame.Axis(Spans(xs), AxisPosition.Bottom, xTitle));
        model.Axes.Add(PlotFrame.Axis(Spans(ys), AxisPosition.Left, $"{resultName} ({resultUnit})"));
        var groups = points.GroupBy(point => string.Join("; ", point.Row.Parameters.Skip(1).Select(value => $"{value.Label} = {value.Written}")));
        var index = 0;
        foreach (var group in groups)
        {
            var series = new LineSeries
            {
                Title = group.Key.Length > 0 ? group.Key : resultName,
                Color = PlotStyle.SeriesColor(index),
                LineStyle = PlotStyle.SeriesLineStyle(index),
                StrokeThickness = PlotStyle.SeriesThickness,
                MarkerType = PlotStyle.Markers[index % PlotStyle.Markers.Count],
                MarkerSize = PlotStyle.MarkerSize,
                MarkerFill = PlotStyle.SeriesColor(index),
            };
            series.Points.AddRange(group.OrderBy(point => point.X).Select(point => new DataPoint(point.X, point.Y!.Value)));
            model.Series.Add(series);
            index++;
        }

        return PngRenderer.Render(model, options);
    }

    private static bool Spans(IReadOnlyList<double> values) =>
        values.All(value => value > 0) && values.Max() / values.Min() >= LogSpan;
}
