using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// Time lag of laminates: Frisch's time-lag integral (J. Phys. Chem. 61 (1957) 93, from memory), which reduces to
/// L^2/(6D) for one layer (Daynes-Barrer; Crank, The Mathematics of Diffusion, 2nd ed., eq. 4.24c, from memory).
/// </summary>
public sealed class LaminateTimeLagTests
{
    [Fact]
    public void One_layer_gives_the_Daynes_Barrer_lag()
    {
        var stack = new LayerStack([Cases.Layer("m", 80e-6, 3e-13, k: 7)]);

        Tolerance.Relative(80e-6 * 80e-6 / (6 * 3e-13), LaminateTimeLag.Seconds(stack), 1e-12, "L^2/(6D)");
    }

    [Fact]
    public void Splitting_one_layer_into_two_identical_halves_keeps_the_lag()
    {
        // The integral is over the stack; cutting a homogeneous membrane in two changes nothing physical.
        var whole = new LayerStack([Cases.Layer("m", 80e-6, 3e-13, k: 7)]);
        var halves = new LayerStack([Cases.Layer("a", 40e-6, 3e-13, k: 7), Cases.Layer("b", 40e-6, 3e-13, k: 7)]);

        Tolerance.Relative(LaminateTimeLag.Seconds(whole), LaminateTimeLag.Seconds(halves), 1e-12, "split membrane");
    }

    [Theory]
    [InlineData(1e-12, 1e-13, 1.0, 10.0)]
    [InlineData(5e-14, 2e-12, 20.0, 0.2)]
    public void Simulated_lag_of_a_two_layer_laminate_matches_the_integral(double d1, double d2, double k1, double k2)
    {
        var layers = new[] { Cases.Layer("first", 30e-6, d1, k1), Cases.Layer("second", 60e-6, d2, k2) };
        var expected = LaminateTimeLag.Seconds(new LayerStack(layers));
        var simulation = Cases.Make(Cases.Bath(1), Cases.Bath(0), 3 * expected, layers: layers);

        var result = Simulator.Run(simulation);

        Tolerance.Relative(expected, result.Permeation!.LagTimeSeconds!.Value, 2e-3, "laminate lag time");
    }
}
