using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// The independent check of a run against the exact method (docs/numerics.md, "The independent check"). The exact
/// method is held to Crank's series and the erfc solution in Laplace/*Tests; here: that it is applied, what it
/// compares, and that it flags only what neither the accuracy nor the estimate accounts for.
/// </summary>
public sealed class ExactCrossCheckTests
{
    [Theory]
    [InlineData("membrane")]
    [InlineData("two semi-infinite media")]
    public void A_run_the_exact_method_can_serve_is_compared_figure_by_figure_and_agrees(string name)
    {
        var result = Simulator.Run(ClosedFormFigures.Get(name).Case);
        var check = result.CrossCheck!;

        Assert.Null(check.NotApplicable);
        Assert.Empty(check.Disagreements);
        var keyFigures = result.NumericalError!.Figures.Select(figure => figure.Figure.Path).ToHashSet(StringComparer.Ordinal);
        Assert.All(check.Figures, figure => Assert.Contains(figure.Figure.Figure.Path, keyFigures));

        // Every figure above its floor at a report time is compared, bar the deep tails the contour cannot resolve.
        var atReportTimes = result.NumericalError.Figures.Count(figure => !figure.Figure.IsNegligible && figure.Figure.AtSeconds is not null);
        Assert.InRange(check.Figures.Count(figure => figure.Figure.Figure.AtSeconds is not null), atReportTimes / 2, atReportTimes);
    }

    [Fact]
    public void A_case_in_temperature_stages_says_why_the_exact_method_does_not_apply()
    {
        var read = CaseReader.ReadFile(RepoRoot.File("cases", "hot-fill-barrier-shelf-life.json"));
        Assert.True(read.IsValid, read.FormatErrors());
        var simulation = read.Case!;

        var check = Simulator.Run(simulation with { Numerics = simulation.Numerics with { ErrorControl = ErrorControl.EstimateOnly } }).CrossCheck!;

        Assert.Contains("stages", check.NotApplicable, StringComparison.Ordinal);
        Assert.Empty(check.Figures);
    }

    [Theory]
    [InlineData(1.0, 1.00005, 0.0, false)] // within the accuracy 1e-4
    [InlineData(1.0, 1.001, 0.0, true)] // 1e-3: beyond the accuracy, and the estimate says nothing
    [InlineData(1.0, 1.001, 0.002, false)] // beyond the accuracy, but within what the run's own estimate admits
    [InlineData(1.0, 1.003, 0.002, true)] // beyond both
    public void Only_a_difference_beyond_both_the_accuracy_and_the_estimate_is_a_disagreement(double exact, double reported, double estimate, bool disagrees)
    {
        var figure = new FigureError(new KeyFigure("$.x", FigureKind.Amount, reported, "x", null, 0), estimate);

        Assert.Equal(disagrees, new FigureComparison(figure, exact).Disagrees(1e-4));
    }
}
