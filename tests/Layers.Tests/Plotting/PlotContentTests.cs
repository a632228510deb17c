using Layers.Core.Domain;
using Layers.Plotting;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Tests.Plotting;

/// <summary>
/// What the plot models contain, checked on the models rather than on pixels (common practice, no source): one
/// line per layer and time so that no line crosses a partition jump, one legend entry per time, threshold markers
/// only inside the plotted range, the permeation asymptote through the lag time.
/// </summary>
public sealed class PlotContentTests(PlotCases cases) : IClassFixture<PlotCases>
{
    private static readonly PlotOptions Options = new();

    [Fact]
    public void Profile_draws_one_line_per_layer_and_medium_at_each_time_and_lists_each_time_once()
    {
        var result = cases.Demo;
        var model = ProfilePlot.Create(result, Options);

        var lines = model.Series.OfType<LineSeries>().ToList();
        // The demo starts at t = 0 but reports from 2 h on, so the initial state is drawn too; the right face
        // touches the simulant, which gets a strip of its own.
        var times = result.Reports.Count + 1;
        var pieces = result.Case.Stack.Count + 1;
        Assert.Equal(times * pieces, lines.Count);
        Assert.Equal(times, lines.Count(line => line.RenderInLegend));
        Assert.Equal(times, lines.Where(line => line.RenderInLegend).Select(line => line.Title).Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void No_profile_line_crosses_an_interface()
    {
        var result = cases.Demo;
        var model = ProfilePlot.Create(result, Options);
        var interfaces = model.Annotations.OfType<LineAnnotation>().Select(line => line.X).ToList();

        Assert.Equal(result.Case.Stack.Count, interfaces.Count);
        foreach (var line in model.Series.OfType<LineSeries>())
        {
            var (from, to) = (line.Points.Min(point => point.X), line.Points.Max(point => point.X));
            Assert.DoesNotContain(interfaces, x => x > from + 1e-9 && x < to - 1e-9);
        }
    }

    [Fact]
    public void Profile_depth_is_in_micrometres_for_a_film_and_concentration_in_the_case_unit()
    {
        var model = ProfilePlot.Create(cases.Demo, Options);

        Assert.Equal("Depth from the left face (\u00B5m)", model.Axes.Single(axis => axis.Position == AxisPosition.Bottom).Title);
        // The demo's layers are written in mg/kg, each with its density: the axis reads as they were written.
        Assert.Equal("Concentration (mg/kg)", model.Axes.Single(axis => axis.Position == AxisPosition.Left).Title);
    }

    [Fact]
    public void A_log_concentration_axis_keeps_every_plotted_value_positive()
    {
        var model = ProfilePlot.Create(cases.Permeation, Options with { LogConcentrationAxis = true });

        Assert.IsType<LogarithmicAxis>(model.Axes.Single(axis => axis.Position == AxisPosition.Left));
        Assert.All(model.Series.OfType<LineSeries>().SelectMany(line => line.Points), point => Assert.True(point.Y > 0));
    }

    [Fact]
    public void Equilibrium_marks_every_threshold_reached_within_the_duration()
    {
        var result = cases.Demo;
        var model = EquilibriumPlot.Create(result, Options);

        var within = new[] { result.FinalState.System, result.FinalState.RightCompartment! }
            .SelectMany(times => times.AsList())
            .Count(time => time is { } t && t <= result.Case.DurationSeconds);
        Assert.Equal(within, model.Series.OfType<ScatterSeries>().Sum(markers => markers.Points.Count));
        Assert.Equal(within, model.Annotations.OfType<TextAnnotation>().Count());
    }

    [Fact]
    public void Permeation_asymptote_starts_on_the_time_axis_at_the_lag_time_with_the_steady_flux_as_slope()
    {
        var result = cases.Permeation;
        var model = EquilibriumPlot.Create(result, Options);
        var permeation = result.Permeation!;

        var asymptote = model.Series.OfType<LineSeries>().Single(line => line.LineStyle == LineStyle.Dash);
        var hours = permeation.LagTimeSeconds!.Value / 3600;
        Assert.Equal(hours, asymptote.Points[0].X, 9);
        Assert.Equal(0, asymptote.Points[0].Y, 12);
        // ug/cm2 per hour: kg/m2/s * 1e9 ug/kg / 1e4 cm2/m2 * 3600 s/h.
        var slope = (asymptote.Points[1].Y - asymptote.Points[0].Y) / (asymptote.Points[1].X - asymptote.Points[0].X);
        Assert.Equal(permeation.SteadyFluxKgPerSquareMeterSecond * 1e9 / 1e4 * 3600, slope, 9);
        Assert.Contains(model.Annotations.OfType<PointAnnotation>(), point => Math.Abs(point.X - hours) < 1e-9 && point.Y == 0);
    }

    [Fact]
    public void Transfer_shows_the_donor_as_what_it_gave_and_the_receiver_as_what_it_received()
    {
        var model = TransferPlot.Create(cases.Permeation, Options);

        var titles = model.Series.OfType<LineSeries>().Select(line => line.Title).ToList();
        Assert.Equal(["out of donor (bath)", "into receptor (bath)"], titles);
        Assert.All(model.Series.OfType<LineSeries>().SelectMany(line => line.Points), point => Assert.True(point.Y >= 0));
    }

    [Fact]
    public void One_receiving_compartment_gets_a_concentration_scale_matching_the_amount_scale()
    {
        var result = cases.Demo;
        var model = TransferPlot.Create(result, Options);

        var amount = model.Axes.Single(axis => axis.Position == AxisPosition.Left);
        var concentration = model.Axes.Single(axis => axis.Position == AxisPosition.Right);
        var compartment = (CompartmentFace)result.Case.Right;
        // The food has a density, so the scale reads mg/kg like the console: mg/dm2 -> kg/m2 is 1e-4, kg/kg -> mg/kg is 1e6.
        var expected = amount.Maximum * 1e-4 / compartment.VolumePerAreaMeters / compartment.DensityKgPerCubicMeter!.Value * 1e6;
        Assert.Equal(expected, concentration.Maximum, 9);
        Assert.Contains("mg/kg", concentration.Title, StringComparison.Ordinal);
        Assert.Equal(0, concentration.Minimum, 12);
    }

    [Fact]
    public void A_limit_is_drawn_as_a_dashed_horizontal_line_with_its_label()
    {
        var model = TransferPlot.Create(cases.Demo, Options with { LimitMassPerArea = 3e-6, LimitLabel = "limit" });

        var line = model.Annotations.OfType<LineAnnotation>().Single();
        Assert.Equal(LineAnnotationType.Horizontal, line.Type);
        Assert.Equal(LineStyle.Dash, line.LineStyle);
        Assert.Equal(0.03, line.Y, 12);
        Assert.Contains(model.Annotations.OfType<TextAnnotation>(), text => text.Text == "limit 0.03\u00A0mg/dm\u00B2");
    }

    [Fact]
    public void Every_plot_has_the_case_title_and_titled_axes()
    {
        foreach (var result in new[] { cases.Demo, cases.Permeation })
        {
            foreach (var model in new[] { ProfilePlot.Create(result, Options), TransferPlot.Create(result, Options), EquilibriumPlot.Create(result, Options) })
            {
                Assert.Equal(result.Case.Title, model.Title.Replace('\n', ' '));
                Assert.All(model.Axes, axis => Assert.Matches(@"\(.+\)", axis.Title));
            }
        }
    }
}
