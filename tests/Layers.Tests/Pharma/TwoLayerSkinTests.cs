using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>
/// A two-layer skin model (stratum corneum over viable epidermis) between an aqueous donor and a sink, at steady
/// state, against the series-resistance law with partition coefficients, J = C_donor / (h1/(D1 K1) + h2/(D2 K2))
/// (Crank, The Mathematics of Diffusion, 2nd ed., ch. 12, composite membranes, from memory), and k_p = J / C_donor.
/// </summary>
public sealed class TwoLayerSkinTests
{
    private const double Donor = 2;
    private const double StratumThickness = 15e-6;
    private const double StratumDiffusivity = 1e-14;
    private const double StratumPartition = 20;
    private const double EpidermisThickness = 100e-6;
    private const double EpidermisDiffusivity = 1e-10;
    private const double EpidermisPartition = 1;

    [Fact]
    public void Steady_flux_and_permeability_match_the_series_resistance_law()
    {
        var resistance = (StratumThickness / (StratumDiffusivity * StratumPartition))
            + (EpidermisThickness / (EpidermisDiffusivity * EpidermisPartition));
        var flux = Donor / resistance;
        var lag = StratumThickness * StratumThickness / (6 * StratumDiffusivity);
        var simulation = Cases.Make(
            Cases.Bath(Donor),
            Cases.Bath(0),
            30 * lag,
            layers:
            [
                Cases.Layer("stratum corneum", StratumThickness, StratumDiffusivity, StratumPartition),
                Cases.Layer("viable epidermis", EpidermisThickness, EpidermisDiffusivity, EpidermisPartition),
            ]) with
        {
            PermeationTest = new PermeationTest(),
        };

        var result = Simulator.Run(simulation);

        Tolerance.Relative(flux, result.Permeation!.FluxAtEndKgPerSquareMeterSecond, 1e-3, "simulated flux at the end");
        var metrics = result.DiffusionCell!.Simulated!;
        Tolerance.Relative(flux, metrics.SteadyFluxKgPerSquareMeterSecond, 2e-3, "steady flux from the linear part of Q(t)");
        Tolerance.Relative(flux / Donor, metrics.PermeabilityCoefficientMetersPerSecond!.Value, 2e-3, "k_p = J / C_donor");
    }
}
