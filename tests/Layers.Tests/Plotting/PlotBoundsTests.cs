using Layers.Core.Cases;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Plotting;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Series;

namespace Layers.Tests.Plotting;

/// <summary>
/// Plots of any data finish in bounded work: lines far off the plot are clipped before labels are placed around
/// them, the profile draws a bounded number of report times and the closed-stack holdings a bounded number of
/// layers (common practice, no source).
/// </summary>
public sealed class PlotBoundsTests
{
    private static readonly OxyRect Area = new(0, 0, 200, 100);

    [Fact]
    public void A_segment_is_clipped_to_the_part_inside_the_rectangle()
    {
        // Hand calculation: from (100, 1e12) to (100, 50) leaves the bottom edge y = 100 at x = 100; from (-100, 0)
        // to (300, 100) enters x = 0 at y = 25 and leaves x = 200 at y = 75.
        var vertical = SegmentClip.ToRect(new ScreenPoint(100, 1e12), new ScreenPoint(100, 50), Area);
        var slanted = SegmentClip.ToRect(new ScreenPoint(-100, 0), new ScreenPoint(300, 100), Area);
        var outside = SegmentClip.ToRect(new ScreenPoint(-100, -10), new ScreenPoint(300, -1), Area);

        Assert.NotNull(vertical);
        Assert.Equal(100, vertical.Value.From.X, 9);
        Assert.Equal(100, vertical.Value.From.Y, 9);
        Assert.Equal(50, vertical.Value.To.Y, 9);
        Assert.NotNull(slanted);
        Assert.Equal(25, slanted.Value.From.Y, 9);
        Assert.Equal(75, slanted.Value.To.Y, 9);
        Assert.Null(outside);
    }

    [Fact]
    public void A_line_running_a_billion_pixels_off_the_plot_blocks_labels_only_where_it_crosses_the_plot()
    {
        var placer = new LabelPlacer(Area);

        // Walked unclipped in 3-pixel steps, this line would give some 7e8 boxes.
        placer.ReserveLine([new ScreenPoint(50, -1e9), new ScreenPoint(50, 1e9)], 2);

        var free = placer.TryPlace([new OxyRect(120, 40, 40, 10)]);
        var crossed = placer.TryPlace([new OxyRect(40, 40, 40, 10)]);
        Assert.Equal(120, free!.Value.Left);
        Assert.Null(crossed);
    }

