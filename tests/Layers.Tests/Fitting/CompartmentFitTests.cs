using Layers.Tests.TestSupport;

namespace Layers.Tests.Fitting;

public sealed class CompartmentFitTests
{
    [Fact]
    public void Recovers_D_and_K_of_a_film_from_noisy_concentrations_in_a_limited_volume()
    {
        using var folder = new TempFolder();
        var csv = FitData.FilmCsv([1, 2, 4, 6, 8, 12, 18, 24, 36, 48, 60, 72], absoluteMgPerL: 0.5, relative: 0.02, seed: 21);

        // Start a factor 4 below the true D and 2 above the true K.
        var fit = FitData.Fit(folder, FitData.FilmCase("1.25e-9 cm2/s", 4), csv, FitData.DiffusivityPath, FitData.PartitionPath);

        // Truth: the inputs of Crank's eq. 4.37 that made the data (FitData). The level the solution tends to
        // fixes K (alpha = (V/A)/(K L)), the approach to it fixes D.
        Assert.True(fit.IsTrustworthy, string.Join("; ", fit.Findings.Select(finding => finding.Message)));
        var (d, k) = (fit.Estimates[0], fit.Estimates[1]);
        Assert.InRange(FitData.FilmDiffusivity * 1e4, d.Lower!.Value, d.Upper!.Value);
        Assert.InRange(FitData.FilmPartition, k.Lower!.Value, k.Upper!.Value);
        Tolerance.Relative(FitData.FilmDiffusivity * 1e4, d.Value, 0.1, "D");
        Tolerance.Relative(FitData.FilmPartition, k.Value, 0.05, "K");
    }
}
