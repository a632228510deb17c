using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Units;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// Concentration across the stack at each report time (at most 12 of them, spread evenly): one colour per time, one
/// line per layer so that the jump at a partitioning interface shows as a gap, the layers as shaded bands named at
/// the top, each name inside its band clear of the interface lines: on one line, broken into lines, or turned to
/// read upward; a band too thin even for that is named in the subtitle (names that find no room are left out when
/// there are many layers). A curve drawn wholly under a later one says so in the legend. A face that touches a
/// medium (compartment or bath) gets a narrow strip beyond it showing the medium's concentration at the same
/// times, so that the jump at that face shows too.
/// </summary>
public static class ProfilePlot
{
    // Log axes show at most this many decades below the highest concentration.
    private const double LogAxisDecades = 6;

    // Width of the strip standing for a face medium, as a fraction of the stack's thickness.
    private const double MediumStripFraction = 0.08;

    // Most report times drawn: more curves would not be told apart, and each costs a line per layer.
    private const int MostTimesDrawn = 12;

    // Above this many bands, a name that finds no free row is left out rather than pushed down over the curves.
    private const int ManyBands = 40;

    // Room kept between a band's name and the lines at the band's edges, device-independent units: the placer's gap
    // and one cell of its grid on each side, so that a name that fits is also free of the lines.
    private const double NameClearance = 7;

    // Most lines a name is broken into before it is turned to read upward instead.
    private const int MostNameLines = 3;

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
        var depthUnit = simulation.Display.Depth;
        var scale = ScaleOf(simulation);
        var concentrationUnit = scale.Unit;
        var bands = Bands(simulation, depthUnit);
        var curves = Curves(result, bands, depthUnit, scale);
        var range = ValueRange(curves, options.LogConcentrationAxis);

        var model = PlotFrame.Create(
            simulation.Title,
            [TimesLine(result.Reports.Count), FaceText.Both(simulation), .. scale.Note is { } note ? new[] { note } : []],
            options);
        var thickness = depthUnit.FromSi(simulation.Stack.TotalThicknessMeters);
        var xAxis = PlotFrame.Linear(AxisPosition.Bottom, $"Depth from the left face ({DisplayText.Unit(depthUnit)})");
        xAxis.Minimum = bands[0].Left;
        xAxis.Maximum = bands[^1].Right;
        // Depth has no meaning inside the media strips: their ticks carry no numbers.
        var slack = thickness * 1e-9;
        AxisTicks.OneFormat(xAxis, value => value >= -slack && value <= thickness + slack);
        var yAxis = PlotFrame.Axis(
            options.LogConcentrationAxis, AxisPosition.Left, $"Concentration ({DisplayText.Unit(concentrationUnit)})");
        yAxis.Minimum = range.Low;
        yAxis.Maximum = range.High;
        model.Axes.Add(xAxis);
        model.Axes.Add(yAxis);

        AddBands(model, bands);
        var legendSeries = AddSeries(model, curves, range);

        using var pass = LayoutPass.Run(model, options);
        if (NameHiddenCurves(curves, legendSeries, range, xAxis, yAxis))
        {
            pass.Run();
        }

        var labels = BandLabels(pass, bands, xAxis);
        if (labels.TooThin.Count > 0 && bands.Count <= ManyBands)
        {
            // A name drawn over a band too thin to hold it would cross the lines at its edges: say it instead.
            model.Subtitle += "\n" + string.Join("\n", TextWrap.Lines(
                ["too thin to be named in the picture: " + string.Join(", ", labels.TooThin)],
                PlotFrame.SubtitleWidth(options),
                PlotStyle.SubtitleFontSize));
            pass.Run();
            labels = BandLabels(pass, bands, xAxis);
        }

        yAxis.Maximum = Headroom(pass.PlotArea, range, labels.Bottom - pass.PlotArea.Top, options.LogConcentrationAxis);
        pass.Run();
        // The new maximum may widen the tick labels and shift the plot area: place the names again.
        labels = BandLabels(pass, bands, xAxis);
        foreach (var label in labels.Boxes)
        {
            var color = label.Band.Medium is null ? PlotStyle.Text : PlotStyle.SubtleText;
            model.Annotations.Add(Labels.At(label.Box, label.Text, color, xAxis, yAxis, OxyColors.Undefined, label.Rotation));
        }

