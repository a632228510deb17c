using System.Globalization;
using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// A thickness sweep of a single membrane checked against the time-lag law (Crank, The Mathematics of Diffusion,
/// 2nd ed., section 4.3.3, from memory eqs. 4.24a-b): between a constant source and a sink, the steady flux is
/// D K c0 / L and the lag time L^2 / (6 D), so across thicknesses the flux goes as 1/L and the lag time as L^2.
/// </summary>
public sealed class SweepTimeLagTests
{
    [Fact]
    public void A_thickness_sweep_gives_fluxes_in_inverse_proportion_and_lag_times_in_proportion_to_the_square()
    {
        using var temp = new TempFolder();
        var sweep = temp.WriteFile("lag.json", BatchCases.ThicknessSweep("10 um", "20 um", "40 um"));

        var outcome = CliRun.Invoke("run", sweep, "--out", temp.Combine("out"), "--plot-width", "400", "--plot-height", "300");

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal(["10 um", "20 um", "40 um"], rows.Select(row => row["parameters"].Split(" = ")[1]));
        var flux = rows.Select(row => double.Parse(row["steadyFluxKgPerSquareMeterSecond"], CultureInfo.InvariantCulture)).ToList();
        var lag = rows.Select(row => double.Parse(row["lagTimeSeconds"], CultureInfo.InvariantCulture)).ToList();
        Assert.Equal(2.0, flux[0] / flux[1], 1e-6);
        Assert.Equal(4.0, flux[0] / flux[2], 1e-6);
        Assert.Equal(4.0, lag[1] / lag[0], 0.01 * 4);
        Assert.Equal(16.0, lag[2] / lag[0], 0.01 * 16);
        // And the absolute value: L^2 / (6 D) with L = 10 um, D = 1e-8 cm2/s = 1e-12 m2/s is 16.67 s.
        Assert.Equal(1e-10 / 6e-12, lag[0], 0.01 * 1e-10 / 6e-12);
        Assert.True(Layers.Tests.Plotting.PngImage.HasSignature(File.ReadAllBytes(temp.Combine("out", "lag.sweep.png"))));
        Assert.True(Directory.Exists(temp.Combine("out", "lag.02_thickness-20um")));
    }
}
