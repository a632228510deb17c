using Layers.Core.Batch;
using Layers.Core.Results;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// sweep.png: the sweep's chosen key result, in its trade unit (<see cref="BatchTradeUnits"/>), against its first
/// parameter, one line per combination of the other parameters; the specific migration limit drawn as a labelled
/// line when the result is the food's concentration and the sub-cases have one. Cases that did not succeed are left
/// out (their rows say why). Axes turn logarithmic when the values are positive and span two decades or more, as a
/// log-spaced sweep does; a logarithmic result axis stops where the values stop mattering
/// (<see cref="LowestShown"/>).
/// </summary>
public static class SweepPlot
{
    private const double LogSpan = 100;
    private const double LogPadding = 1.5;
    private const double LinearPadding = 0.05;

    /// <summary>How far below the top of the plot a logarithmic result axis reaches: six decades.</summary>
    public const double DecadesShown = 1e6;

    /// <summary>How far below the limit a logarithmic result axis reaches: a thousandth of it.</summary>
    public const double BelowLimitShown = 1e-3;

    /// <summary>The PNG, or null when no sub-case has the result.</summary>
    /// <param name="sweep">The sweep.</param>
    /// <param name="rows">Rows of the batch (those of other cases are ignored).</param>
    /// <param name="options">Picture size.</param>
    public static byte[]? Render(SweepGroup sweep, IReadOnlyList<BatchRow> rows, PlotOptions options) =>
        Create(sweep, rows, options) is { } model ? PngRenderer.Render(model, options) : null;

    /// <summary>The plot, or null when no sub-case has the result.</summary>
    /// <param name="sweep">The sweep.</param>
    /// <param name="rows">Rows of the batch (those of other cases are ignored).</param>
    /// <param name="options">Picture size.</param>
    public static PlotModel? Create(SweepGroup sweep, IReadOnlyList<BatchRow> rows, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var unit = BatchTradeUnits.Of(sweep.Result);
        var names = sweep.CaseNames.ToHashSet(StringComparer.Ordinal);
        var points = rows
            .Where(row => names.Contains(row.Name) && row.Parameters.Count > 0)
            .Select(row => (Row: row, X: row.Parameters[0].Number, Y: BatchTradeUnits.In(unit, Value(sweep, row))))
            .Where(point => point.Y is { } y && double.IsFinite(y) && double.IsFinite(point.X))
            .ToList();
        if (points.Count == 0)
        {
            return null;
        }

        var first = points[0].Row.Parameters[0];
        var resultName = NamedResults.IsReadInPeriod(sweep.Result)
            ? new Layers.Core.Studies.ResultMeasure(sweep.Result) { Period = sweep.ResultPeriod }.Label
            : NamedResults.Words(sweep.Result);
        var xTitle = first.Unit.Length > 0 ? $"{first.Label} ({DisplayText.Unit(first.Unit)})" : first.Label;
        var limits = points.Select(point => point.Row.Limit).OfType<LimitCheck>().Where(limit => limit.Result == sweep.Result)
            .Select(limit => unit.FromSi(limit.LimitSi)).Distinct().Order().ToList();
        var xs = points.Select(point => point.X).ToList();
        var ys = points.Select(point => point.Y!.Value).ToList();
        var logarithmic = Spans(ys);
        var floor = logarithmic ? LowestShown(ys.Max(), limits.Count > 0 ? limits[0] : null) : (double?)null;
        var hidden = floor is { } lowest ? ys.Count(y => y < lowest) : 0;
        List<string> notes = [$"{points.Count} of {sweep.CaseNames.Count} sub-cases solved; case file {Path.GetFileName(sweep.File)}"];
        if (hidden > 0)
        {
            notes.Add($"{hidden} below {DisplayText.Quantity(floor!.Value, unit)} not drawn ({(limits.Count > 0 ? "a thousandth of the limit or " : string.Empty)}six decades below the top)");
        }

        var model = PlotFrame.Create($"Sweep {sweep.Name}: {resultName} against {first.Label}", notes, options);
        model.Axes.Add(PlotFrame.Axis(Spans(xs), AxisPosition.Bottom, xTitle));
        var yAxis = PlotFrame.Axis(logarithmic, AxisPosition.Left, $"{resultName} ({DisplayText.Unit(unit)})");
        var high = limits.Count > 0 ? Math.Max(ys.Max(), limits[^1]) : ys.Max();
        if (floor is { } bottom)
        {
            // The values that matter and the limit, with a little room above and below on the log scale.
            var low = Math.Max(ys.Min(), bottom);
            yAxis.Minimum = (limits.Count > 0 ? Math.Min(low, limits[0]) : low) / LogPadding;
            yAxis.Maximum = high * LogPadding;
        }
        else if (limits.Count > 0)
        {
            // The limit stays in view even when every value is far below it.
            yAxis.Minimum = Math.Min(0, Math.Min(ys.Min(), limits[0]));
            yAxis.Maximum = high * (1 + LinearPadding);
        }

        model.Axes.Add(yAxis);
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

        foreach (var limit in limits)
        {
            model.Annotations.Add(new LineAnnotation
            {
                Type = LineAnnotationType.Horizontal,
                Y = limit,
                Color = PlotStyle.Limit,
                LineStyle = LineStyle.Dash,
                StrokeThickness = PlotStyle.ReferenceThickness,
                Text = $"specific migration limit {DisplayText.Quantity(limit, unit)}",
                FontSize = PlotStyle.LabelFontSize,
                TextColor = PlotStyle.Limit,
            });
        }

        return model;
    }

    /// <summary>
    /// The bottom of a logarithmic result axis: six decades below the top of the plot (the largest value, or the
    /// limit when it is higher), and never below a thousandth of the limit, where a value no longer bears on the
    /// verdict. Below that, a log-spaced sweep's thick barriers would stretch the axis to 1e-50 and squash the
    /// values that matter into its top.
    /// </summary>
    /// <param name="largest">The largest value drawn, in the axis unit.</param>
    /// <param name="limit">The limit drawn, same unit, or null.</param>
    public static double LowestShown(double largest, double? limit)
    {
        var top = limit is { } drawn ? Math.Max(largest, drawn) : largest;
        var floor = top / DecadesShown;
        return limit is { } line ? Math.Max(floor, line * BelowLimitShown) : floor;
    }

    private static bool Spans(IReadOnlyList<double> values) =>
        values.All(value => value > 0) && values.Max() / values.Min() >= LogSpan;

    /// <summary>The swept result of a row, SI: a figure of one period from the row's own, the others from its key results.</summary>
    private static double? Value(SweepGroup sweep, BatchRow row) => NamedResults.IsReadInPeriod(sweep.Result)
        ? row.PeriodFigure?.ValueSi
        : row.Results?.Pick(sweep.Result);
}
