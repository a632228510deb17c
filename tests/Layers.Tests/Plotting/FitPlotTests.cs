using System.Globalization;
using Layers.Plotting;
using Layers.Tests.Fitting;
using Layers.Tests.TestSupport;
using OxyPlot.Series;

namespace Layers.Tests.Plotting;

/// <summary>What fit.png shows, checked on its plot model: the bars of the measurements and how an estimate the data do not determine is marked.</summary>
public sealed class FitPlotTests
{
    [Fact]
    public void Each_measurement_bar_spans_one_standard_deviation_on_each_side_and_the_legend_says_so()
    {
        using var folder = new TempFolder();
        var csv = FitData.MembraneCsv(FitData.Range(0.5, 8, 0.5), absoluteUgPerCm2: 0.02, relative: 0.04, seed: 5, withDeviation: true);
        var fit = FitData.Fit(folder, FitData.MembraneCase("8 h", "3e-9 cm2/s", 1.5), csv, FitData.DiffusivityPath, FitData.PartitionPath);

        var model = FitPlot.Create(fit, new PlotOptions());

        // The standard deviations as the data file states them, in its unit (ug/cm2, the unit of the value axis).
        var deviations = csv.Split('\n', StringSplitOptions.RemoveEmptyEntries).Skip(1)
            .Select(line => double.Parse(line.Split(',')[2], CultureInfo.InvariantCulture))
            .ToList();
        // OxyPlot 2.2 draws a ScatterErrorPoint's bar from Y - ErrorY/2 to Y + ErrorY/2 (ScatterErrorSeries.Render,
        // oxyplot/oxyplot, Source/OxyPlot/Series/ScatterErrorSeries.cs): a bar of +-1 sd needs ErrorY = 2 sd.
        foreach (var series in model.Series.OfType<ScatterErrorSeries>())
        {
            Assert.Equal(deviations.Count, series.Points.Count);
            for (var i = 0; i < deviations.Count; i++)
            {
                var point = series.Points[i];
                Assert.Equal(2 * deviations[i], point.ErrorY, deviations[i] * 1e-9);
            }
        }

        var measured = model.Series.OfType<ScatterErrorSeries>().Single(series => series.Title is not null);
        Assert.Contains("\u00B11 sd", measured.Title, StringComparison.Ordinal);
    }

    [Fact]
    public void Estimates_the_data_do_not_determine_are_marked_not_identifiable_on_the_plot_as_on_the_console()
    {
        using var folder = new TempFolder();
        // Steady-state data only fix the product D K (Crank, The Mathematics of Diffusion, 2nd ed., ch. 4,
        // eqs. 4.24b-c, from memory), as MembraneFitTests shows on the fit itself.
        var csv = FitData.MembraneCsv(FitData.Range(24, 48, 2), absoluteUgPerCm2: 0, relative: 0.01, seed: 3, withDeviation: true);
        var fit = FitData.Fit(folder, FitData.MembraneCase("48 h", "3e-8 cm2/s", 0.2), csv, FitData.DiffusivityPath, FitData.PartitionPath);
        Assert.All(fit.Estimates, estimate => Assert.False(estimate.Identifiable));

        var subtitle = FitPlot.Create(fit, new PlotOptions()).Subtitle.Replace('\n', ' ');

        foreach (var estimate in fit.Estimates)
        {
            var shown = $"{estimate.Parameter.Label} = {estimate.Parameter.Written(estimate.Value)}";
            var at = subtitle.IndexOf(shown, StringComparison.Ordinal);
            Assert.True(at >= 0, $"'{shown}' is not in '{subtitle}'");
            Assert.StartsWith(" (not identifiable)", subtitle[(at + shown.Length)..], StringComparison.Ordinal);
        }

        // What the data do determine, as the console gives it.
        var product = fit.Findings.Single(finding => finding.NotIdentifiable).Combination!;
        Assert.Contains($"{product.Text} = ", subtitle, StringComparison.Ordinal);
    }

    [Fact]
    public void Identifiable_estimates_are_shown_without_a_mark()
    {
        using var folder = new TempFolder();
        var csv = FitData.MembraneCsv(FitData.Range(0.25, 8, 0.25), absoluteUgPerCm2: 0.05, relative: 0, seed: 11, withDeviation: false);
        var fit = FitData.Fit(folder, FitData.MembraneCase("8 h", "3e-8 cm2/s", 0.2), csv, FitData.DiffusivityPath, FitData.PartitionPath);
        Assert.True(fit.IsTrustworthy);

        var subtitle = FitPlot.Create(fit, new PlotOptions()).Subtitle.Replace('\n', ' ');

        Assert.DoesNotContain("identifiable", subtitle, StringComparison.Ordinal);
    }
}
