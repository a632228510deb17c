using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Studies;
using Layers.Core.Units;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// spread.png: percentile bands of the mass transferred per contact area into the receiving medium (the food in a
/// food-contact case, else the right medium, else the left) against time: the band between the lowest and highest
/// percentile shaded, every percentile drawn as a line.
/// </summary>
public static class SpreadPlot
{
    /// <summary>The PNG, or null when the case has no face medium.</summary>
    /// <param name="outcome">The completed study.</param>
    /// <param name="options">Picture size and time-axis choice (the command line gives a linear time axis, on which the bands read best).</param>
    public static byte[]? Render(UncertaintyOutcome outcome, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        ArgumentNullException.ThrowIfNull(options);
        var simulation = outcome.BaseCase;
        var preferred = simulation.FoodContact?.FoodSide == Side.Left || !simulation.Right.IsOpen ? NamedResult.LeftReceived : NamedResult.RightReceived;
        if (outcome.Series.FirstOrDefault(series => series.Result == preferred) is not { } spread)
        {
            return null;
        }

        var settings = outcome.Settings;
        var massUnit = DisplayText.MassPerAreaUnit(simulation.Display);
        var timeUnit = simulation.Display.Time;
        var model = PlotFrame.Create(
            simulation.Title,
            [$"{NamedResults.Quantity(preferred)}: percentiles over {settings.Samples} samples of " + string.Join("; ", settings.Inputs.Select(input => input.Describe()))],
            options);
        var timeTitle = $"Time ({DisplayText.Unit(timeUnit)})" + (options.LogTimeAxis ? ", logarithmic scale" : string.Empty);
        model.Axes.Add(PlotFrame.Axis(options.LogTimeAxis, AxisPosition.Bottom, timeTitle));
        model.Axes.Add(PlotFrame.Linear(AxisPosition.Left, $"Transferred per contact area ({DisplayText.Unit(massUnit)})"));
        var rows = outcome.TimesSeconds
            .Select((time, t) => (Time: timeUnit.FromSi(time), Values: spread.Percentiles[t].Select(massUnit.FromSi).ToArray()))
            .Where(row => row.Time > 0 && row.Values.All(double.IsFinite))
            .ToList();
        var last = settings.Percentiles.Count - 1;
        var band = new AreaSeries
        {
            Title = $"p{settings.Percentiles[0]:0.###} to p{settings.Percentiles[last]:0.###}",
            Color = OxyColors.Transparent,
            Fill = OxyColor.FromAColor(0x50, PlotStyle.SeriesColor(0)),
        };
        band.Points.AddRange(rows.Select(row => new DataPoint(row.Time, row.Values[last])));
        band.Points2.AddRange(rows.Select(row => new DataPoint(row.Time, row.Values[0])));
        model.Series.Add(band);
        for (var p = 0; p <= last; p++)
        {
            var line = new LineSeries
            {
                Title = $"p{settings.Percentiles[p]:0.###}",
                Color = PlotStyle.SeriesColor(p == 0 || p == last ? 0 : 1),
                LineStyle = p == 0 || p == last ? LineStyle.Dash : LineStyle.Solid,
                StrokeThickness = PlotStyle.SeriesThickness,
            };
            var index = p;
            line.Points.AddRange(rows.Select(row => new DataPoint(row.Time, row.Values[index])));
            model.Series.Add(line);
        }

        return PngRenderer.Render(model, options);
    }
}
