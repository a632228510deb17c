using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// The accuracy a case asks for with numerics.accuracy is met, at every report time and relative to the largest
/// amount, on a plane sheet against a solution of limited volume. Reference: Crank, The Mathematics of Diffusion,
/// 2nd ed. (1975), ch. 4, eq. 4.37 (from memory), roots of tan q = -alpha q.
/// </summary>
public sealed class AccuracyTargetTests
{
    [Theory]
    [InlineData(1e-3)]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    public void The_amount_in_the_solution_is_within_the_target_at_every_report_time(double accuracy)
    {
        const double thickness = 50e-6, diffusivity = 4e-14, c0 = 920, alpha = 1;
        var scale = thickness * thickness / diffusivity;
        double[] reports = [0.01 * scale, 0.05 * scale, 0.2 * scale, 0.5 * scale];
        var simulation = Cases.Make(
            Cases.Closed,
            new CompartmentFace("solution", alpha * thickness, 1, 1, 0, null),
            reports[^1],
            reports,
            NumericsSettings.ForAccuracy(accuracy) with { Method = SolutionMethod.FiniteVolume },
            Cases.Layer("sheet", thickness, diffusivity, 1, c0));

        var result = Simulator.Run(simulation);

        var expected = reports.Select(t => PlaneSheetIntoLimitedVolume.TransferredMassPerArea(diffusivity, thickness, c0, alpha * thickness, 1, t)).ToArray();
        var simulated = result.Reports.Select(report => report.Sample.Right!.TransferredIntoMediumPerArea).ToArray();
        var largest = expected.Max();
        for (var i = 0; i < reports.Length; i++)
        {
            Assert.True(
                Math.Abs(simulated[i] - expected[i]) <= accuracy * largest,
                $"at D t/L^2 = {reports[i] / scale}: {simulated[i]} vs {expected[i]} (Crank eq. 4.37), error {Math.Abs(simulated[i] - expected[i]) / largest:E2}");
        }
    }
}
