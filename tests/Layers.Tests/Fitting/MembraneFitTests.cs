using Layers.Core.Fitting;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Fitting;

public sealed class MembraneFitTests
{
    [Fact]
    public void Recovers_D_and_K_of_a_membrane_from_noisy_cumulative_amounts_within_the_reported_intervals()
    {
        using var folder = new TempFolder();
        var csv = FitData.MembraneCsv(FitData.Range(0.25, 8, 0.25), absoluteUgPerCm2: 0.05, relative: 0, seed: 11, withDeviation: false);

        // Start a factor 3 above the true D and 2.5 below the true K.
        var fit = FitData.Fit(folder, FitData.MembraneCase("8 h", "3e-8 cm2/s", 0.2), csv, FitData.DiffusivityPath, FitData.PartitionPath);

        // Truth: the inputs of Crank's eq. 4.24a that made the data (FitData); the intervals must hold them and
        // the estimates must lie near them.
        Assert.True(fit.IsTrustworthy, string.Join("; ", fit.Findings.Select(finding => finding.Message)));
        var (d, k) = (fit.Estimates[0], fit.Estimates[1]);
        Assert.InRange(FitData.DiffusivityCm2PerS, d.Lower!.Value, d.Upper!.Value);
        Assert.InRange(FitData.PartitionCoefficient, k.Lower!.Value, k.Upper!.Value);
        Tolerance.Relative(FitData.DiffusivityCm2PerS, d.Value, 0.05, "D");
        Tolerance.Relative(FitData.PartitionCoefficient, k.Value, 0.05, "K");
        Assert.Equal("cm2/s", d.Parameter.Unit);

        // Without standard deviations the residual standard error estimates the noise, 0.05 ug/cm2 = 5e-7 kg/m2;
        // its ratio to the truth follows sqrt(chi2(dof)/dof), inside [0.67, 1.34] for 30 degrees of freedom with
        // probability 0.99 (chi-square points 13.79 and 53.67; chi-square table, e.g. NIST/SEMATECH e-Handbook,
        // section 1.3.6.7.4).
        Assert.Equal(30, fit.DegreesOfFreedom);
        Assert.InRange(fit.ResidualScale / 5e-7, 0.67, 1.34);
    }

    [Fact]
    public void Weighs_each_measurement_by_its_standard_deviation()
    {
        using var folder = new TempFolder();

        // Noise of 4 % of the value plus 0.02 ug/cm2: the late points are far noisier than the early ones.
        var csv = FitData.MembraneCsv(FitData.Range(0.5, 8, 0.5), absoluteUgPerCm2: 0.02, relative: 0.04, seed: 5, withDeviation: true);

        var fit = FitData.Fit(folder, FitData.MembraneCase("8 h", "3e-9 cm2/s", 1.5), csv, FitData.DiffusivityPath, FitData.PartitionPath);

        Assert.True(fit.IsTrustworthy, string.Join("; ", fit.Findings.Select(finding => finding.Message)));
        Assert.InRange(FitData.DiffusivityCm2PerS, fit.Estimates[0].Lower!.Value, fit.Estimates[0].Upper!.Value);
        Assert.InRange(FitData.PartitionCoefficient, fit.Estimates[1].Lower!.Value, fit.Estimates[1].Upper!.Value);

        // With the true standard deviations as weights the weighted sum of squares is chi-square with 14 degrees
        // of freedom: its 0.5 % and 99.5 % points are 4.07 and 31.3 (chi-square table, NIST/SEMATECH
        // e-Handbook, section 1.3.6.7.4). Unweighted, the same sum in (kg/m2)^2 would be near 1e-12.
        Assert.InRange(fit.SumOfSquares, 4.07, 31.3);
        Assert.All(fit.Points, point => Assert.Equal(point.Residual / point.Deviation!.Value, point.WeightedResidual, 12));
    }

    [Fact]
    public void Says_that_D_and_K_are_not_separately_identifiable_from_steady_state_data_and_gives_their_product()
    {
        using var folder = new TempFolder();

        // From 24 h to 48 h the membrane (lag time L^2/(6D) = 0.46 h) is at steady state: Q = (D K c / L)(t - lag)
        // with lag / t below 2 %, so the data fix D K but hardly D alone (Crank, ch. 4, eqs. 4.24b-c, from memory).
        var csv = FitData.MembraneCsv(FitData.Range(24, 48, 2), absoluteUgPerCm2: 0, relative: 0.01, seed: 3, withDeviation: true);

        var fit = FitData.Fit(folder, FitData.MembraneCase("48 h", "3e-8 cm2/s", 0.2), csv, FitData.DiffusivityPath, FitData.PartitionPath);

        var finding = Assert.Single(fit.Findings);
        Assert.True(finding.NotIdentifiable);
        Assert.Equal([FitData.DiffusivityPath, FitData.PartitionPath], finding.Paths);
        Assert.All(fit.Estimates, estimate => Assert.False(estimate.Identifiable));
        Assert.All(fit.Estimates, estimate => Assert.Null(estimate.Lower));
        Assert.False(fit.IsTrustworthy);

        // What the data do determine is the product D K (steady flux D K c / L), in the unit of D.
        var product = finding.Combination!;
        Assert.Equal("membrane diffusion coefficient × membrane partition coefficient", product.Text);
        Assert.Equal("cm2/s", product.Unit);
        Assert.InRange(FitData.DiffusivityCm2PerS * FitData.PartitionCoefficient, product.Lower, product.Upper);
        Tolerance.Relative(FitData.DiffusivityCm2PerS * FitData.PartitionCoefficient, product.Value, 0.03, "D K");
    }
}
