using Layers.Core.Analytics;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// A plane sheet against a well-stirred solution of limited volume with a partition coefficient.
/// Reference: Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, eq. 4.37 (from memory), roots of tan q = -alpha q,
/// alpha = V_solution / (K V_sheet).
/// </summary>
public sealed class LimitedVolumeTests
{
    private const double Thickness = 50e-6;
    private const double Diffusivity = 4e-14;
    private const double InitialConcentration = 920;

    public static TheoryData<double, double, double> Cases() => new()
    {
        // alpha, partition coefficient sheet/solution, dimensionless time D t / L^2
        { 0.1, 1000, 0.01 },
        { 0.1, 1000, 0.3 },
        { 1, 1, 0.05 },
        { 1, 1, 0.5 },
        { 10, 1, 0.02 },
        { 10, 0.1, 0.4 },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Amount_in_solution_matches_Crank_limited_volume_series(double alpha, double kSheetOverSolution, double dimensionlessTime)
    {
        // K of the sheet relative to the solution (the reference medium): K_sheet = c_sheet / c_solution.
        var volumePerArea = alpha * kSheetOverSolution * Thickness;
        var time = dimensionlessTime * Thickness * Thickness / Diffusivity;
        var simulation = Cases_(volumePerArea, kSheetOverSolution, time);

        var result = Simulator.Run(simulation);

        var simulated = result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea;
        var expected = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            Diffusivity, Thickness, InitialConcentration, volumePerArea, kSheetOverSolution, time);
        Tolerance.Relative(expected, simulated, 1e-3, $"transferred mass, alpha {alpha} (Crank eq. 4.37)");
    }

    [Theory]
    [InlineData(0.1)]
    [InlineData(1)]
    [InlineData(10)]
    public void Times_to_half_and_ninety_percent_of_equilibrium_match_the_series(double alpha)
    {
        var volumePerArea = alpha * Thickness;
        var simulation = Cases_(volumePerArea, 1, 2 * Thickness * Thickness / Diffusivity) with { Numerics = TestSupport.Cases.FixedFineMesh };

        var result = Simulator.Run(simulation);

        var times = result.FinalState.RightCompartment!;
        foreach (var (level, simulated) in new[] { (0.5, times.Half!.Value), (0.9, times.NinetyPercent!.Value) })
        {
            // Crank eq. 4.37 solved for M_t/M_inf = level by bisection.
            var expected = SolveForFraction(alpha, level);
            Tolerance.Relative(expected, simulated, 2e-3, $"time to {level:P0} of equilibrium, alpha {alpha}");
        }
    }

    private static double SolveForFraction(double alpha, double level)
        => LimitedVolumeTimes.ToFraction(Diffusivity, Thickness, alpha, level);

    private static Layers.Core.Domain.SimulationCase Cases_(double volumePerArea, double kSheet, double time)
        => TestSupport.Cases.Make(
            TestSupport.Cases.Closed,
            TestSupport.Cases.Compartment(volumePerArea),
            time,
            layers: TestSupport.Cases.Layer("sheet", Thickness, Diffusivity, kSheet, InitialConcentration));
}
