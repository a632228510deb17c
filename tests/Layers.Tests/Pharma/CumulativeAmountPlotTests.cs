using Layers.Core.Cases;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Plotting;
using Layers.Tests.TestSupport;
using OxyPlot.Series;

namespace Layers.Tests.Pharma;

/// <summary>
/// The model-and-measurement plot, checked on the model (common practice, no source): the simulated curve, the
/// corrected samples and the measured points on one picture, each steady line through its own lag time on the
/// time axis.
/// </summary>
public sealed class CumulativeAmountPlotTests
{
    [Fact]
    public void Demo_shows_model_samples_measurements_and_both_steady_lines_through_their_lag_times()
    {
        var read = CaseDocument.ReadFile(RepoRoot.File("cases", "skin-diffusion-cell-sampling.json"));
        var result = Simulator.Run(read.Case!);

        var model = CumulativeAmountPlot.Create(result, new PlotOptions());

        var scatter = model.Series.OfType<ScatterSeries>().ToList();
        Assert.Equal(2, scatter.Count);
        Assert.Equal(read.Case!.PermeationTest!.Measured!.TimesSeconds.Count, scatter[1].Points.Count);
        var steadyLines = model.Series.OfType<LineSeries>().Where(line => line.Title.Contains("steady line", StringComparison.Ordinal)).ToList();
        Assert.Equal(2, steadyLines.Count);
        var lags = new[] { result.DiffusionCell!.Simulated!.LagTimeSeconds, result.DiffusionCell.Measured!.LagTimeSeconds };
        for (var i = 0; i < 2; i++)
        {
            Assert.Equal(0, steadyLines[i].Points[0].Y, 9);
            Tolerance.Relative(lags[i] / 3600, steadyLines[i].Points[0].X, 1e-9, "line starts at its lag time (h)");
        }
    }

    [Fact]
    public void Cases_without_permeation_metrics_get_no_cumulative_plot()
    {
        var read = CaseDocument.ReadFile(RepoRoot.File("cases", "laminate-fatty-food.json"));

        Assert.False(CumulativeAmountPlot.Applies(Simulator.Run(read.Case!)));
    }
}
