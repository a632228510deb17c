using Layers.Core.Domain;
using Layers.Core.Results;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// How the system approaches its final state. For an equilibrium (closed, or with one bath): the fraction of the
/// way to equilibrium of the whole system and of each compartment, with the 50, 90 and 99 % times marked. For
/// steady permeation between two baths: the cumulative amount received with its steady-state asymptote and lag
/// time (see <see cref="PermeationPlot"/>).
/// </summary>
public static class EquilibriumPlot
{
    private const double AxisTop = 106;

    /// <summary>Builds the approach-to-final-state plot.</summary>
    /// <param name="result">A simulation result.</param>
    /// <param name="options">Picture size and time axis choice.</param>
    /// <returns>The plot model, ready for <see cref="PngRenderer.Render"/> at the same options.</returns>
    public static PlotModel Create(SimulationResult result, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        return result.FinalState.Kind == FinalStateKind.SteadyPermeation
            ? PermeationPlot.Create(result, options)
            : Approach(result, options);
    }

    private static PlotModel Approach(SimulationResult result, PlotOptions options)
    {
        var simulation = result.Case;
        var time = TimeAxis.Create(result, options.LogTimeAxis);
        var samples = time.Samples(result).ToList();
        var tracks = Tracks(result, samples, time);

        var model = PlotFrame.Create(simulation.Title, Subtitle(result, tracks), options);
        model.Axes.Add(time.Axis);
        var yAxis = PlotFrame.Linear(AxisPosition.Left, "Progress toward the final state (%)");
        yAxis.Minimum = 0;
        yAxis.Maximum = AxisTop;
        yAxis.MajorStep = 10;
        yAxis.MinorStep = 10;
        AxisTicks.OneFormat(yAxis, value => value <= 100.5);
        yAxis.ExtraGridlines = [.. ThresholdTimes.Levels.Select(level => 100 * level)];
        yAxis.ExtraGridlineColor = PlotStyle.ThresholdLine;
        yAxis.ExtraGridlineStyle = LineStyle.Dash;
        yAxis.ExtraGridlineThickness = 1;
        model.Axes.Add(yAxis);

        foreach (var track in tracks)
        {
            var series = new LineSeries
            {
                Title = track.Title,
                Color = track.Color,
                LineStyle = track.Style,
                StrokeThickness = track.Thickness,
                MarkerType = track.Marker,
                MarkerSize = 0,
            };
            series.Points.AddRange(track.Points);
            model.Series.Add(series);
        }

        foreach (var track in tracks)
        {
            var markers = new ScatterSeries
            {
                MarkerType = track.Marker,
                MarkerSize = track.MarkerSize,
                MarkerFill = track.Color,
                MarkerStroke = OxyColors.White,
                MarkerStrokeThickness = 1.2,
                RenderInLegend = false,
            };
            markers.Points.AddRange(track.Markers.Select(marker => new ScatterPoint(marker.X, marker.Y)));
            model.Series.Add(markers);
        }

        AddMarkerLabels(model, options, tracks, time.Axis, yAxis);
        return model;
    }

    private static List<Track> Tracks(SimulationResult result, List<StateSample> samples, TimeAxis time)
    {
        var duration = result.Case.DurationSeconds;
        var tracks = new List<Track>();
        void Add(string title, Func<StateSample, double?> fraction, ThresholdTimes? thresholds)
        {
            var points = samples
                .Select(sample => (sample.TimeSeconds, Fraction: fraction(sample)))
                .Where(pair => pair.Fraction is not null)
                .Select(pair => new DataPoint(time.Unit.FromSi(pair.TimeSeconds), 100 * pair.Fraction!.Value))
                .ToList();
            if (points.Count == 0)
            {
                return;
            }

            // The whole system is drawn solid and wide with large markers; compartments dashed, narrower and with
            // smaller markers on top, so that curves which coincide (a compartment that holds most of the change)
            // stay both visible.
            var index = tracks.Count;
            var first = index == 0;
            var levels = thresholds?.AsList() ?? [];
            var markers = new List<Marker>();
            var later = new List<string>();
            var unreached = new List<string>();
            for (var i = 0; i < levels.Count; i++)
            {
                var level = ThresholdTimes.Levels[i];
                var percent = DisplayText.Percent(level);
                if (levels[i] is not { } seconds)
                {
                    unreached.Add(percent);
                }
                else if (time.Covers(seconds, duration))
                {
                    markers.Add(new Marker(time.Unit.FromSi(seconds), 100 * level, $"{percent}: {DisplayText.Time(seconds, result.Case.Display.Time)}"));
                }
                else
                {
                    later.Add($"{percent} at {DisplayText.Time(seconds, result.Case.Display.Time)}");
                }
            }

            if (unreached.Count > 0)
            {
                later.Add($"{string.Join(", ", unreached)} not reached within {DisplayText.Time(result.FinalState.HorizonSeconds, result.Case.Display.Time)}");
            }

            tracks.Add(new Track(
                title,
                PlotStyle.SeriesColor(index),
                first ? LineStyle.Solid : LineStyle.Dash,
                first ? PlotStyle.SeriesThickness * 1.6 : PlotStyle.SeriesThickness,
                PlotStyle.Markers[index % PlotStyle.Markers.Count],
                first ? PlotStyle.MarkerSize * 1.5 : PlotStyle.MarkerSize,
                points,
                markers,
                later));
        }

        Add("whole system", sample => double.IsNaN(sample.FractionOfFinalState) ? null : sample.FractionOfFinalState, result.FinalState.System);
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (result.Case.Face(side) is CompartmentFace compartment)
            {
                var thresholds = side == Side.Left ? result.FinalState.LeftCompartment : result.FinalState.RightCompartment;
                Add(
                    $"{compartment.Name} (compartment)",
                    sample => (side == Side.Left ? sample.Left : sample.Right)?.FractionOfEquilibrium,
                    thresholds);
            }
        }

