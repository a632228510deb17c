using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>
/// First-order removal from a compartment behind a thin, fast layer: the whole system loses mass like
/// dM/dt = -k f M with f the compartment's share of the capacity, so M(t) = M(0) exp(-k f t) (the exact solution of
/// a linear first-order equation, common practice, no source).
/// </summary>
public sealed class FirstOrderRemovalTests
{
    private const double HalfLife = 3600;
    private const double VolumePerArea = 1e-2;
    private const double LayerThickness = 1e-6;

    [Fact]
    public void Compartment_content_decays_exponentially_and_the_removed_mass_is_accounted()
    {
        var rate = Math.Log(2) / HalfLife;
        var receptor = new CompartmentFace("receptor", VolumePerArea, 1, 1, 1, null) { RemovalRatePerSecond = rate };
        var duration = 2 * HalfLife;
        var simulation = Cases.Make(
            Cases.Closed,
            receptor,
            duration,
            numerics: Cases.FixedFineMesh,
            layers: Cases.Layer("thin fast layer", LayerThickness, 1e-9, 1, 1));

        var result = Simulator.Run(simulation);

        var share = VolumePerArea / (VolumePerArea + LayerThickness);
        var initial = VolumePerArea + LayerThickness;
        var expected = initial * Math.Exp(-rate * share * duration);
        var last = result.TimeSeries[^1];
        var held = last.LayerMassPerArea.Sum() + (last.Right!.ConcentrationKgPerCubicMeter * VolumePerArea);
        Tolerance.Relative(expected, held, 1e-4, "mass left after two half-lives");
        Tolerance.Relative(initial - expected, result.DiffusionCell!.RemovedByFirstOrderPerArea[1], 1e-4, "mass removed");
        // Round-off of the very stiff system (cells of 0.1 um next to a 1 cm deep compartment) stays near 1e-10.
        Assert.True(result.WorstMassBalanceError < 1e-8, $"mass balance with removal: {result.WorstMassBalanceError:G3}");
        Assert.Equal(0, result.FinalState.RightConcentrationKgPerCubicMeter!.Value, 12);
    }
}
