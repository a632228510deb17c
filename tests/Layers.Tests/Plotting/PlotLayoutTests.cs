using System.Text.RegularExpressions;
using Layers.Core.Domain;
using Layers.Core.Reports;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.Units;
using Layers.Core.Verification;
using Layers.Plotting;
using Layers.Tests.TestSupport;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Tests.Plotting;

/// <summary>
/// How the plots are laid out, checked on the laid-out models (common practice, no source: what a careful reader
/// trips on): no layer name crosses an interface line, one tick notation per axis, subtitles within the plot area,
/// markers drawn whole, curves hidden under others named as such, files named by what they show, and captions that
/// say what a figure shows.
/// </summary>
public sealed partial class PlotLayoutTests(PlotCases cases) : IClassFixture<PlotCases>
{
    private static readonly PlotOptions[] Sizes = [new(), new(800, 500)];

    private static readonly Lazy<SimulationResult> ThinLayers = new(() => Simulator.Run(ThinLayerCase()));

    [Fact]
    public void No_layer_or_medium_name_crosses_an_interface_line()
    {
        foreach (var result in new[] { ThinLayers.Value, cases.Demo, cases.Permeation })
        {
            foreach (var options in Sizes)
            {
                var model = ProfilePlot.Create(result, options);
                using var pass = LayoutPass.Run(model, options);
                var (xAxis, yAxis) = (model.Axes.Single(axis => axis.IsHorizontal()), model.Axes.Single(axis => axis.IsVertical()));
                var lines = model.Annotations.OfType<LineAnnotation>().Select(line => xAxis.Transform(line.X)).ToList();
                var names = model.Annotations.OfType<TextAnnotation>().ToList();

                Assert.NotEmpty(names);
                foreach (var name in names)
                {
                    var box = ScreenBox(pass, name, xAxis, yAxis);
                    Assert.DoesNotContain(lines, x => x > box.Left && x < box.Right);
                }
            }
        }
    }

    [Fact]
    public void A_name_too_wide_for_its_band_is_broken_into_lines_or_turned_and_one_too_thin_is_named_in_the_subtitle()
    {
        var model = ProfilePlot.Create(ThinLayers.Value, new PlotOptions());
        var names = model.Annotations.OfType<TextAnnotation>().ToList();

        // "aqueous donor phase" on its 8 % strip, "stratum corneum" on 15 um of 375 um.
        Assert.Contains(names, name => name.Text?.Contains('\n', StringComparison.Ordinal) == true);
        Assert.Contains(names, name => name.TextRotation == -90 && name.Text == "stratum corneum");
        // The 0.05 um primer is a fraction of a pixel wide.
        Assert.DoesNotContain(names, name => name.Text?.Contains("primer", StringComparison.Ordinal) == true);
        Assert.Contains("too thin to be named in the picture: primer", model.Subtitle.Replace('\n', ' '), StringComparison.Ordinal);
    }

    [Fact]
    public void Every_axis_of_every_plot_labels_its_ticks_in_one_notation()
    {
        foreach (var (model, options) in AllModels())
        {
            using var pass = LayoutPass.Run(model, options);
            foreach (var axis in model.Axes)
            {
                var labels = TickLabels(axis);
                var powers = labels.Count(label => PowerOfTen().IsMatch(label));
                Assert.True(powers == 0 || powers == labels.Count, $"{model.Title} / {axis.Title}: {string.Join(" | ", labels)}");
            }
        }
    }

    [Fact]
    public void An_axis_from_0_to_0_0012_writes_every_tick_as_a_power_of_ten_and_one_from_0_to_0_009_none()
    {
        // 0.0002 needs a power of ten; 0.001 beside it would read plain without the one-notation rule.
        static List<string> Labels(double maximum)
        {
            var model = PlotFrameModel(maximum);
            using var pass = LayoutPass.Run(model, new PlotOptions());
            return TickLabels(model.Axes[1]);
        }

        var small = Labels(0.0012);
        var plain = Labels(0.009);

        Assert.Contains("10\u207B\u00B3", small);
        Assert.All(small.Where(label => label != "0"), label => Assert.Matches(PowerOfTen(), label));
        Assert.Contains("0.001", plain);
        Assert.DoesNotContain(plain, label => PowerOfTen().IsMatch(label));
    }

