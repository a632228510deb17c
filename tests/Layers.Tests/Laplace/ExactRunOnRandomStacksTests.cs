using Layers.Core.Domain;
using Layers.Core.Simulation;

namespace Layers.Tests.Laplace;

/// <summary>
/// A whole run of the exact method on untuned random stacks (2 to 50 layers, K and D over decades, the seeds of the
/// finite-volume promise tests) against the finite volumes solved independently with their error control: every
/// figure both give reliably (the times to 50/90/99 % of the final state among them where the finite volumes resolve
/// them) agrees within the accuracy and both estimates, and the exact run's own estimate says it meets the accuracy.
/// </summary>
public sealed class ExactRunOnRandomStacksTests
{
    [Theory]
    [InlineData(17)]
    [InlineData(20)]
    [InlineData(22)]
    [InlineData(26)]
    public void The_exact_run_agrees_with_the_finite_volumes_on_every_figure_both_give(int seed)
    {
        var simulation = FiniteVolumeAgreementTests.RandomCase(new Random(seed), NumericsSettings.Default with { Method = SolutionMethod.Laplace });

        var result = Simulator.Run(simulation);

        Assert.True(result.Completed, result.FailureReason);
        Assert.Equal(SolutionMethod.Laplace, result.Method);
        Assert.True(result.NumericalError!.MeetsAccuracy, $"seed {seed}: worst estimate {result.NumericalError.WorstRelativeError:G3}");
        var check = result.CrossCheck!;
        Assert.Null(check.NotApplicable);
        Assert.True(check.Figures.Count > 10, $"seed {seed}: {check.Figures.Count} figures compared");
        Assert.True(check.Disagreements.Count == 0, $"seed {seed}: " + string.Join("; ", check.Disagreements.Select(figure =>
            $"{figure.Figure.Figure.Path} {figure.Figure.Figure.Value:G8} vs {figure.CheckValue:G8} (estimate {figure.CheckEstimatedError:G3})")));
    }
}
