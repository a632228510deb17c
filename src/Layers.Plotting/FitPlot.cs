using Layers.Core.Fitting;
using Layers.Core.Units;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// fit.png: the measurements (with bars of plus and minus one standard deviation where given) and the fitted model
/// against time, and under them, on their own axis, the residuals (measured - model), so that a trend the model misses
/// shows. An estimate the data do not determine is marked as the console marks it, with what they do determine.
/// </summary>
public static class FitPlot
{
    /// <summary>The file name of the picture.</summary>
    public const string FileName = "fit.png";

    private const string ResidualAxisKey = "residuals";

    /// <summary>The picture of a fit as PNG bytes.</summary>
    public static byte[] Render(FitResult fit, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(fit);
        return PngRenderer.Render(Create(fit, options), options);
    }

    internal static PlotModel Create(FitResult fit, PlotOptions options)
    {
        var data = fit.Request.Data;
        var time = fit.FittedCase.Display.Time;
        var value = data.ValueUnit;
        var estimates = string.Join("; ", fit.Estimates.Select(estimate =>
            $"{estimate.Parameter.Label} = {estimate.Parameter.Written(estimate.Value)}{(estimate.Identifiable ? string.Empty : " (not identifiable)")}"));
        var model = PlotFrame.Create(fit.FittedCase.Title, [$"Fit to {Path.GetFileName(data.FileName)}: {estimates}", .. Determined(fit)], options);
        var timeAxis = PlotFrame.Linear(AxisPosition.Bottom, $"Time ({DisplayText.Unit(time)})");
        timeAxis.Minimum = 0;
        model.Axes.Add(timeAxis);
        var valueAxis = PlotFrame.Linear(AxisPosition.Left, $"{Capitalised(data.ValueName)} ({DisplayText.Unit(value)})");
        valueAxis.StartPosition = 0.32;
        valueAxis.EndPosition = 1;
        valueAxis.MinimumPadding = 0.04;
        valueAxis.MaximumPadding = 0.06;
        model.Axes.Add(valueAxis);
        var residualAxis = PlotFrame.Linear(AxisPosition.Left, $"Residual ({DisplayText.Unit(value)})");
        residualAxis.Key = ResidualAxisKey;
        residualAxis.StartPosition = 0;
        residualAxis.EndPosition = 0.24;

        // Symmetric about zero and wide enough for every point with its bar, so that none is clipped.
        var reach = fit.Points.Select(point => Math.Abs(point.Residual) + (point.Deviation ?? 0)).DefaultIfEmpty(0).Max();
        var half = value.FromSi(reach > 0 ? reach * 1.15 : 1);
        residualAxis.Minimum = -half;
        residualAxis.Maximum = half;
        model.Axes.Add(residualAxis);

        var curve = new LineSeries { Title = "fitted model", Color = PlotStyle.SeriesColor(0), StrokeThickness = PlotStyle.SeriesThickness };
        curve.Points.AddRange(fit.Curve.Select(point => new DataPoint(time.FromSi(point.TimeSeconds), value.FromSi(point.Value))));
        model.Series.Add(curve);
        model.Series.Add(Points(data.Deviations is null ? "measured" : "measured (\u00B11 sd)", fit.Points.Select(point => (point.TimeSeconds, point.Measured, point.Deviation)), time, value, axisKey: null));
        model.Series.Add(Points(null, fit.Points.Select(point => (point.TimeSeconds, point.Residual, point.Deviation)), time, value, ResidualAxisKey));
        model.Annotations.Add(new LineAnnotation
        {
            Type = LineAnnotationType.Horizontal,
            Y = 0,
            YAxisKey = ResidualAxisKey,
            Color = PlotStyle.Reference,
            StrokeThickness = PlotStyle.InterfaceThickness,
            LineStyle = LineStyle.Dash,
        });
        return model;
    }

    private static ScatterErrorSeries Points(
        string? title,
        IEnumerable<(double TimeSeconds, double Value, double? Deviation)> points,
        Layers.Core.Units.UnitDefinition time,
        Layers.Core.Units.UnitDefinition value,
        string? axisKey)
    {
        var series = new ScatterErrorSeries
        {
            Title = title,
            MarkerType = MarkerType.Circle,
            MarkerSize = PlotStyle.MarkerSize,
            MarkerFill = PlotStyle.SeriesColor(1),
            ErrorBarColor = PlotStyle.SeriesColor(1),
            ErrorBarStrokeThickness = 1.2,
            ErrorBarStopWidth = 3,
        };
        if (axisKey is not null)
        {
            series.YAxisKey = axisKey;
        }

        series.Points.AddRange(points.Select(point => new ScatterErrorPoint(
            time.FromSi(point.TimeSeconds),
            value.FromSi(point.Value),
            0,
            // OxyPlot draws ErrorY half above and half below the point (ScatterErrorSeries.Render), so a bar of
            // plus and minus one standard deviation is given as twice it.
            point.Deviation is { } deviation ? 2 * deviation / value.FactorToSi : 0)));
        return series;
    }

    // What the data do determine where an input is not identifiable, worded as the console words it.
    private static IEnumerable<string> Determined(FitResult fit)
        => fit.Findings
            .Where(finding => finding.NotIdentifiable)
            .Select(finding => "not identifiable: " + finding.Message + (finding.Combination is { } combination
                ? FormattableString.Invariant($"; {combination.Text} = {combination.Value:G4} {combination.Unit} ({fit.Request.Confidence * 100:0.#} % interval {combination.Lower:G4} to {combination.Upper:G4})")
                : string.Empty));

    private static string Capitalised(string text) => text.Length == 0 ? "Measured value" : char.ToUpperInvariant(text[0]) + text[1..];
}
