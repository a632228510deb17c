using Layers.Core.Results;
using Layers.Core.Units;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// Concentration across the stack at each report time: one colour per time, one line per layer so that the jump
/// at a partitioning interface shows as a gap, the layers as shaded bands named at the top.
/// </summary>
public static class ProfilePlot
{
    // Log axes show at most this many decades below the highest concentration.
    private const double LogAxisDecades = 6;

    /// <summary>Builds the profile plot.</summary>
    /// <param name="result">A simulation result.</param>
    /// <param name="options">Picture size and axis choices.</param>
    /// <returns>The plot model, ready for <see cref="PngRenderer.Render"/> at the same options.</returns>
    public static PlotModel Create(SimulationResult result, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        var simulation = result.Case;
        var depthUnit = DisplayText.DepthUnit(simulation.Stack.TotalThicknessMeters);
        var concentrationUnit = DisplayText.ConcentrationUnit(simulation.Display);
        var curves = Curves(result, depthUnit, concentrationUnit);
        var range = ValueRange(curves, options.LogConcentrationAxis);

        var model = PlotFrame.Create(
            simulation.Title,
            ["Concentration across the stack at the report times", FaceText.Both(simulation)],
            options);
        var xAxis = PlotFrame.Linear(AxisPosition.Bottom, $"Depth from the left face ({DisplayText.Unit(depthUnit)})");
        xAxis.Minimum = 0;
        xAxis.Maximum = depthUnit.FromSi(simulation.Stack.TotalThicknessMeters);
        var yAxis = PlotFrame.Axis(
            options.LogConcentrationAxis, AxisPosition.Left, $"Concentration ({DisplayText.Unit(concentrationUnit)})");
        yAxis.Minimum = range.Low;
        yAxis.Maximum = range.High;
        model.Axes.Add(xAxis);
        model.Axes.Add(yAxis);

        var edges = LayerEdges(result, depthUnit);
        AddBands(model, edges);
        AddSeries(model, curves, range);

        using var pass = LayoutPass.Run(model, options);
        var labels = LayerLabels(pass, result, edges, xAxis);
        yAxis.Maximum = Headroom(pass.PlotArea, range, labels.Bottom - pass.PlotArea.Top, options.LogConcentrationAxis);
        pass.Run();
        // The new maximum may widen the tick labels and shift the plot area: place the names again.
        labels = LayerLabels(pass, result, edges, xAxis);
        foreach (var (box, text) in labels.Boxes)
        {
            model.Annotations.Add(Labels.At(box, text, PlotStyle.Text, xAxis, yAxis, OxyColors.Undefined));
        }

        return model;
    }

    private static List<Curve> Curves(SimulationResult result, UnitDefinition depthUnit, UnitDefinition concentrationUnit)
    {
        var curves = new List<Curve>();
        var stack = result.Case.Stack;
        if (result.Reports.Count == 0 || result.Reports[0].Sample.TimeSeconds > 0)
        {
            var initial = stack.Layers.Select((layer, index) =>
            {
                var left = depthUnit.FromSi(stack.LeftEdgeMeters(index));
                var right = depthUnit.FromSi(stack.LeftEdgeMeters(index) + layer.ThicknessMeters);
                var c = concentrationUnit.FromSi(layer.InitialConcentrationKgPerCubicMeter);
                return (IReadOnlyList<DataPoint>)[new DataPoint(left, c), new DataPoint(right, c)];
            });
            curves.Add(new Curve("t = 0 (initial)", PlotStyle.Initial, LineStyle.Dash, PlotStyle.ReferenceThickness, [.. initial]));
        }

        var index = 0;
        foreach (var report in result.Reports)
        {
            var segments = report.Profiles.Select(profile => (IReadOnlyList<DataPoint>)[.. profile.PositionsMeters.Zip(
                profile.ConcentrationsKgPerCubicMeter,
                (x, c) => new DataPoint(depthUnit.FromSi(x), concentrationUnit.FromSi(c)))]);
            var label = report.Sample.TimeSeconds == 0 ? "t = 0" : "t = " + DisplayText.Time(report.Sample.TimeSeconds);
            curves.Add(new Curve(
                label, PlotStyle.SeriesColor(index), PlotStyle.SeriesLineStyle(index), PlotStyle.SeriesThickness, [.. segments]));
            index++;
        }

        return curves;
    }

