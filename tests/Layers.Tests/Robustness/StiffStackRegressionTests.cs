using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Robustness;

/// <summary>
/// Stacks whose steps grow far beyond the diffusion time of their fastest cells (a slow thick layer beside a fast thin
/// one; durations of up to 1e30 s): the mass balance closes to round-off and the system approaches its closed-system
/// equilibrium monotonically (common practice, no source: a conservative finite-volume scheme conserves mass to
/// round-off; the capacity-weighted L1 distance of a diffusion problem from its equilibrium never grows, the L1
/// contraction of the heat equation, from memory).
/// </summary>
public sealed class StiffStackRegressionTests
{
    private static readonly double[] ReportSeconds = [1e5, 1e6, 1e7, 1e8];

    [Theory]
    [InlineData(1e-7, 1e-5, 1.0)]
    [InlineData(2.5e-7, 1e-6, 1e12)]
    public void A_thin_fast_layer_beside_a_loaded_slow_one_keeps_its_mass_and_moves_toward_equilibrium(double thinMeters, double thinDiffusivity, double thinPartition)
    {
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            1e8,
            reports: ReportSeconds,
            layers: [Cases.Layer("slow", 2e-3, 1e-11, 1, 40), Cases.Layer("fast", thinMeters, thinDiffusivity, thinPartition)]);

        var result = Simulator.Run(simulation);

        Assert.True(result.Completed, result.FailureReason);
        Assert.True(result.WorstMassBalanceError <= 1e-9, $"mass balance {result.WorstMassBalanceError:G3}");
        Assert.All(result.Reports, report => Assert.InRange(report.Sample.FractionOfFinalState, -1e-9, 1 + 1e-9));
        Assert.All(result.Reports.Zip(result.Reports.Skip(1)), pair =>
            Assert.True(pair.Second.Sample.FractionOfFinalState >= pair.First.Sample.FractionOfFinalState - 1e-9, "moved away from equilibrium"));
    }

    [Theory]
    [InlineData(1e11)]
    [InlineData(1e16)]
    [InlineData(1e20)]
    [InlineData(1e30)]
    public void A_two_layer_stack_and_its_compartment_keep_their_mass_over_very_long_durations(double durationSeconds)
    {
        // Hand calculation of the closed-system equilibrium (mass over total storage, all K = 1): 100 um loaded at
        // 1e-3 kg/m3 holds 1e-7 kg/m2; storage 100 um + 100 um + 10 mL / 10 cm2 = 0.0102 m; so c = 1e-7 / 0.0102 kg/m3.
        const double equilibrium = 1e-7 / 0.0102;
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Compartment(0.01),
            durationSeconds,
            numerics: NumericsSettings.Default with { ErrorControl = ErrorControl.None, Method = SolutionMethod.FiniteVolume },
            layers: [Cases.Layer("a", 100e-6, 1e-13, 1, 1e-3), Cases.Layer("b", 100e-6, 1e-12)]);

        var result = Simulator.Run(simulation);

        // One solve at the default mesh (no refinement, which would multiply the steps): a few hundred steps, each exact to a few units of round-off: 1e-12 is far above that and far below a loss.
        Assert.True(result.Completed, result.FailureReason);
        Assert.True(result.WorstMassBalanceError <= 1e-12, $"mass balance {result.WorstMassBalanceError:G3}");
        Tolerance.Relative(equilibrium, result.Reports[^1].Sample.Right!.ConcentrationKgPerCubicMeter, 1e-6, "compartment at the end");
    }

    [Fact]
    public void A_layer_that_starts_at_its_equilibrium_reports_its_progress_toward_it_as_not_applicable()
    {
        // One closed layer loaded evenly is at its closed-system equilibrium from the start: the fraction of the way
        // there is 0/0 (Crank, The Mathematics of Diffusion, 2nd ed., ch. 4: M_t/M_inf needs M_inf differing from M_0).
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            10 * 86400,
            reports: [3600, 86400, 10 * 86400],
            layers: Cases.Layer("film", 60e-6, 1e-13, 0.3, 0.003));

        var result = Simulator.Run(simulation);

        Assert.True(result.Completed, result.FailureReason);
        Assert.All(result.Reports, report => Assert.True(double.IsNaN(report.Sample.FractionOfFinalState), $"got {report.Sample.FractionOfFinalState:G3}"));
    }
}
