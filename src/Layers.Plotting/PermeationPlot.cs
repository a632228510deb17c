using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.Units;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// Steady permeation between two baths: the cumulative amount received by the receiving bath against linear time,
/// the steady-state asymptote J (t - t_lag) as a dashed line, and its intercept on the time axis, the lag time.
/// </summary>
internal static class PermeationPlot
{
    private const double TopMargin = 0.08;

    public static PlotModel Create(SimulationResult result, PlotOptions options)
    {
        var simulation = result.Case;
        var permeation = result.Permeation;
        var flux = permeation?.SteadyFluxKgPerSquareMeterSecond ?? 0;
        var receiving = flux >= 0 ? Side.Right : Side.Left;
        var receiver = FaceText.MediumName(simulation.Face(receiving)) ?? receiving.ToString();
        var massUnit = DisplayText.MassPerAreaUnit(simulation.Display);
        var time = TimeAxis.Create(result, logarithmic: false);
        var duration = simulation.DurationSeconds;
        var lag = permeation?.LagTimeSeconds;

        var subtitle = Subtitle(result, receiver, time.Unit, massUnit);
        var model = PlotFrame.Create(simulation.Title, PeriodMarks.Text(result, time) is { } marks ? subtitle.Append(marks) : subtitle, options);
        model.Axes.Add(time.Axis);
        var yAxis = PlotFrame.Linear(AxisPosition.Left, $"Cumulative amount received per area ({DisplayText.Unit(massUnit)})");
        model.Axes.Add(yAxis);

        var received = new LineSeries
        {
            Title = $"received by {receiver}",
            Color = PlotStyle.SeriesColor(0),
            StrokeThickness = PlotStyle.SeriesThickness,
        };
        received.Points.AddRange(time.Samples(result)
            .Select(sample => (sample.TimeSeconds, Face: receiving == Side.Left ? sample.Left : sample.Right))
            .Where(pair => pair.Face is not null)
            .Select(pair => new DataPoint(time.Unit.FromSi(pair.TimeSeconds), massUnit.FromSi(pair.Face!.TransferredIntoMediumPerArea))));
        model.Series.Add(received);
        PeriodMarks.Draw(model, result, time);

        var asymptote = new LineSeries
        {
            Title = "steady-state asymptote J\u00B7(t \u2212 lag time)",
            Color = PlotStyle.SeriesColor(1),
            LineStyle = LineStyle.Dash,
            StrokeThickness = PlotStyle.ReferenceThickness,
        };
        if (lag is { } lagSeconds && lagSeconds < duration)
        {
            asymptote.Points.Add(new DataPoint(time.Unit.FromSi(lagSeconds), 0));
            asymptote.Points.Add(new DataPoint(time.Unit.FromSi(duration), massUnit.FromSi(Math.Abs(flux) * (duration - lagSeconds))));
            model.Series.Add(asymptote);
        }

        var values = received.Points.Concat(asymptote.Points).Select(point => point.Y).DefaultIfEmpty(0).ToList();
        var high = Math.Max(values.Max(), 0);
        yAxis.Maximum = high > 0 ? high * (1 + TopMargin) : 1;
        yAxis.Minimum = 0;
        AxisTicks.OneFormat(yAxis, value => value >= 0);

        if (lag is { } shown && shown < duration)
        {
            AddLagMarker(model, options, time.Unit.FromSi(shown), $"lag time {DisplayText.Time(shown, result.Case.Display.Time)}", time.Axis, yAxis);
        }

        return model;
    }

