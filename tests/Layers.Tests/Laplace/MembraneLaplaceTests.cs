using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// Permeation through an initially empty membrane from a constant donor into a perfect sink. References: Crank, The
/// Mathematics of Diffusion, 2nd ed. (1975), ch. 4, eq. 4.24a for Q_t and the Daynes-Barrer lag L^2/(6D) (eq. 4.24c),
/// equation numbers from memory; for laminates, Frisch's lag integral (H. L. Frisch, J. Phys. Chem. 61 (1957) 93, from
/// memory) as summed by Analytics.LaminateTimeLag, and the series-resistance steady flux of Analytics.SteadyStateStack.
/// </summary>
public sealed class MembraneLaplaceTests
{
    private const double Donor = 50;

    [Theory]
    [InlineData(1e-4, 1e-11, 0.3)]
    [InlineData(0.02, 1e-16, 1e5)]
    public void Cumulative_amount_matches_Crank_eq_4_24a_to_1e_8(double thickness, double diffusivity, double k)
    {
        var solution = LaplaceSolution.For(Membrane(thickness, diffusivity, k));
        var steadyRate = MembraneTimeLag.SteadyFluxKgPerSquareMeterSecond(diffusivity, thickness, k, Donor);
        var lagTime = MembraneTimeLag.LagTimeSeconds(diffusivity, thickness);

        foreach (var tau in new[] { 0.02, 0.05, 0.2, 1, 3 })
        {
            var time = tau * thickness * thickness / diffusivity;
            var expected = MembraneTimeLag.CumulativeMassPerArea(diffusivity, thickness, k, Donor, time);

            // Scaled by the amount the steady line reaches at one lag time past the lag, J t_lag.
            var received = solution.At(time).Right!.TransferredIntoMediumPerArea;
            Tolerance.Absolute(expected / (steadyRate * lagTime), received / (steadyRate * lagTime), 1e-8, $"Q_t at tau {tau} (Crank eq. 4.24a)");
        }
    }

    [Fact]
    public void Steady_line_gives_the_Daynes_Barrer_lag_and_Fick_flux()
    {
        const double thickness = 75e-6;
        const double diffusivity = 2e-12;
        const double k = 4;
        var line = LaplaceSolution.For(Membrane(thickness, diffusivity, k)).SteadyLine(Side.Right);

        Assert.NotNull(line);
        Tolerance.Relative(MembraneTimeLag.LagTimeSeconds(diffusivity, thickness), line.LagTimeSeconds, 1e-12, "L^2/(6D) (Crank eq. 4.24c)");
        Tolerance.Relative(MembraneTimeLag.SteadyFluxKgPerSquareMeterSecond(diffusivity, thickness, k, Donor), line.FluxKgPerSquareMeterSecond, 1e-12, "D K C/L");
    }

    [Fact]
    public void Laminate_lag_and_flux_match_Frisch_and_the_series_resistance_law()
    {
        var simulation = Cases.Make(
            Cases.Bath(Donor),
            Cases.Bath(0),
            1,
            layers:
            [
                Cases.Layer("a", 20e-6, 1e-10, 1e-3),
                Cases.Layer("b", 300e-6, 1e-15, 1e4),
                Cases.Layer("c", 5e-3, 1e-8, 30),
            ]);
        var line = LaplaceSolution.For(simulation).SteadyLine(Side.Right);

        Assert.NotNull(line);
        Tolerance.Relative(LaminateTimeLag.Seconds(simulation.Stack), line.LagTimeSeconds, 1e-10, "laminate lag (Frisch 1957)");
        Tolerance.Relative(SteadyStateStack.Of(simulation).FluxKgPerSquareMeterSecond, line.FluxKgPerSquareMeterSecond, 1e-12, "steady flux, sum of h/(D K)");
    }

    [Fact]
    public void A_closed_receiving_face_or_a_closed_system_has_no_steady_line()
    {
        var closedRight = Cases.Make(Cases.Bath(Donor), Cases.Closed, 1, layers: Cases.Layer("m", 1e-4, 1e-12));
        var closedSystem = Cases.Make(Cases.Closed, Cases.Compartment(1e-3), 1, layers: Cases.Layer("m", 1e-4, 1e-12, 1, 10));

        Assert.Null(LaplaceSolution.For(closedRight).SteadyLine(Side.Right));
        Assert.Null(LaplaceSolution.For(closedRight).SteadyLine(Side.Left));
        Assert.Null(LaplaceSolution.For(closedSystem).SteadyLine(Side.Right));
    }

    private static SimulationCase Membrane(double thickness, double diffusivity, double k)
        => Cases.Make(Cases.Bath(Donor), Cases.Bath(0), 1, layers: Cases.Layer("membrane", thickness, diffusivity, k));
}