    private static (double Low, double High) ValueRange(List<Curve> curves, bool logarithmic)
    {
        var values = curves.SelectMany(curve => curve.Segments).SelectMany(segment => segment).Select(point => point.Y).ToList();
        var highest = values.Count == 0 ? 0 : values.Max();
        if (logarithmic)
        {
            var top = highest > 0 ? highest : 1;
            var lowestPositive = values.Where(value => value > 0).DefaultIfEmpty(top).Min();
            var floor = Math.Max(lowestPositive, top * Math.Pow(10, -LogAxisDecades));
            return (floor, top);
        }

        var lowest = Math.Min(0, values.Count == 0 ? 0 : values.Min());
        return (lowest, highest > lowest ? highest : lowest + 1);
    }

    private static List<double> LayerEdges(SimulationResult result, UnitDefinition depthUnit)
    {
        var stack = result.Case.Stack;
        return [.. Enumerable.Range(0, stack.Count + 1).Select(index => depthUnit.FromSi(
            index == stack.Count ? stack.TotalThicknessMeters : stack.LeftEdgeMeters(index)))];
    }

    private static void AddBands(PlotModel model, List<double> edges)
    {
        for (var i = 0; i + 1 < edges.Count; i++)
        {
            model.Annotations.Add(new RectangleAnnotation
            {
                MinimumX = edges[i],
                MaximumX = edges[i + 1],
                Fill = PlotStyle.BandFills[i % PlotStyle.BandFills.Count],
                Layer = AnnotationLayer.BelowAxes,
            });
        }

        foreach (var edge in edges.Skip(1).SkipLast(1))
        {
            model.Annotations.Add(new LineAnnotation
            {
                Type = LineAnnotationType.Vertical,
                X = edge,
                Color = PlotStyle.Interface,
                StrokeThickness = PlotStyle.InterfaceThickness,
                LineStyle = LineStyle.Solid,
                Layer = AnnotationLayer.BelowSeries,
            });
        }
    }

    private static void AddSeries(PlotModel model, List<Curve> curves, (double Low, double High) range)
    {
        foreach (var curve in curves)
        {
            var first = true;
            foreach (var segment in curve.Segments)
            {
                var series = new LineSeries
                {
                    Title = curve.Title,
                    Color = curve.Color,
                    LineStyle = curve.Style,
                    StrokeThickness = curve.Thickness,
                    RenderInLegend = first,
                    CanTrackerInterpolatePoints = false,
                };
                // On a log axis, zero and negative values sit on the bottom of the axis instead of vanishing.
                series.Points.AddRange(segment.Select(point => new DataPoint(point.X, Math.Max(point.Y, range.Low))));
                model.Series.Add(series);
                first = false;
            }
        }
    }

    private static LabelRows LayerLabels(LayoutPass pass, SimulationResult result, List<double> edges, Axis xAxis)
    {
        var area = pass.PlotArea;
        var placer = new LabelPlacer(area);
        var boxes = new List<(OxyRect Box, string Text)>();
        var bottom = area.Top;
        var layers = result.Case.Stack.Layers;
        for (var i = 0; i < layers.Count; i++)
        {
            var text = layers[i].Name;
            var size = Labels.BoxSize(pass, text);
            var centre = (xAxis.Transform(edges[i]) + xAxis.Transform(edges[i + 1])) / 2;
            var left = centre - size.Width / 2;
            // Rows from the top down; a name too wide for its band moves to a lower row rather than cover another.
            var rows = Enumerable.Range(0, 4)
                .Select(row => Labels.Box(left, area.Top + PlotStyle.LabelGap / 2 + row * size.Height, size))
                .ToList();
            var box = placer.Place(rows);
            boxes.Add((box, text));
            bottom = Math.Max(bottom, box.Bottom);
        }

        return new LabelRows(boxes, bottom + PlotStyle.LabelGap);
    }

    // The axis maximum that leaves the band of layer names above the highest value.
    private static double Headroom(OxyRect area, (double Low, double High) range, double labelHeight, bool logarithmic)
    {
        var usable = Math.Max(area.Height - labelHeight, area.Height * 0.5);
        var stretch = area.Height / usable;
        if (logarithmic)
        {
            var decades = Math.Log10(range.High / range.Low);
            return range.Low * Math.Pow(10, Math.Max(decades, 1) * stretch);
        }

        return range.Low + (range.High - range.Low) * stretch;
    }

    private sealed record Curve(
        string Title, OxyColor Color, LineStyle Style, double Thickness, IReadOnlyList<IReadOnlyList<DataPoint>> Segments);

    private sealed record LabelRows(List<(OxyRect Box, string Text)> Boxes, double Bottom);
}
