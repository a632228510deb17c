using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Robustness;

/// <summary>
/// A property over seeded random stacks at the edges of the physics (K 1e-8 to 1e8, D 1e-20 to 1e-5 m2/s, 100 nm to
/// 10 cm, 1 to 200 layers, 1 s to 100 years, closed, bath and compartment faces): every run either keeps its mass to
/// 1e-9 and holds no negative amount beyond 1e-9 of the mass, or is refused by its own checks with the reason (common
/// practice, no source: a conservative scheme conserves mass to round-off). A coarse mesh and a loose step tolerance
/// keep the 200 runs short; round-off does not depend on them.
/// </summary>
public sealed class RandomExtremeStackTests
{
    private const int Stacks = 200;
    private const double Year = 365.25 * 86400;

    [Fact]
    public void Random_extreme_stacks_keep_their_mass_and_signs_or_are_refused_with_the_reason()
    {
        var refused = new List<string>();
        var random = new Random(16);
        var cases = Enumerable.Range(0, Stacks).Select(_ => RandomCase(random)).ToArray();
        var outcomes = new (string? Failure, bool Refused)[Stacks];
        Parallel.For(0, Stacks, new ParallelOptions { MaxDegreeOfParallelism = 2 }, i => outcomes[i] = Check(cases[i]));

        for (var i = 0; i < Stacks; i++)
        {
            Assert.True(outcomes[i].Failure is null, $"stack {i}: {outcomes[i].Failure}");
            if (outcomes[i].Refused)
            {
                refused.Add($"stack {i}");
            }
        }

        // A check that refused most runs would make the property empty: a few refusals at most.
        Assert.True(refused.Count <= Stacks / 10, $"{refused.Count} refused: {string.Join(", ", refused)}");
    }

    private static (string? Failure, bool Refused) Check(SimulationCase simulation)
    {
        var result = Simulator.Run(simulation);
        if (!result.Completed)
        {
            var documented = result.Statistics.StopReason is StopReason.MassBalanceNotClosed or StopReason.NegativeAmount
                or StopReason.StepSizeUnderflow or StopReason.MaximumStepsExceeded;
            return (documented && result.FailureReason.Length > 0 ? null : $"stopped without a documented reason: {result.Statistics}", true);
        }

        if (!(result.WorstMassBalanceError <= 1e-9))
        {
            return ($"succeeded with a mass balance error of {result.WorstMassBalanceError:G3}", false);
        }

        foreach (var sample in result.TimeSeries)
        {
            var reference = result.TimeSeries[0].LayerMassPerArea.Sum()
                + (sample.Left?.TransferredIntoMediumPerArea is { } left && simulation.Left is BathFace ? Math.Abs(left) : 0)
                + (sample.Right?.TransferredIntoMediumPerArea is { } right && simulation.Right is BathFace ? Math.Abs(right) : 0)
                + InitialCompartmentMass(simulation);
            foreach (var mass in sample.LayerMassPerArea)
            {
                if (mass < -1e-9 * reference)
                {
                    return ($"succeeded with a layer amount of {mass / reference:G3} of the mass at {sample.TimeSeconds:G3} s", false);
                }
            }
        }

        return (null, false);
    }

    private static double InitialCompartmentMass(SimulationCase simulation)
        => new[] { simulation.Left, simulation.Right }.OfType<CompartmentFace>().Sum(face => face.VolumePerAreaMeters * face.InitialConcentrationKgPerCubicMeter);

    private static SimulationCase RandomCase(Random random)
    {
        double LogUniform(double low, double high) => Math.Pow(10, Math.Log10(low) + (random.NextDouble() * Math.Log10(high / low)));
        var count = Math.Max(1, (int)LogUniform(1, 200.999));
        var layers = Enumerable.Range(0, count).Select(i => Cases.Layer(
            $"l{i}",
            LogUniform(1e-7, 0.1),
            LogUniform(1e-20, 1e-5),
            LogUniform(1e-8, 1e8),
            i == 0 || random.NextDouble() < 0.3 ? LogUniform(1e-3, 1e3) : 0)).ToArray();
        FaceCondition Face()
        {
            var pick = random.NextDouble();
            return pick < 0.4 ? Cases.Closed
                : pick < 0.7 ? Cases.Compartment(LogUniform(1e-5, 10), LogUniform(1e-3, 1e3))
                : Cases.Bath(random.NextDouble() < 0.5 ? 0 : LogUniform(1e-3, 1e3), LogUniform(1e-3, 1e3));
        }

        var left = Face();
        var right = Face();
        return Cases.Make(
            left,
            right,
            LogUniform(1, 100 * Year),
            numerics: new NumericsSettings(new CellCountMesh(8) { MinimumCellsPerLayer = 4 }, new SolverOptions { RelativeTolerance = 1e-3 }),
            layers: layers);
    }
}