        return tracks;
    }

    // Labels go beside their markers, where neither a curve nor another label is; the curves rise, so the space
    // below and to the right of a point on its own curve is usually free.
    private static void AddMarkerLabels(PlotModel model, PlotOptions options, List<Track> tracks, Axis xAxis, Axis yAxis)
    {
        using var pass = LayoutPass.Run(model, options);
        if (RoomForEdgeMarkers(pass, tracks, xAxis))
        {
            pass.Run();
        }

        var placer = new LabelPlacer(pass.PlotArea);
        foreach (var track in tracks)
        {
            placer.ReserveLine([.. track.Points.Select(point => new ScreenPoint(xAxis.Transform(point.X), yAxis.Transform(point.Y)))], 2);
        }

        var gap = PlotStyle.LabelGap;
        foreach (var track in tracks)
        {
            foreach (var marker in track.Markers)
            {
                var x = xAxis.Transform(marker.X);
                var y = yAxis.Transform(marker.Y);
                placer.Reserve(new OxyRect(x - PlotStyle.MarkerSize, y - PlotStyle.MarkerSize, 2 * PlotStyle.MarkerSize, 2 * PlotStyle.MarkerSize));
            }
        }

        foreach (var track in tracks)
        {
            foreach (var marker in track.Markers)
            {
                var x = xAxis.Transform(marker.X);
                var y = yAxis.Transform(marker.Y);
                var size = Labels.BoxSize(pass, marker.Text);
                OxyRect[] candidates =
                [
                    Labels.Box(x + gap, y + gap / 2, size),
                    Labels.Box(x - gap - size.Width, y - gap / 2 - size.Height, size),
                    Labels.Box(x + gap, y + gap / 2 + size.Height, size),
                    Labels.Box(x - gap - size.Width, y - gap / 2 - 2 * size.Height, size),
                    Labels.Box(x + 2 * gap, y + gap / 2 + 2 * size.Height, size),
                ];
                var box = placer.Place(candidates);
                model.Annotations.Add(Labels.At(box, marker.Text, track.Color, xAxis, yAxis, PlotStyle.LabelBackground));
            }
        }
    }

    // A threshold reached at the very start or end of the time axis would have its marker cut in half by the frame:
    // the axis then reaches a marker's width further. True when it changed, which calls for another layout pass.
    private static bool RoomForEdgeMarkers(LayoutPass pass, List<Track> tracks, Axis xAxis)
    {
        var room = tracks.Select(track => track.MarkerSize).DefaultIfEmpty(0).Max() + 2;
        var xs = tracks.SelectMany(track => track.Markers).Select(marker => xAxis.Transform(marker.X)).ToList();
        var (left, right) = (pass.PlotArea.Left, pass.PlotArea.Right);
        var changed = false;
        if (xs.Any(x => x > right - room))
        {
            xAxis.Maximum = xAxis.InverseTransform(Math.Max(xs.Max(), right) + room);
            changed = true;
        }

        if (xs.Any(x => x < left + room))
        {
            xAxis.Minimum = xAxis.InverseTransform(Math.Min(xs.Min(), left) - room);
            changed = true;
        }

        return changed;
    }

    private static IEnumerable<string> Subtitle(SimulationResult result, List<Track> tracks)
    {
        var final = result.FinalState;
        yield return final.Kind switch
        {
            FinalStateKind.BathEquilibrium => "Progress toward equilibrium with the bath: 0 % at the start, 100 % at equilibrium",
            FinalStateKind.AllRemoved => "Everything ends in the first-order removal: the whole system's progress is the fraction of the initial mass removed",
            _ when final.MassLeftAfterSamplingPerArea is not null && final.LastSampleSeconds is { } last
                => $"Progress toward the closed-system equilibrium of the mass left after the last sample ({DisplayText.Time(last, result.Case.Display.Time)}): 0 % at the start, 100 % at equilibrium",
            _ => "Progress toward the closed-system equilibrium: 0 % at the start, 100 % at equilibrium",
        };
        var beyond = tracks.Where(track => track.Missed.Count > 0)
            .Select(track => $"{track.Title}: {string.Join(", ", track.Missed)}")
            .ToList();
        if (beyond.Count > 0)
        {
            yield return $"not within the {DisplayText.Time(result.Case.DurationSeconds, result.Case.Display.Time)} simulated \u2014 " + string.Join("; ", beyond);
        }
    }

    private sealed record Marker(double X, double Y, string Text);

    private sealed record Track(
        string Title,
        OxyColor Color,
        LineStyle Style,
        double Thickness,
        MarkerType Marker,
        double MarkerSize,
        List<DataPoint> Points,
        List<Marker> Markers,
        List<string> Missed);
}
