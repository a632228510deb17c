using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// A plane sheet against a well-stirred solution of limited volume with a partition coefficient. Reference: Crank,
/// The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, eq. 4.37 (series over the roots of tan q = -alpha q) and
/// eq. 4.38 (short times), equation numbers from memory, as summed by Analytics.PlaneSheetIntoLimitedVolume.
/// </summary>
public sealed class LimitedVolumeLaplaceTests
{
    private const double Thickness = 50e-6;
    private const double Diffusivity = 4e-14;
    private const double InitialConcentration = 920;

    [Theory]
    [InlineData(0.1, 1000)]
    [InlineData(1, 1)]
    [InlineData(10, 0.1)]
    [InlineData(0.01, 1e7)]
    public void Amount_in_solution_matches_Crank_to_1e_8(double alpha, double kSheetOverSolution)
    {
        var volumePerArea = alpha * kSheetOverSolution * Thickness;
        var solution = LaplaceSolution.For(Sheet(volumePerArea, kSheetOverSolution));
        var final = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(Diffusivity, Thickness, InitialConcentration, volumePerArea, kSheetOverSolution, 1e9 * Thickness * Thickness / Diffusivity);

        foreach (var tau in new[] { 1e-4, 0.005, 0.02, 0.1, 0.3, 1, 3 })
        {
            var time = tau * Thickness * Thickness / Diffusivity;
            var expected = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(Diffusivity, Thickness, InitialConcentration, volumePerArea, kSheetOverSolution, time);
            var face = solution.At(time).Right!;

            Tolerance.Absolute(expected / final, face.MediumMassPerArea!.Value / final, 1e-8, $"M_t/M_inf, alpha {alpha}, tau {tau} (Crank eq. 4.37)");
            Tolerance.Absolute(expected / final, face.TransferredIntoMediumPerArea / final, 1e-8, $"transferred, alpha {alpha}, tau {tau}");
        }

        Tolerance.Relative(final, solution.FinalMediumMassPerArea(Side.Right), 1e-12, "M_inf = C0 L alpha / (1 + alpha)");
    }

    [Theory]
    [InlineData(0.1)]
    [InlineData(1)]
    [InlineData(10)]
    public void Times_to_half_ninety_and_ninety_nine_percent_match_the_series(double alpha)
    {
        var volumePerArea = alpha * Thickness;
        var solution = LaplaceSolution.For(Sheet(volumePerArea, 1));
        var horizon = 10 * Thickness * Thickness / Diffusivity;

        foreach (var level in new[] { 0.5, 0.9, 0.99 })
        {
            // Crank eq. 4.37 solved for M_t/M_inf = level by bisection.
            var expected = SolveForFraction(alpha, level);
            var found = solution.TimeToFractionOfFinal(Side.Right, level, horizon);
            Assert.NotNull(found);
            Tolerance.Relative(expected, found.Value, 1e-7, $"time to {level:P0} of equilibrium, alpha {alpha}");
        }
    }

    [Fact]
    public void Time_to_a_concentration_limit_in_the_solution_matches_the_series()
    {
        // With K = 1 and the solution as the reference medium, c_solution = M_t / (V/A): reaching 70 % of its final
        // concentration is reaching M_t/M_inf = 0.7 (Crank eq. 4.37 solved by bisection).
        const double alpha = 2;
        var volumePerArea = alpha * Thickness;
        var solution = LaplaceSolution.For(Sheet(volumePerArea, 1));
        var finalConcentration = InitialConcentration * Thickness * alpha / (1 + alpha) / volumePerArea;

        var found = solution.TimeToMediumConcentration(Side.Right, 0.7 * finalConcentration, 10 * Thickness * Thickness / Diffusivity);

        Assert.NotNull(found);
        Tolerance.Relative(SolveForFraction(alpha, 0.7), found.Value, 1e-7, "time to 70 % of the final concentration");
        Assert.Null(solution.TimeToMediumConcentration(Side.Right, 1.01 * finalConcentration, 10 * Thickness * Thickness / Diffusivity));
    }

    private static double SolveForFraction(double alpha, double level)
        => LimitedVolumeTimes.ToFraction(Diffusivity, Thickness, alpha, level);

    private static SimulationCase Sheet(double volumePerArea, double kSheet)
        => Cases.Make(Cases.Closed, Cases.Compartment(volumePerArea), 1, layers: Cases.Layer("sheet", Thickness, Diffusivity, kSheet, InitialConcentration));
}
