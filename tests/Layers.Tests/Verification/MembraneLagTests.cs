using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// A membrane between a constant source and a perfect sink, starting empty. Reference: Daynes (1920) and Barrer
/// (1939) as given by Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, eq. 4.24a (from memory): cumulative amount Q(t), time
/// lag L^2/(6D), steady flux D K C / L.
/// </summary>
public sealed class MembraneLagTests
{
    private const double Thickness = 20e-6;
    private const double Diffusivity = 3e-13;
    private const double MembraneOverDonor = 4;
    private const double Donor = 5;

    [Theory]
    [InlineData(0.1)]
    [InlineData(0.3)]
    [InlineData(1)]
    [InlineData(3)]
    public void Cumulative_amount_matches_Daynes_Barrer_series(double dimensionlessTime)
    {
        var time = dimensionlessTime * Thickness * Thickness / Diffusivity;
        var result = Simulator.Run(Membrane(time));

        var received = result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea;
        var expected = MembraneTimeLag.CumulativeMassPerArea(Diffusivity, Thickness, MembraneOverDonor, Donor, time);
        Tolerance.Relative(expected, received, 1e-3, "cumulative amount (Crank eq. 4.24a)");
    }

    [Fact]
    public void Lag_time_and_steady_flux_match_the_time_lag_law()
    {
        var result = Simulator.Run(Membrane(5 * Thickness * Thickness / Diffusivity));

        var permeation = result.Permeation!;
        // Crank ch. 4, eqs. 4.24b-c (from memory): J = D K C / L and t_lag = L^2 / (6 D).
        Tolerance.Relative(Diffusivity * MembraneOverDonor * Donor / Thickness, permeation.SteadyFluxKgPerSquareMeterSecond, 1e-12, "steady flux");
        Tolerance.Relative(Diffusivity * MembraneOverDonor * Donor / Thickness, permeation.FluxAtEndKgPerSquareMeterSecond, 1e-3, "simulated flux at the end");
        Tolerance.Relative(Thickness * Thickness / (6 * Diffusivity), permeation.LagTimeSeconds!.Value, 1e-3, "simulated lag time");
        Tolerance.Relative(Thickness * Thickness / (6 * Diffusivity), permeation.AnalyticLagTimeSeconds!.Value, 1e-12, "recognised single membrane");
    }

    [Theory]
    [InlineData(1e-3)]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    public void At_an_accuracy_target_the_amounts_at_every_report_time_are_within_it(double accuracy)
    {
        // numerics.accuracy (docs/numerics.md, "Choosing the accuracy"): the mesh by diffusion length, resolved from the
        // earliest report, holds the cumulative amount of Crank eq. 4.24a to the target relative to the largest amount.
        var scale = Thickness * Thickness / Diffusivity;
        double[] reports = [0.1 * scale, 0.3 * scale, scale, 3 * scale];
        var result = Simulator.Run(Membrane(reports[^1]) with { ReportTimesSeconds = reports, Numerics = NumericsSettings.ForAccuracy(accuracy) with { Method = SolutionMethod.FiniteVolume } });

        var expected = reports.Select(time => MembraneTimeLag.CumulativeMassPerArea(Diffusivity, Thickness, MembraneOverDonor, Donor, time)).ToArray();
        for (var i = 0; i < reports.Length; i++)
        {
            var received = result.Reports[i].Sample.Right!.TransferredIntoMediumPerArea;
            Assert.True(
                Math.Abs(received - expected[i]) <= accuracy * expected[^1],
                $"at D t/L^2 = {reports[i] / scale}: {received} vs {expected[i]} (Crank eq. 4.24a), error {Math.Abs(received - expected[i]) / expected[^1]:E2}");
        }
    }

    private static Layers.Core.Domain.SimulationCase Membrane(double time)
        => Cases.Make(
            Cases.Bath(Donor),
            Cases.Bath(0),
            time,
            numerics: Cases.FixedFineMesh,
            layers: Cases.Layer("membrane", Thickness, Diffusivity, MembraneOverDonor));
}