    [Fact]
    public void Every_subtitle_line_fits_within_the_plot_area()
    {
        foreach (var (model, options) in AllModels().Append((PlotFrameModel(1, string.Join(' ', Enumerable.Repeat("a long subtitle", 40))), new PlotOptions())))
        {
            using var pass = LayoutPass.Run(model, options);
            foreach (var line in (model.Subtitle ?? string.Empty).Split('\n'))
            {
                var width = pass.Measure(line, PlotStyle.SubtitleFontSize).Width;
                Assert.True(width <= pass.PlotArea.Width, $"{model.Title}: \"{line}\" is {width:F0} wide, the plot area {pass.PlotArea.Width:F0}");
            }
        }
    }

    [Fact]
    public void A_verification_plot_draws_every_marker_whole_inside_the_plot_area()
    {
        // Invented curve spanning four decades, with values at both ends of both axes.
        var x = Enumerable.Range(0, 41).Select(i => Math.Pow(10, -4 + i / 10.0)).ToList();
        var y = x.Select(value => Math.Sqrt(value)).ToList();
        var benchmark = new BenchmarkResult("invented", "no source", "y", 1, 1, 1e-3, new BenchmarkCurve("x", "y", x, y, y));
        var options = new PlotOptions(900, 560);

        AssertMarkersWhole(OverlayPlot.Create(benchmark, benchmark.Curve!, options), options);
    }

    [Fact]
    public void The_cumulative_plot_draws_samples_at_zero_and_at_the_end_of_the_duration_whole()
    {
        // The shipped sampling case: samples at t = 0 with nothing received, and at the end of the 48 h.
        var read = Layers.Core.Studies.CaseDocument.ReadFile(RepoRoot.File("cases", "skin-diffusion-cell-sampling.json"));
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);
        var options = new PlotOptions();
        var model = CumulativeAmountPlot.Create(result, options);