        return model;
    }

    // The layers, and a strip for the medium on each face that has one, left to right in depth units.
    private static List<Band> Bands(SimulationCase simulation, UnitDefinition depthUnit)
    {
        var stack = simulation.Stack;
        var thickness = depthUnit.FromSi(stack.TotalThicknessMeters);
        var strip = thickness * MediumStripFraction;
        var bands = new List<Band>();
        if (FaceText.MediumName(simulation.Left) is { } leftName)
        {
            bands.Add(new Band(-strip, 0, leftName, simulation.Left));
        }

        for (var i = 0; i < stack.Count; i++)
        {
            var left = depthUnit.FromSi(stack.LeftEdgeMeters(i));
            var right = i + 1 == stack.Count ? thickness : depthUnit.FromSi(stack.LeftEdgeMeters(i + 1));
            bands.Add(new Band(left, right, stack.Layers[i].Name, null));
        }

        if (FaceText.MediumName(simulation.Right) is { } rightName)
        {
            bands.Add(new Band(thickness, thickness + strip, rightName, simulation.Right));
        }

        return bands;
    }

    /// <summary>
    /// The concentration axis: the case's layer mass fraction (mg/kg, as the layers were written) when every layer
    /// and every medium drawn beside them has a density, each band divided by its own; else mass per volume, with a
    /// note when the layers were written as mass fractions.
    /// </summary>
    private static ConcentrationScale ScaleOf(SimulationCase simulation)
    {
        var display = simulation.Display;
        var volume = new ConcentrationScale(DisplayText.ConcentrationUnit(display), _ => 1, _ => 1, display.LayerMassFractionRefused);
        if (display.LayerMassFraction is not { } fraction)
        {
            return volume;
        }

        var media = new[] { simulation.Left, simulation.Right }.Where(face => face.IsOpen).ToList();
        if (media.FirstOrDefault(face => (face as CompartmentFace)?.DensityKgPerCubicMeter is null) is { } without)
        {
            var name = without switch { BathFace bath => bath.Name, CompartmentFace compartment => compartment.Name, _ => "a face medium" };
            return volume with { Note = $"concentrations in mass per volume: {name} gives no density" };
        }

        var layers = simulation.Stack.Layers;
        return new ConcentrationScale(
            fraction,
            index => layers[index].DensityKgPerCubicMeter!.Value,
            face => ((CompartmentFace)face).DensityKgPerCubicMeter!.Value,
            null);
    }

    private static List<Curve> Curves(
        SimulationResult result, List<Band> bands, UnitDefinition depthUnit, ConcentrationScale scale)
    {
        var curves = new List<Curve>();
        var simulation = result.Case;
        var concentrationUnit = scale.Unit;
        var layerBands = bands.Where(band => band.Medium is null).ToList();
        double Divisor(Band band) => band.Medium is { } medium ? scale.MediumDivisor(medium) : scale.LayerDivisor(layerBands.IndexOf(band));
        IReadOnlyList<DataPoint> Flat(Band band, double kgPerCubicMeter)
        {
            var c = concentrationUnit.FromSi(kgPerCubicMeter / Divisor(band));
            return [new DataPoint(band.Left, c), new DataPoint(band.Right, c)];
        }

        IEnumerable<IReadOnlyList<DataPoint>> Media(Func<Side, double?> concentration, bool left) =>
            bands.Where(band => band.Medium is not null && (band.Right <= 0) == left)
                .Select(band => (band, c: concentration(band.Right <= 0 ? Side.Left : Side.Right)))
                .Where(pair => pair.c is not null)
                .Select(pair => Flat(pair.band, pair.c!.Value));

        if (result.Reports.Count == 0 || result.Reports[0].Sample.TimeSeconds > 0)
        {
            double? Initial(Side side) => simulation.Face(side) switch
            {
                BathFace bath => bath.ConcentrationKgPerCubicMeter,
                CompartmentFace compartment => compartment.InitialConcentrationKgPerCubicMeter,
                _ => null,
            };
            var layers = simulation.Stack.Layers.Select((layer, index) => Flat(layerBands[index], layer.InitialConcentrationKgPerCubicMeter));
            curves.Add(new Curve(
                "t = 0 (initial)",
                PlotStyle.Initial,
                LineStyle.Dash,
                PlotStyle.ReferenceThickness,
                [.. Media(Initial, left: true), .. layers, .. Media(Initial, left: false)]));
        }

        var index = 0;
        foreach (var report in Drawn(result.Reports))
        {
            var sample = report.Sample;
            double? Medium(Side side) => (side == Side.Left ? sample.Left : sample.Right)?.ConcentrationKgPerCubicMeter;
            var layers = report.Profiles.Select((profile, layer) => (IReadOnlyList<DataPoint>)[.. profile.PositionsMeters.Zip(
                profile.ConcentrationsKgPerCubicMeter,
                (x, c) => new DataPoint(depthUnit.FromSi(x), concentrationUnit.FromSi(c / scale.LayerDivisor(layer))))]);
            var label = sample.TimeSeconds == 0
                ? "t = 0"
                : "t = " + DisplayText.Time(sample.TimeSeconds, result.Case.Display.Time) + PeriodMarks.EndOfPeriod(result.Case, sample.TimeSeconds);
            curves.Add(new Curve(
                label,
                PlotStyle.SeriesColor(index),
                PlotStyle.SeriesLineStyle(index),
                PlotStyle.SeriesThickness,
                [.. Media(Medium, left: true), .. layers, .. Media(Medium, left: false)]));
            index++;
        }

        return curves;
    }

    /// <summary>The report times drawn: all of them, or as many as can be told apart, spread evenly, the last included.</summary>
    private static IEnumerable<ReportPoint> Drawn(IReadOnlyList<ReportPoint> reports) =>
        reports.Count <= MostTimesDrawn
            ? reports
            : Enumerable.Range(0, MostTimesDrawn)
                .Select(i => (int)Math.Round(i * (reports.Count - 1) / (double)(MostTimesDrawn - 1)))
                .Distinct()
                .Select(i => reports[i]);

    private static string TimesLine(int reports) =>
        reports <= MostTimesDrawn
            ? "Concentration across the stack at the report times"
            : $"Concentration across the stack at {MostTimesDrawn} of the {reports} report times, spread evenly (all are in profiles.csv)";

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

    private static void AddBands(PlotModel model, List<Band> bands)
    {
        var layerIndex = 0;
        foreach (var band in bands)
        {
            model.Annotations.Add(new RectangleAnnotation
            {
                MinimumX = band.Left,
                MaximumX = band.Right,
                Fill = band.Medium is null ? PlotStyle.BandFills[layerIndex++ % PlotStyle.BandFills.Count] : PlotStyle.MediumFill,
                Layer = AnnotationLayer.BelowAxes,
            });
        }

        // Interfaces between layers, and the faces that touch a medium.
        foreach (var edge in bands.Skip(1).Select(band => band.Left))
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

    // Draws every curve, one series per piece; returns the series that carries each curve's legend entry.
    private static List<LineSeries> AddSeries(PlotModel model, List<Curve> curves, (double Low, double High) range)
    {
        var legend = new List<LineSeries>();
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
                if (first)
                {
                    legend.Add(series);
                }

                first = false;
            }
        }

        return legend;
    }

    // Curves drawn wholly under a later solid one (report times after the profile stopped changing) say so in the
    // legend; true when a legend entry changed, which calls for another layout pass.
    private static bool NameHiddenCurves(
        List<Curve> curves, List<LineSeries> legend, (double Low, double High) range, Axis xAxis, Axis yAxis)
    {
        var screen = curves
            .Select(curve => (IReadOnlyList<IReadOnlyList<ScreenPoint>>)[.. curve.Segments.Select(segment =>
                (IReadOnlyList<ScreenPoint>)[.. segment.Select(point =>
                    new ScreenPoint(xAxis.Transform(point.X), yAxis.Transform(Math.Max(point.Y, range.Low))))])])
            .ToList();
        var coverers = HiddenCurves.Coverers(screen, j => curves[j].Style == LineStyle.Solid);
        var changed = false;
        for (var i = 0; i < curves.Count; i++)
        {
            if (coverers[i] is { } j && legend.Count == curves.Count)
            {
                legend[i].Title = HiddenCurves.Under(curves[i].Title, curves[j].Title);
                changed = true;
            }
        }

        return changed;
    }

    private static LabelRows BandLabels(LayoutPass pass, List<Band> bands, Axis xAxis)
    {
        var area = pass.PlotArea;
        var placer = new LabelPlacer(area);
        // The interfaces and media faces are drawn lines: no name may cross them.
        foreach (var edge in bands.Skip(1).Select(band => xAxis.Transform(band.Left)))
        {
            placer.ReserveLine([new ScreenPoint(edge, area.Top), new ScreenPoint(edge, area.Bottom)], PlotStyle.InterfaceThickness / 2);
        }

        var boxes = new List<BandLabel>();
        var tooThin = new List<string>();
        var bottom = area.Top;
        foreach (var band in bands)
        {
            var (bandLeft, bandRight) = (xAxis.Transform(band.Left), xAxis.Transform(band.Right));
            if (Fit(pass, band.Name, bandRight - bandLeft) is not var (text, size, rotation))
            {
                tooThin.Add(band.Name);
                continue;
            }

            var left = (bandLeft + bandRight) / 2 - size.Width / 2;
            // Rows from the top down; a name that finds its row taken moves to a lower one rather than cover another.
            var rows = Enumerable.Range(0, 4)
                .Select(row => Labels.Box(left, area.Top + PlotStyle.LabelGap / 2 + row * size.Height, size))
                .ToList();
            if ((bands.Count > ManyBands ? placer.TryPlace(rows) : placer.Place(rows)) is not { } box)
            {
                continue;
            }

            boxes.Add(new BandLabel(box, text, band, rotation));
            bottom = Math.Max(bottom, box.Bottom);
        }

        return new LabelRows(boxes, bottom + PlotStyle.LabelGap, tooThin);
    }

    /// <summary>
    /// The name as it fits inside its band, clear of the lines at its edges: on one line, else broken at spaces into
    /// lines, else turned to read upward; null when the band is too narrow even for that.
    /// </summary>
    private static (string Text, OxySize Size, double Rotation)? Fit(LayoutPass pass, string name, double bandWidth)
    {
        var room = bandWidth - 2 * NameClearance;
        var size = Labels.BoxSize(pass, name);
        if (size.Width <= room)
        {
            return (name, size, 0);
        }

        var words = name.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (words.Length > 1)
        {
            var lines = TextWrap.Lines([name], room - 2 * Labels.Padding, PlotStyle.LabelFontSize);
            var text = string.Join("\n", lines);
            var wrapped = Labels.MultilineBoxSize(pass, text);
            if (wrapped.Width <= room && lines.Count <= MostNameLines)
            {
                return (text, wrapped, 0);
            }
        }

        return size.Height <= room ? (name, new OxySize(size.Height, size.Width), -90) : null;
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

    /// <summary>A layer, or the strip standing for the medium on a face, with its extent in depth units.</summary>
    private sealed record Band(double Left, double Right, string Name, FaceCondition? Medium);

    /// <summary>The unit of the concentration axis and what each layer's and medium's kg/m3 is divided by first (a density, or 1).</summary>
    private sealed record ConcentrationScale(UnitDefinition Unit, Func<int, double> LayerDivisor, Func<FaceCondition, double> MediumDivisor, string? Note);

    /// <summary>A band's name as placed: its box, its text (lines separated by "\n") and its rotation.</summary>
    private sealed record BandLabel(OxyRect Box, string Text, Band Band, double Rotation);

    /// <summary>The names placed, the lowest edge of their boxes, and the names of bands too thin to hold them.</summary>
    private sealed record LabelRows(List<BandLabel> Boxes, double Bottom, List<string> TooThin);
}
