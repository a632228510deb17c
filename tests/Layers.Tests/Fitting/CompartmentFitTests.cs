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

    [Fact]
    public void Says_that_an_input_without_effect_on_the_measurements_cannot_be_estimated()
    {
        using var folder = new TempFolder();
        var csv = FitData.FilmCsv([2, 8, 24, 72], absoluteMgPerL: 0.5, relative: 0.02, seed: 8);

        // The solubility in the receiving medium only feeds the sink-condition check; the concentrations do not
        // depend on it, so its column of the Jacobian is zero (the definition of a rank-deficient Jacobian).
        var caseJson = CaseJson.With(FitData.FilmCase("5e-9 cm2/s", 2), ("$.right.solubility", "\"1 g/L\""));
        var fit = FitData.Fit(folder, caseJson, csv, FitData.DiffusivityPath, "$.right.solubility");

        var finding = Assert.Single(fit.Findings, finding => finding.NotIdentifiable);
        Assert.Equal(["$.right.solubility"], finding.Paths);
        Assert.Contains("has no effect on the measured values", finding.Message);
        Assert.False(fit.Estimates[1].Identifiable);
        Assert.Null(fit.Estimates[1].Upper);
        Assert.True(fit.Estimates[0].Identifiable);
        Assert.False(fit.IsTrustworthy);
    }
}
