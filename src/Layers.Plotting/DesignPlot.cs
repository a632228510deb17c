using Layers.Core.Studies;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// design.png: the result against the input over every value the design tried, with the target as a dashed
/// horizontal line and the answer as a vertical line. Axes are logarithmic when the design searched on a log scale
/// (input) or the results span two decades (result).
/// </summary>
public static class DesignPlot
{
    private const double LogSpan = 100;

    /// <summary>The PNG, or null when no value tried gave a result.</summary>
    /// <param name="outcome">The design's outcome.</param>
    /// <param name="title">The case title.</param>
    /// <param name="options">Picture size.</param>
    public static byte[]? Render(DesignOutcome outcome, string title, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        ArgumentNullException.ThrowIfNull(options);
        var settings = outcome.Settings;
        var unit = settings.TargetUnit;
        var points = outcome.Points.Where(point => double.IsFinite(point.ResultSi)).ToList();
        if (points.Count == 0)
        {
            return null;
        }

        var model = PlotFrame.Create(title, [Core.Reports.DesignReport.Line(outcome)], options);
        var inputTitle = settings.Input.Unit.Length > 0 ? $"{settings.Input.Label} ({DisplayText.Unit(settings.Input.Unit)})" : settings.Input.Label;
        model.Axes.Add(PlotFrame.Axis(settings.LogScale, AxisPosition.Bottom, inputTitle));
        var ys = points.Select(point => unit.FromSi(point.ResultSi)).Append(unit.FromSi(settings.TargetSi)).ToList();
        var logResult = ys.All(y => y > 0) && ys.Max() / ys.Min() >= LogSpan;
        model.Axes.Add(PlotFrame.Axis(logResult, AxisPosition.Left, $"{settings.Result.Label} ({DisplayText.Unit(unit)})"));
        var curve = new LineSeries
        {
            Title = "runs",
            Color = PlotStyle.SeriesColor(0),
            StrokeThickness = PlotStyle.SeriesThickness,
            MarkerType = MarkerType.Circle,
            MarkerSize = PlotStyle.MarkerSize,
            MarkerFill = PlotStyle.SeriesColor(0),
        };
        curve.Points.AddRange(points.Select(point => new DataPoint(point.Value, unit.FromSi(point.ResultSi))));
        model.Series.Add(curve);
        model.Annotations.Add(Marker(LineAnnotationType.Horizontal, unit.FromSi(settings.TargetSi), PlotStyle.Limit, LineStyle.Dash, $"target {DisplayText.Quantity(unit.FromSi(settings.TargetSi), unit)}"));
        if (outcome.Answer is { } answer)
        {
            var line = Marker(LineAnnotationType.Vertical, answer, PlotStyle.Reference, LineStyle.Dot, $"answer {settings.Input.Show(answer)}");
            line.TextOrientation = AnnotationTextOrientation.Vertical;
            model.Annotations.Add(line);
        }

        return PngRenderer.Render(model, options);
    }

    private static LineAnnotation Marker(LineAnnotationType type, double at, OxyColor color, LineStyle style, string text) => new()
    {
        Type = type,
        X = at,
        Y = at,
        Color = color,
        LineStyle = style,
        StrokeThickness = PlotStyle.ReferenceThickness,
        Text = text,
        FontSize = PlotStyle.LabelFontSize,
        TextColor = color,
    };
}
