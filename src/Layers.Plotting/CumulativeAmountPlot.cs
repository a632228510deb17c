using Layers.Core.Results;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// Model and experiment on one picture: the simulated cumulative amount per area received by the right face medium
/// (line), the amounts of the receptor samples corrected for earlier samples (open markers), the measured amounts
/// (filled markers), and the steady line fitted to each (dashed), whose intercepts are the lag times. A curve that
/// reaches no steady line gets no line; the subtitle says why.
/// </summary>
internal static class CumulativeAmountPlot
{
    private const double TopMargin = 0.08;

    // Room beyond the data at each edge where markers sit, as a fraction of the axis range: a marker's radius and more.
    private const double MarkerRoom = 0.012;

    /// <summary>True when the result has permeation metrics to show.</summary>
    public static bool Applies(SimulationResult result)
        => result.DiffusionCell is { } cell && (cell.Simulated is not null || cell.Measured is not null);

    public static PlotModel Create(SimulationResult result, PlotOptions options)
    {
        var simulation = result.Case;
        var cell = result.DiffusionCell!;
        var massUnit = DisplayText.MassPerAreaUnit(simulation.Display);
        var time = TimeAxis.Create(result, logarithmic: false);
        var receiver = FaceText.MediumName(simulation.Right) ?? "right face";
        var anySteady = new[] { cell.Simulated, cell.Measured }.Any(metrics => metrics is { IsSteady: true });
        var subtitle = new List<string>
        {
            $"Cumulative amount received by {receiver}: model and measurements" + (anySteady ? ", with the steady lines" : string.Empty),
        };
        subtitle.AddRange(new[] { cell.Simulated, cell.Measured }
            .Where(metrics => metrics?.NoSteadyLineReason is not null)
            .Select(metrics => $"no steady line for the {metrics!.Source} data: {metrics.NoSteadyLineReason}"));
        var model = PlotFrame.Create(simulation.Title, subtitle, options);
        model.Axes.Add(time.Axis);
        var yAxis = PlotFrame.Linear(AxisPosition.Left, $"Cumulative amount per area ({DisplayText.Unit(massUnit)})");
        model.Axes.Add(yAxis);

        var simulated = new LineSeries { Title = "simulated", Color = PlotStyle.SeriesColor(0), StrokeThickness = PlotStyle.SeriesThickness };
        simulated.Points.AddRange(result.TimeSeries
            .Where(sample => sample.Right is not null)
            .Select(sample => new DataPoint(time.Unit.FromSi(sample.TimeSeconds), massUnit.FromSi(sample.Right!.TransferredIntoMediumPerArea))));
        model.Series.Add(simulated);

        foreach (var sampled in cell.Sampling.Where(sampled => sampled.Side == Layers.Core.Domain.Side.Right))
        {
            var samples = new ScatterSeries
            {
                Title = "simulated samples, corrected",
                MarkerType = MarkerType.Circle,
                MarkerSize = PlotStyle.MarkerSize,
                MarkerFill = OxyColors.White,
                MarkerStroke = PlotStyle.SeriesColor(0),
                MarkerStrokeThickness = 1.2,
            };
            samples.Points.AddRange(sampled.Points.Select(point =>
                new ScatterPoint(time.Unit.FromSi(point.TimeSeconds), massUnit.FromSi(point.CorrectedCumulativePerArea))));
            model.Series.Add(samples);
        }

        if (simulation.PermeationTest?.Measured is { } measured)
        {
            var points = new ScatterSeries
            {
                Title = $"measured ({measured.FileName})",
                MarkerType = MarkerType.Square,
                MarkerSize = PlotStyle.MarkerSize,
                MarkerFill = PlotStyle.SeriesColor(1),
            };
            points.Points.AddRange(measured.TimesSeconds.Zip(measured.CumulativePerArea)
                .Select(pair => new ScatterPoint(time.Unit.FromSi(pair.First), massUnit.FromSi(pair.Second))));
            model.Series.Add(points);
        }

        AddLine(model, cell.Simulated, 0, time.Unit, massUnit);
        AddLine(model, cell.Measured, 1, time.Unit, massUnit);

        var high = model.Series.OfType<LineSeries>().SelectMany(series => series.Points.Select(point => point.Y))
            .Concat(model.Series.OfType<ScatterSeries>().SelectMany(series => series.Points.Select(point => point.Y)))
            .DefaultIfEmpty(0)
            .Max();
        var top = high > 0 ? high * (1 + TopMargin) : 1;
        // Samples sit at t = 0, at the end of the duration and on zero amounts: a little room beyond those edges
        // draws their markers whole instead of cut in half by the frame. The room carries no tick labels.
        yAxis.Minimum = -MarkerRoom * top;
        yAxis.Maximum = top;
        AxisTicks.OneFormat(yAxis, value => value >= 0);
        var end = time.Axis.Maximum;
        var slack = end * 1e-9;
        time.Axis.Minimum = -MarkerRoom * end;
        time.Axis.Maximum = end * (1 + MarkerRoom);
        AxisTicks.OneFormat(time.Axis, value => value >= -slack && value <= end + slack);
        return model;
    }

    private static void AddLine(PlotModel model, PermeationMetrics? metrics, int colour, Layers.Core.Units.UnitDefinition timeUnit, Layers.Core.Units.UnitDefinition massUnit)
    {
        if (metrics is not { IsSteady: true })
        {
            return;
        }

        var flux = metrics.SteadyFluxKgPerSquareMeterSecond;
        var fluxText = $"{DisplayText.Number(massUnit.FromSi(flux * timeUnit.FactorToSi))} {DisplayText.Unit(massUnit)}/{DisplayText.Unit(timeUnit)}";
        var line = new LineSeries
        {
            Title = $"{metrics.Source} steady line: J = {fluxText}, lag time {DisplayText.Time(metrics.LagTimeSeconds, timeUnit)}",
            Color = PlotStyle.SeriesColor(colour),
            LineStyle = LineStyle.Dash,
            StrokeThickness = PlotStyle.ReferenceThickness,
        };
        var start = Math.Max(metrics.LagTimeSeconds, 0);
        line.Points.Add(new DataPoint(timeUnit.FromSi(start), massUnit.FromSi(flux * (start - metrics.LagTimeSeconds))));
        line.Points.Add(new DataPoint(timeUnit.FromSi(metrics.ToSeconds), massUnit.FromSi(flux * (metrics.ToSeconds - metrics.LagTimeSeconds))));
        model.Series.Add(line);
    }
}