    private static void AddLagMarker(PlotModel model, PlotOptions options, double lag, string text, Axis xAxis, Axis yAxis)
    {
        model.Annotations.Add(new PointAnnotation
        {
            X = lag,
            Y = 0,
            Shape = MarkerType.Circle,
            Size = PlotStyle.MarkerSize + 1,
            Fill = PlotStyle.Reference,
            Stroke = OxyColors.White,
            StrokeThickness = 1.2,
            ClipByYAxis = false,
            Layer = AnnotationLayer.AboveSeries,
        });

        using var pass = LayoutPass.Run(model, options);
        // Lift zero off the frame by the marker's size so that the marker on the time axis shows whole.
        var lift = (PlotStyle.MarkerSize + 3) / pass.PlotArea.Height;
        yAxis.Minimum = -lift / (1 - lift) * yAxis.Maximum;
        pass.Run();
        var placer = new LabelPlacer(pass.PlotArea);
        foreach (var series in model.Series.OfType<LineSeries>())
        {
            placer.ReserveLine([.. series.Points.Select(point => new ScreenPoint(xAxis.Transform(point.X), yAxis.Transform(point.Y)))], 2);
        }

        var x = xAxis.Transform(lag);
        var y = yAxis.Transform(0);
        var size = Labels.BoxSize(pass, text);
        var gap = PlotStyle.LabelGap;
        // Just above the time axis, beside the marker: to the right the asymptote leaves a widening free wedge.
        var candidates = Enumerable.Range(0, 12)
            .SelectMany(step => new[]
            {
                Labels.Box(x + gap + step * gap * 2, y - gap - size.Height, size),
                Labels.Box(x - gap - size.Width - step * gap * 2, y - gap - size.Height, size),
            })
            .ToList();
        var box = placer.Place(candidates);
        model.Annotations.Add(Labels.At(box, text, PlotStyle.Reference, xAxis, yAxis, PlotStyle.LabelBackground));
        if (box.Left > x + gap * 1.5 || box.Right < x - gap * 1.5)
        {
            // The label had to move away from the marker: a thin leader joins them.
            var nearX = box.Left > x ? box.Left : box.Right;
            model.Annotations.Add(new ArrowAnnotation
            {
                StartPoint = new DataPoint(xAxis.InverseTransform(nearX), yAxis.InverseTransform(box.Top + box.Height / 2)),
                EndPoint = new DataPoint(lag, 0),
                Color = PlotStyle.Reference,
                StrokeThickness = 0.8,
                HeadLength = 0,
                HeadWidth = 0,
            });
        }
    }

    private static IEnumerable<string> Subtitle(SimulationResult result, string receiver, UnitDefinition timeUnit, UnitDefinition massUnit)
    {
        yield return !Simulator.LagTimeDefined(result.Case)
            ? $"Cumulative amount received by {receiver}"
            : $"Cumulative amount received by {receiver}, with the steady-state asymptote";
        if (result.Permeation is not { } permeation)
        {
            yield break;
        }

        var flux = Math.Abs(permeation.SteadyFluxKgPerSquareMeterSecond);
        var fluxText = $"{DisplayText.Number(massUnit.FromSi(flux * timeUnit.FactorToSi))} {DisplayText.Unit(massUnit)}/{DisplayText.Unit(timeUnit)}";
        var duration = result.Case.DurationSeconds;
        var lagText = permeation.LagTimeSeconds switch
        {
            null when !Simulator.LagTimeDefined(result.Case) => "no lag time: the schedule changes a medium during the run",
            null => $"steady state not reached within {DisplayText.Time(result.FinalState.HorizonSeconds, result.Case.Display.Time)}: no lag time",
            { } lag when lag >= duration => $"lag time {DisplayText.Time(lag, result.Case.Display.Time)}, beyond the {DisplayText.Time(duration, result.Case.Display.Time)} simulated",
            { } lag => $"lag time {DisplayText.Time(lag, result.Case.Display.Time)}",
        };
        var analytic = permeation.AnalyticLagTimeSeconds is { } reference
            ? $" (single membrane, L\u00B2/6D: {DisplayText.Time(reference, result.Case.Display.Time)})"
            : string.Empty;
        var which = !Simulator.LagTimeDefined(result.Case) ? "steady flux with the last period's media" : "steady flux";
        yield return $"{which} J = {fluxText};  {lagText}{analytic}";
    }
}