        var points = model.Series.OfType<ScatterSeries>().SelectMany(series => series.Points).ToList();
        Assert.Contains(points, point => point.Y == 0);
        Assert.Contains(points, point => Math.Abs(point.X - 48) < 1e-9);
        AssertMarkersWhole(model, options);
    }

    [Fact]
    public void A_threshold_reached_at_the_end_of_the_duration_has_its_marker_drawn_whole()
    {
        // The demo solved again up to the time it reaches 90 %: that marker sits on the last time of the axis.
        var ninety = cases.Demo.FinalState.System.NinetyPercent;
        Assert.NotNull(ninety);
        var simulation = cases.Demo.Case;
        var ending = Simulator.Run(simulation with
        {
            DurationSeconds = ninety.Value,
            ReportTimesSeconds = [.. simulation.ReportTimesSeconds.Where(t => t < ninety.Value), ninety.Value],
        });
        var options = new PlotOptions();
        var model = EquilibriumPlot.Create(ending, options);

        var points = model.Series.OfType<ScatterSeries>().SelectMany(series => series.Points).ToList();
        var end = model.Series.OfType<LineSeries>().First().Points[^1].X;
        Assert.Contains(points, point => point.Y == 90 && Math.Abs(point.X / end - 1) < 1e-3);
        AssertMarkersWhole(model, options);
    }

    private static void AssertMarkersWhole(PlotModel model, PlotOptions options)
    {
        using var pass = LayoutPass.Run(model, options);
        foreach (var markers in model.Series.OfType<ScatterSeries>())
        {
            var (xAxis, yAxis) = (markers.XAxis, markers.YAxis);
            Assert.All(markers.Points, point =>
            {
                var (sx, sy) = (xAxis.Transform(point.X), yAxis.Transform(point.Y));
                Assert.InRange(sx, pass.PlotArea.Left + markers.MarkerSize, pass.PlotArea.Right - markers.MarkerSize);
                Assert.InRange(sy, pass.PlotArea.Top + markers.MarkerSize, pass.PlotArea.Bottom - markers.MarkerSize);
            });
        }
    }

    [Fact]
    public void A_profile_wholly_under_a_later_one_says_so_in_the_legend()
    {
        // At 20 and 40 lag times the membrane's profile is the steady straight line both times.
        var steady = Simulator.Run(PlotCases.Membrane() with { ReportTimesSeconds = [4 * 3600, 4 * 86400, 8 * 86400], DurationSeconds = 8 * 86400 });
        var model = ProfilePlot.Create(steady, new PlotOptions());

        var legend = model.Series.OfType<LineSeries>().Where(line => line.RenderInLegend).Select(line => line.Title).ToList();

        // A case built in code shows its times in hours (DisplayUnits' default), every curve in the run's one unit.
        Assert.Contains("t = 96\u00A0h (under t = 192\u00A0h)", legend);
        Assert.Contains("t = 4\u00A0h", legend);
        Assert.Contains("t = 192\u00A0h", legend);
    }

    [Fact]
    public void A_curve_counts_as_hidden_only_when_a_later_solid_curve_runs_within_a_pixel_of_all_of_it()
    {
        // Screen coordinates worked by hand: the second curve lies 0.5 px from the third everywhere, the first 3 px.
        IReadOnlyList<IReadOnlyList<ScreenPoint>> Line(double offset) => [[new ScreenPoint(0, 10 + offset), new ScreenPoint(100, 50 + offset)]];
        var curves = new[] { Line(3), Line(0.5), Line(0) };

        var solid = HiddenCurves.Coverers(curves, _ => true);
        var dashedTop = HiddenCurves.Coverers(curves, j => j != 2);

        Assert.Equal(new int?[] { null, 2, null }, solid);
        Assert.Equal(new int?[] { null, null, null }, dashedTop);
    }

    [Fact]
    public void The_third_plot_is_named_by_what_it_shows()
    {
        var equilibrium = PlotSet.Render(cases.Demo, new PlotOptions(800, 500));
        var permeation = PlotSet.Render(cases.Permeation, new PlotOptions(800, 500));

        Assert.Equal(FinalStateKind.SteadyPermeation, cases.Permeation.FinalState.Kind);
        Assert.Contains(PlotSet.EquilibriumFileName, equilibrium.Keys);
        Assert.DoesNotContain(PlotSet.PermeationFileName, equilibrium.Keys);
        Assert.Contains(PlotSet.PermeationFileName, permeation.Keys);
        Assert.DoesNotContain(PlotSet.EquilibriumFileName, permeation.Keys);
    }

    [Fact]
    public void Every_plot_has_a_caption_saying_what_it_shows_and_report_html_carries_it()
    {
        foreach (var result in new[] { cases.Demo, cases.Permeation, ThinLayers.Value })
        {
            var pictures = PlotSet.Render(result, new PlotOptions(800, 500));
            var captions = PlotSet.Captions(result);

            Assert.Equal(pictures.Keys.Order(StringComparer.Ordinal), captions.Keys.Order(StringComparer.Ordinal));
            Assert.All(captions, caption => Assert.True(caption.Value.Length > 80 && !caption.Value.Contains(".png", StringComparison.Ordinal), caption.Value));
            var html = HtmlReport.Write(result, "case.json", pictures, captions);
            Assert.All(captions, caption => Assert.Contains($"<figcaption class=\"meta\">{System.Net.WebUtility.HtmlEncode(caption.Value)} ({caption.Key})</figcaption>", html, StringComparison.Ordinal));
        }

        Assert.Contains("partition coefficients", PlotSet.Captions(cases.Demo)[PlotSet.ProfileFileName], StringComparison.Ordinal);
        Assert.Contains("lag time", PlotSet.Captions(cases.Permeation)[PlotSet.PermeationFileName], StringComparison.Ordinal);
    }

    [GeneratedRegex("10[\u207B\u2070\u00B9\u00B2\u00B3\u2074-\u2079]")]
    private static partial Regex PowerOfTen();

    private IEnumerable<(PlotModel Model, PlotOptions Options)> AllModels()
    {
        foreach (var result in new[] { cases.Demo, cases.Permeation, ThinLayers.Value })
        {
            foreach (var options in Sizes)
            {
                yield return (ProfilePlot.Create(result, options), options);
                yield return (TransferPlot.Create(result, options), options);
                yield return (EquilibriumPlot.Create(result, options), options);
            }
        }
    }

    // The labels an axis writes on the ticks it draws.
    private static List<string> TickLabels(Axis axis)
    {
        axis.GetTickValues(out var values, out _, out _);
        var slack = (axis.ActualMaximum - axis.ActualMinimum) * 1e-9;
        return values
            .Where(value => value >= axis.ActualMinimum - slack && value <= axis.ActualMaximum + slack)
            .Select(axis.FormatValue)
            .Where(label => label.Length > 0)
            .ToList();
    }

    // A bare frame with a linear y axis from 0 to the maximum, as every plot builds its axes.
    private static PlotModel PlotFrameModel(double maximum, string subtitle = "subtitle")
    {
        var model = PlotFrame.Create("frame", [subtitle], new PlotOptions());
        model.Axes.Add(PlotFrame.Linear(AxisPosition.Bottom, "x (-)"));
        var y = PlotFrame.Linear(AxisPosition.Left, "y (-)");
        (y.Minimum, y.Maximum) = (0, maximum);
        model.Axes.Add(y);
        var line = new LineSeries();
        line.Points.AddRange([new DataPoint(0, 0), new DataPoint(1, maximum)]);
        model.Series.Add(line);
        return model;
    }

    // The screen box of a label as drawn: its text's size plus padding, turned with the text, about its anchor.
    private static OxyRect ScreenBox(LayoutPass pass, TextAnnotation name, Axis xAxis, Axis yAxis)
    {
        var size = Labels.MultilineBoxSize(pass, name.Text ?? string.Empty);
        var (width, height) = name.TextRotation == 0 ? (size.Width, size.Height) : (size.Height, size.Width);
        var (x, y) = (xAxis.Transform(name.TextPosition.X), yAxis.Transform(name.TextPosition.Y));
        return new OxyRect(x - width / 2, y - height / 2, width, height);
    }

    // Invented: a film, a thin skin barrier, a primer far too thin to name and a thick tissue, between a donor
    // compartment and a sink bath whose names are wider than their strips.
    private static SimulationCase ThinLayerCase() => new()
    {
        Title = "Thin layers with long names",
        Stack = new LayerStack(
        [
            new Layer("protective outer film", 60e-6, 1e-13, 1, 0),
            new Layer("primer", 0.05e-6, 1e-13, 1, 0),
            new Layer("stratum corneum", 15e-6, 1e-14, 2, 0),
            new Layer("viable epidermis", 300e-6, 1e-12, 0.5, 0),
        ]),
        Left = new CompartmentFace("aqueous donor phase", 1e-6, 1e-4, 1, 5, null),
        Right = new BathFace("dermal sink", 0, 1, null),
        DurationSeconds = 86400,
        ReportTimesSeconds = [3600, 6 * 3600, 86400],
        Display = new DisplayUnits
        {
            Time = UnitTable.Get("h"),
            Depth = UnitTable.Get("um"),
            Concentration = UnitTable.Get("mg/mL"),
            MassPerArea = UnitTable.Get("ug/cm2"),
        },
    };
}
