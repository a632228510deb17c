using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// Closed systems: conservation of mass, and the equilibrium c_i = K_i u_eq with u_eq = total mass / sum(h_i K_i)
/// (mass balance with the partition equilibrium; Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.37 as t -> inf; equation number from memory).
/// </summary>
public sealed class ClosedSystemTests
{
    [Fact]
    public void Long_run_reaches_the_partition_equilibrium_fixed_by_the_mass_balance()
    {
        var layers = new[]
        {
            Cases.Layer("a", 20e-6, 1e-12, k: 0.01, c0: 0),
            Cases.Layer("b", 60e-6, 3e-13, k: 1, c0: 500),
            Cases.Layer("c", 5e-6, 1e-14, k: 100, c0: 20),
        };
        var compartment = Cases.Compartment(2e-3, k: 0.5, c0: 1);
        var capacity = layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient) + (2e-3 * 0.5);
        var mass = layers.Sum(layer => layer.ThicknessMeters * layer.InitialConcentrationKgPerCubicMeter) + 2e-3;
        var uEquilibrium = mass / capacity;
        var slowest = layers.Max(layer => layer.ThicknessMeters * layer.ThicknessMeters / layer.DiffusivitySquareMetersPerSecond);

        var result = Simulator.Run(Cases.Make(Cases.Closed, compartment, 40 * slowest, layers: layers));

        var final = result.Reports[^1];
        Tolerance.Relative(0.5 * uEquilibrium, final.Sample.Right!.ConcentrationKgPerCubicMeter, 1e-6, "compartment at equilibrium");
        for (var i = 0; i < layers.Length; i++)
        {
            var expected = layers[i].PartitionCoefficient * uEquilibrium * layers[i].ThicknessMeters;
            Tolerance.Relative(expected, final.Sample.LayerMassPerArea[i], 1e-6, $"layer {layers[i].Name} at equilibrium");
        }

        Assert.All(result.TimeSeries, sample => Assert.True(Math.Abs(sample.MassBalanceError) < 1e-9));
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void Random_stacks_with_extreme_ratios_conserve_mass_and_stay_non_negative(int seed)
    {
        // Common practice, no source: a closed finite-volume scheme must conserve mass to round-off.
        var random = new Random(seed);
        var count = random.Next(2, 7);
        var layers = Enumerable.Range(0, count).Select(i => Cases.Layer(
            $"layer{i}",
            Math.Pow(10, -6 + (2 * random.NextDouble())),
            Math.Pow(10, -15 + (6 * random.NextDouble())),
            k: Math.Pow(10, -3 + (6 * random.NextDouble())),
            c0: random.NextDouble() < 0.5 ? 0 : 1000 * random.NextDouble())).ToArray();
        layers[0] = layers[0] with { InitialConcentrationKgPerCubicMeter = 700 };
        FaceCondition right = random.NextDouble() < 0.5 ? Cases.Closed : Cases.Compartment(1e-3, k: Math.Pow(10, -3 + (6 * random.NextDouble())));
        var slowest = layers.Max(layer => layer.ThicknessMeters * layer.ThicknessMeters / layer.DiffusivitySquareMetersPerSecond);

        var result = Simulator.Run(Cases.Make(Cases.Closed, right, slowest, layers: layers));

        Assert.True(result.Completed, result.Statistics.ToString());
        Assert.True(result.WorstMassBalanceError < 1e-9, $"mass balance error {result.WorstMassBalanceError:G3}");
        // The distance to the analytic equilibrium (uniform u fixed by the mass balance) falls below 1 % of its start.
        Assert.NotNull(result.FinalState.System.NinetyNinePercent);
        // In u = c/K, which is what the solver bounds: no value below -1e-12 of the largest initial u (round-off).
        var scale = layers.Max(layer => layer.InitialConcentrationKgPerCubicMeter / layer.PartitionCoefficient);
        foreach (var profile in result.Reports.SelectMany(report => report.Profiles))
        {
            var k = layers[profile.LayerIndex].PartitionCoefficient;
            Assert.All(profile.ConcentrationsKgPerCubicMeter, c => Assert.True(c / k >= -1e-12 * scale, $"negative concentration {c:G3}"));
        }
    }
}