    [Fact]
    public void An_equilibrium_fraction_far_above_the_axis_gives_a_plot_with_its_labels_inside()
    {
        // Invented: a tiny compartment beside a thick sink layer with K = 1e8, so that the compartment's fraction of
        // the way to equilibrium runs to huge values (the case of the report in issue 16, shortened).
        var read = CaseDocument.ReadText(
            """
            {
              "title": "Fraction far off the plot",
              "layers": [
                { "name": "source", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "partitionCoefficient": 1, "initialConcentration": "1 mg/mL" },
                { "name": "sink", "thickness": "5 cm", "diffusionCoefficient": "1e-7 cm2/s", "partitionCoefficient": 1e8 }
              ],
              "left": { "kind": "compartment", "name": "left", "volume": "0.05 mL", "area": "0.15 cm2" },
              "right": { "kind": "closed" },
              "duration": "1 d"
            }
            """,
            "far.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);
        // The axis ends at 106 %.
        Assert.Contains(result.TimeSeries, sample => sample.Left?.FractionOfEquilibrium is > 2);

        var model = EquilibriumPlot.Create(result, new PlotOptions());

        var png = PngRenderer.Render(model, new PlotOptions());
        Assert.True(png.Length > 1000);
        Assert.All(model.Annotations.OfType<TextAnnotation>(), label => Assert.InRange(label.TextPosition.Y, 0, 106));
    }

    [Fact]
    public void A_profile_with_many_report_times_draws_twelve_spread_evenly_and_says_so()
    {
        var times = string.Join(", ", Enumerable.Range(1, 40).Select(hour => $"\"{hour} h\""));
        var read = CaseDocument.ReadText(
            $$"""
            {
              "title": "Forty report times",
              "layers": [ { "name": "gel", "thickness": "1 mm", "diffusionCoefficient": "5e-7 cm2/s", "partitionCoefficient": 1, "initialConcentration": "1 mg/mL" } ],
              "left": { "kind": "closed" },
              "right": { "kind": "compartment", "name": "receptor", "volume": "20 mL", "area": "2 cm2" },
              "duration": "40 h",
              "reportTimes": [{{times}}]
            }
            """,
            "forty.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);

        var model = ProfilePlot.Create(result, new PlotOptions());

        var legend = model.Series.OfType<LineSeries>().Where(line => line.RenderInLegend).Select(line => line.Title).ToList();
        // The initial state (the reports start after t = 0) and 12 of the 40 report times, the first and the last.
        Assert.Equal(13, legend.Count);
        Assert.Equal("t = " + DisplayText.Time(3600, result.Case.Display.Time), legend[1]);
        Assert.Equal("t = " + DisplayText.Time(40 * 3600, result.Case.Display.Time), legend[^1]);
        Assert.Contains("12 of the 40 report times", model.Subtitle.Replace('\n', ' '), StringComparison.Ordinal);
    }

    [Fact]
    public void A_closed_stack_of_many_layers_draws_the_twelve_that_hold_most()
    {
        var layers = string.Join(", ", Enumerable.Range(0, 30).Select(i =>
            $$"""{ "name": "l{{i}}", "thickness": "10 um", "diffusionCoefficient": "1e-9 cm2/s", "partitionCoefficient": 1, "initialConcentration": "{{(i == 0 ? 1 : 0)}} mg/mL" }"""));
        var read = CaseDocument.ReadText(
            $$"""
            { "title": "Thirty layers", "layers": [{{layers}}], "left": { "kind": "closed" }, "right": { "kind": "closed" }, "duration": "1 h" }
            """,
            "thirty.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);

        var model = TransferPlot.Create(result, new PlotOptions());

        var lines = model.Series.OfType<LineSeries>().Select(line => line.Title).ToList();
        Assert.Equal(12, lines.Count);
        // Only the first layer is loaded and diffusion spreads it from there: the layers nearest to it hold most.
        Assert.Equal(Enumerable.Range(0, 12).Select(i => $"in l{i}"), lines);
    }

    [Fact]
    public void A_profile_of_many_thin_layers_names_only_those_with_room_and_no_two_names_overlap()
    {
        var layers = string.Join(", ", Enumerable.Range(0, 60).Select(i =>
            $$"""{ "name": "coating number {{i}}", "thickness": "{{(i % 10 == 0 ? 100 : 10)}} um", "diffusionCoefficient": "1e-9 cm2/s", "partitionCoefficient": 1, "initialConcentration": "{{(i == 0 ? 1 : 0)}} mg/mL" }"""));
        var read = CaseDocument.ReadText(
            $$"""
            { "title": "Sixty layers", "layers": [{{layers}}], "left": { "kind": "closed" }, "right": { "kind": "closed" }, "duration": "1 h" }
            """,
            "sixty.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);

        var model = ProfilePlot.Create(result, new PlotOptions());

        // 60 names of some 130 pixels cannot sit side by side over 54 bands of about 10 pixels and 6 of about 95 in
        // four rows; a name never crosses the lines at its band's edges, so only the wide bands are named.
        var names = model.Annotations.OfType<TextAnnotation>().ToList();
        Assert.InRange(names.Count, 1, 59);
        var rows = names.GroupBy(name => name.TextPosition.Y).ToList();
        Assert.InRange(rows.Count, 1, 4);
        foreach (var row in rows)
        {
            var centres = row.Select(name => name.TextPosition.X).Order().ToList();
            Assert.Equal(centres.Count, centres.Distinct().Count());
        }
    }
}
