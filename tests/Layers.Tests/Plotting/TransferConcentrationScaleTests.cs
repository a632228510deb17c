using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Plotting;
using Layers.Tests.TestSupport;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Tests.Plotting;

/// <summary>
/// The concentration transfer.png shows for a receiving compartment is the compartment's own: checked against the
/// concentration the tool reports in the time series (whose sampling and removal are checked against hand
/// calculations and Crank's Daynes-Barrer series in the Pharma tests). Once samples or removal take drug out, the
/// amount received is no longer V/A times the concentration, so no scale on the amount axis can read it.
/// </summary>
public sealed class TransferConcentrationScaleTests
{
    private const double Thickness = 20e-6;
    private const double Diffusivity = 3e-13;
    private const double Area = 1e-4;
    private const double ReceptorVolume = 1e-6;

    private static double LagTime => Thickness * Thickness / (6 * Diffusivity);

    [Theory]
    [InlineData("plain")]
    [InlineData("sampled")]
    [InlineData("removal")]
    public void The_receptor_concentration_read_on_the_plot_at_the_end_is_the_one_the_receptor_holds(string kind)
    {
        var result = Simulator.Run(Cell(kind));

        var model = TransferPlot.Create(result, new PlotOptions());

        var held = result.TimeSeries[^1].Right!.ConcentrationKgPerCubicMeter;
        var unit = DisplayText.ConcentrationUnit(result.Case.Display);
        Tolerance.Relative(unit.FromSi(held), ShownAtTheEnd(model), 1e-9, $"{kind}: receptor concentration on transfer.png");
    }

    [Fact]
    public void A_sampled_receptor_holds_less_than_its_received_amount_over_V_per_A()
    {
        // The premise of the test above: with ten samples of a tenth of the receptor each, what it holds is well
        // below what it received divided by V/A (common practice, no source: the reason for the sampling correction).
        var result = Simulator.Run(Cell("sampled"));

        var end = result.TimeSeries[^1].Right!;
        Assert.True(end.ConcentrationKgPerCubicMeter < 0.8 * end.TransferredIntoMediumPerArea / (ReceptorVolume / Area));
    }

    /// <summary>The receptor concentration the plot shows at the last time, in the plot's unit.</summary>
    private static double ShownAtTheEnd(PlotModel model)
    {
        var concentration = model.Axes.Single(axis => axis.Key == "concentration");
        if (concentration.Position == AxisPosition.Right)
        {
            // A second scale: read the amount curve's last point against it.
            var mass = model.Axes.Single(axis => axis.Key == "mass");
            var last = model.Series.OfType<LineSeries>().Single(series => series.Title.StartsWith("into receptor", StringComparison.Ordinal)).Points[^1].Y;
            var share = (last - mass.Minimum) / (mass.Maximum - mass.Minimum);
            return concentration.Minimum + (share * (concentration.Maximum - concentration.Minimum));
        }

        return model.Series.OfType<LineSeries>().Single(series => series.YAxisKey == "concentration").Points[^1].Y;
    }

    private static SimulationCase Cell(string kind)
    {
        var receptor = new CompartmentFace("receptor", ReceptorVolume, Area, 1, 0, null)
        {
            Sampling = kind == "sampled" ? new ReceptorSampling(0.1 * ReceptorVolume, [.. Enumerable.Range(1, 10).Select(i => i * LagTime)]) : null,
            RemovalRatePerSecond = kind == "removal" ? Math.Log(2) / (2 * LagTime) : 0,
        };
        return Cases.Make(Cases.Bath(5), receptor, 10 * LagTime, layers: Cases.Layer("membrane", Thickness, Diffusivity, 4));
    }
}
