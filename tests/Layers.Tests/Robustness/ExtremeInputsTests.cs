using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Robustness;

/// <summary>
/// Inputs at the edges of the physics still solve, conserve mass and stay non-negative: partition coefficients
/// from 1e-8 to 1e8, diffusion coefficients from 1e-20 to 1e-5 m2/s, thicknesses from 100 nm to 10 cm, durations from
/// 1 s to 100 years, 200 layers (common practice, no source: a conservative scheme conserves mass to round-off).
/// </summary>
public sealed class ExtremeInputsTests
{
    private const double Year = 365.25 * 86400;

    public static TheoryData<string> Scenarios() => new(Catalogue().Keys.Order(StringComparer.Ordinal));

    [Theory]
    [MemberData(nameof(Scenarios))]
    public void Extreme_but_valid_cases_complete_with_mass_conserved(string scenario)
    {
        var simulation = Catalogue()[scenario]();

        var result = Simulator.Run(simulation);

        Assert.True(result.Completed, result.Statistics.ToString());
        Assert.True(result.WorstMassBalanceError < 1e-9, $"mass balance {result.WorstMassBalanceError:G3}");
        var scale = simulation.Stack.Layers.Max(layer => layer.InitialContinuousVariable);
        foreach (var profile in result.Reports.SelectMany(report => report.Profiles))
        {
            var k = simulation.Stack.Layers[profile.LayerIndex].PartitionCoefficient;
            Assert.All(profile.ConcentrationsKgPerCubicMeter, c => Assert.True(c / k >= -1e-9 * scale, $"negative {c:G3}"));
        }
    }

    [Theory]
    [MemberData(nameof(Scenarios))]
    public void Extreme_but_valid_cases_complete_by_the_method_auto_chooses_with_mass_conserved(string scenario)
    {
        var built = Catalogue()[scenario]();
        var simulation = built with { Numerics = NumericsSettings.Default };

        var result = Simulator.Run(simulation, checkExactByFiniteVolumes: false);

        Assert.True(result.Completed, $"{result.Method} ({result.MethodReason}): {result.FailureReason}");
        Assert.True(result.WorstMassBalanceError < 1e-9, $"mass balance {result.WorstMassBalanceError:G3}");
        var scale = simulation.Stack.Layers.Max(layer => layer.InitialContinuousVariable);
        foreach (var profile in result.Reports.SelectMany(report => report.Profiles))
        {
            var k = simulation.Stack.Layers[profile.LayerIndex].PartitionCoefficient;
            Assert.All(profile.ConcentrationsKgPerCubicMeter, c => Assert.True(c / k >= -1e-9 * scale, $"negative {c:G3}"));
        }
    }

    private static Dictionary<string, Func<SimulationCase>> Catalogue() => new(StringComparer.Ordinal)
    {
        ["partition coefficients 1e-8 and 1e8"] = () => Make(1e6, Cases.Closed, Cases.Closed, Cases.Layer("a", 1e-4, 1e-12, 1e-8, 1), Cases.Layer("b", 1e-4, 1e-12, 1e8)),
        ["loaded layer with K 1e8 against a compartment"] = () => Make(1e6, Cases.Closed, Cases.Compartment(1e-3), Cases.Layer("a", 1e-4, 1e-12, 1e8, 1), Cases.Layer("b", 1e-4, 1e-12, 1e-8)),
        ["diffusion coefficients 1e-20 and 1e-5"] = () => Make(1e6, Cases.Closed, Cases.Bath(0), Cases.Layer("a", 1e-4, 1e-20, 1, 1), Cases.Layer("b", 1e-4, 1e-5)),
        ["100 nm film with D 1e-5 for 1 s"] = () => Make(1, Cases.Closed, Cases.Bath(0), Cases.Layer("a", 1e-7, 1e-5, 1, 1)),
        ["100 nm and 10 cm over 100 years"] = () => Make(100 * Year, Cases.Closed, Cases.Bath(0), Cases.Layer("a", 1e-7, 1e-14, 1, 1), Cases.Layer("b", 0.1, 1e-9)),
        ["very slow layer over 100 years"] = () => Make(100 * Year, Cases.Closed, Cases.Bath(0), Cases.Layer("a", 1e-4, 1e-20, 1, 1)),
        ["membrane with K 1e8 between baths"] = () => Make(1e7, Cases.Bath(1), Cases.Bath(0, k: 1e-8), Cases.Layer("a", 1e-4, 1e-12, 1e8)),
        ["200 layers"] = () =>
        {
            var random = new Random(3);
            var layers = Enumerable.Range(0, 200).Select(i => Cases.Layer(
                $"l{i}", Math.Pow(10, -6 + (2 * random.NextDouble())), Math.Pow(10, -16 + (6 * random.NextDouble())),
                Math.Pow(10, -3 + (6 * random.NextDouble())), i == 0 ? 1 : 0)).ToArray();
            return Make(30 * 86400, Cases.Closed, Cases.Compartment(1e-3), layers);
        },
    };

    private static SimulationCase Make(double duration, FaceCondition left, FaceCondition right, params Layer[] layers)
        => Cases.Make(left, right, duration, layers: layers);
}
