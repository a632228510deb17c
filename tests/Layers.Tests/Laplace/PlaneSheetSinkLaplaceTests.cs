using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// Release from a plane sheet, closed at x = 0, into a perfect sink at x = L. Reference: Crank, The Mathematics of
/// Diffusion, 2nd ed. (1975), ch. 4: M_t/M_inf from eq. 4.18 (long times) and eq. 4.20 (short times), c(x, t) from
/// eq. 4.17 and eq. 4.19 (equation numbers from memory), as summed by Analytics.PlaneSheetIntoSink.
/// </summary>
public sealed class PlaneSheetSinkLaplaceTests
{
    private const double InitialConcentration = 800;

    [Theory]
    [InlineData(1e-3, 1e-10)]
    [InlineData(1.0, 1e-15)]
    [InlineData(1e-6, 1e-18)]
    public void Fraction_released_matches_Crank_to_1e_8(double thickness, double diffusivity)
    {
        var solution = LaplaceSolution.For(Sheet(thickness, diffusivity, Cases.Bath(0)));

        foreach (var tau in new[] { 1e-7, 1e-4, 0.01, 0.1, 0.5, 1, 2 })
        {
            var time = tau * thickness * thickness / diffusivity;
            var snapshot = solution.At(time);
            var initial = InitialConcentration * thickness;
            var expected = PlaneSheetIntoSink.FractionReleased(diffusivity, thickness, time);

            Tolerance.Absolute(expected, 1 - (snapshot.LayerMassPerArea[0] / initial), 1e-8, $"M_t/M_inf from the sheet at tau {tau} (Crank eq. 4.18/4.20)");
            Tolerance.Absolute(expected, snapshot.Right!.TransferredIntoMediumPerArea / initial, 1e-8, $"M_t/M_inf received by the sink at tau {tau}");
        }
    }

    [Theory]
    [InlineData(1e-3, 1e-10)]
    [InlineData(1e-6, 1e-18)]
    public void Fraction_released_at_all_times_at_once_matches_Crank_to_1e_8(double thickness, double diffusivity)
    {
        // The same times through AtTimes: eight decades, so several windows of hyperbolic contours, each with times at
        // its ends and inside.
        var solution = LaplaceSolution.For(Sheet(thickness, diffusivity, Cases.Bath(0)));
        double[] taus = [1e-7, 3e-7, 1e-6, 1e-4, 0.01, 0.03, 0.1, 0.5, 1, 2, 5];
        var snapshots = solution.AtTimes([.. taus.Select(tau => tau * thickness * thickness / diffusivity)]);
        var initial = InitialConcentration * thickness;
        for (var i = 0; i < taus.Length; i++)
        {
            var expected = PlaneSheetIntoSink.FractionReleased(diffusivity, thickness, snapshots[i].TimeSeconds);
            Tolerance.Absolute(expected, 1 - (snapshots[i].LayerMassPerArea[0] / initial), 1e-8, $"M_t/M_inf from the sheet at tau {taus[i]} (Crank eq. 4.18/4.20)");
            Tolerance.Absolute(expected, snapshots[i].Right!.TransferredIntoMediumPerArea / initial, 1e-8, $"M_t/M_inf received by the sink at tau {taus[i]}");
            Tolerance.Absolute(1 - expected, snapshots[i].LayerMassPerArea[0] / initial, 1e-8, $"the sheet's remaining fraction at tau {taus[i]}");
        }
    }

    [Fact]
    public void Profile_matches_Crank_to_1e_8()
    {
        const double thickness = 2e-4;
        const double diffusivity = 3e-13;
        var solution = LaplaceSolution.For(Sheet(thickness, diffusivity, Cases.Bath(0)));
        double[] depths = [0, 0.25 * thickness, 0.5 * thickness, 0.9 * thickness, thickness];

        foreach (var tau in new[] { 0.003, 0.05, 0.4 })
        {
            var time = tau * thickness * thickness / diffusivity;
            var profile = solution.ConcentrationsAt(depths, time);
            for (var i = 0; i < depths.Length; i++)
            {
                var expected = PlaneSheetIntoSink.Concentration(diffusivity, thickness, InitialConcentration, depths[i], time);
                Tolerance.Absolute(expected / InitialConcentration, profile[i] / InitialConcentration, 1e-8, $"c/C0 at x/L {depths[i] / thickness}, tau {tau} (Crank eq. 4.17/4.19)");
            }
        }
    }

    private static SimulationCase Sheet(double thickness, double diffusivity, FaceCondition right)
        => Cases.Make(Cases.Closed, right, 1, layers: Cases.Layer("sheet", thickness, diffusivity, 1, InitialConcentration));
}
