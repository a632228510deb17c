using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// Stacks of 200 layers with D over fifteen decades and K over sixteen, where no mesh would be affordable: the exact
/// method keeps the mass balance at every time and reaches the closed-system equilibrium (one mass balance over the
/// capacities h K; Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, the limit of eq. 4.37, from memory, as in
/// Analytics.ClosedSystemEquilibrium) and the steady flux of the series-resistance law (sum of h / (D K), Fick's first
/// law per layer, Analytics.SteadyStateStack) at long times.
/// </summary>
public sealed class ExtremeStackTests
{
    private const int LayerCount = 200;

    [Fact]
    public void A_closed_stack_keeps_its_mass_and_settles_at_the_equilibrium()
    {
        var simulation = Cases.Make(Cases.Closed, Cases.Compartment(1e-3, 1, 5), 1, layers: Layers(new Random(7)));
        var solution = LaplaceSolution.For(simulation);
        var initial = simulation.Stack.InitialMassPerArea + ((CompartmentFace)simulation.Right).InitialMassPerArea;
        var slowest = SlowestTime(simulation.Stack);

        foreach (var fraction in new[] { 1e-12, 1e-8, 1e-4, 1e-2, 1 })
        {
            var snapshot = solution.At(fraction * slowest);
            var held = snapshot.StackMassPerArea + snapshot.Right!.MediumMassPerArea!.Value;
            Tolerance.Relative(initial, held, 1e-9, $"mass at {fraction:G1} of the slowest time");
        }

        var equilibrium = ClosedSystemEquilibrium.Of(simulation);
        var settled = solution.At(1e3 * slowest);
        for (var j = 0; j < LayerCount; j++)
        {
            var layer = simulation.Stack.Layers[j];
            Tolerance.Absolute(
                equilibrium.ConcentrationIn(layer.PartitionCoefficient) * layer.ThicknessMeters / initial,
                settled.LayerMassPerArea[j] / initial,
                1e-9,
                $"layer {j} at equilibrium");
        }

        Tolerance.Relative(equilibrium.ConcentrationIn(1), settled.Right!.ConcentrationKgPerCubicMeter, 1e-8, "compartment at equilibrium");
    }

    [Fact]
    public void Between_two_baths_the_flux_settles_at_the_series_resistance_value()
    {
        var simulation = Cases.Make(Cases.Bath(100, 1, film: 1e-9), Cases.Bath(0), 1, layers: Layers(new Random(8)));
        var solution = LaplaceSolution.For(simulation);
        var steady = SteadyStateStack.Of(simulation).FluxKgPerSquareMeterSecond;

        var late = solution.At(1e3 * SlowestTime(simulation.Stack));
        Tolerance.Relative(steady, late.Right!.FluxIntoMediumKgPerSquareMeterSecond, 1e-8, "flux into the sink");
        Tolerance.Relative(steady, -late.Left!.FluxIntoMediumKgPerSquareMeterSecond, 1e-8, "flux out of the donor");
        Tolerance.Relative(steady, solution.SteadyLine(Side.Right)!.FluxKgPerSquareMeterSecond, 1e-10, "flux of the steady line");
    }

    private static Layer[] Layers(Random random)
    {
        var layers = new Layer[LayerCount];
        for (var j = 0; j < LayerCount; j++)
        {
            layers[j] = Cases.Layer(
                $"L{j}",
                Math.Pow(10, -6 + (3 * random.NextDouble())),
                Math.Pow(10, -20 + (15 * random.NextDouble())),
                Math.Pow(10, -8 + (16 * random.NextDouble())),
                random.NextDouble() < 0.3 ? 1000 * random.NextDouble() : 0);
        }

        return layers;
    }

    // (sum of h / (D K)) (sum of h K) bounds the slowest relaxation of the stack.
    private static double SlowestTime(LayerStack stack)
        => stack.ResistanceSecondsPerMeter * stack.Layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient);
}
