using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Renewals with new properties on stacks drawn at random (seeded): two or three layers with K from 0.01 to 100 and D
/// from 1e-14 to 1e-11 m2/s, a compartment whose every portion has its own volume, K, film and fresh concentration.
/// The run is held against the same contacts chained by hand, one discrete system per portion on the run's grid, the
/// stack's cells carried from one to the next and the compartment refilled fresh: what each portion receives must
/// agree, which checks the stages' own variables, the renewals and the reading of each portion (mass balance and
/// Fick's law on the shared grid; no other source).
/// </summary>
public sealed class NewMediumChainedTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void Every_portion_receives_what_the_contacts_chained_by_hand_give(int seed)
    {
        var random = new Random(seed);
        double LogUniform(double low, double high) => low * Math.Pow(high / low, random.NextDouble());
        var layers = Enumerable.Range(0, random.Next(2, 4))
            .Select(index => Cases.Layer($"layer {index + 1}", LogUniform(2e-5, 2e-4), LogUniform(1e-14, 1e-11), LogUniform(0.01, 100), index == 0 ? 500 : 0))
            .ToArray();
        var thickness = layers.Sum(layer => layer.ThicknessMeters);
        var slowest = layers.Max(layer => layer.ThicknessMeters * layer.ThicknessMeters / layer.DiffusivitySquareMetersPerSecond);
        CompartmentFace Portion() => Cases.Compartment(
            LogUniform(0.1, 10) * thickness, LogUniform(0.1, 10), random.NextDouble() < 0.5 ? 0 : LogUniform(0.1, 10), random.NextDouble() < 0.5 ? null : LogUniform(1e-7, 1e-5));
        var portions = new[] { Portion(), Portion(), Portion() };
        var durations = portions.Select(_ => LogUniform(0.02, 0.5) * slowest).ToArray();
        var starts = durations.Select((_, index) => durations.Take(index).Sum()).ToArray();
        var periods = portions.Select((portion, index) => new SchedulePeriod($"contact {index + 1}", (index, 0), 1, 1, starts[index], durations[index], index == 0 ? [] : [Side.Right])
        {
            NewMedia = index == 0 ? new Dictionary<Side, FaceCondition>() : new Dictionary<Side, FaceCondition> { [Side.Right] = portion },
        }).ToArray();
        var simulation = Cases.Make(Cases.Closed, portions[0], durations.Sum(), null, Cases.FixedFineMesh, layers) with { Schedule = new ContactSchedule(periods) };

        var result = Simulator.Run(simulation);
        Assert.True(result.Completed, result.FailureReason);

        // By hand: each portion's own system on the run's grid; the cells carry over (their K does not change), the
        // compartment starts each contact at its fresh u = c / K.
        var grid = DiscreteModel.Build(simulation).Grid;
        double[]? cells = null;
        for (var p = 0; p < portions.Length; p++)
        {
            var one = simulation with { Right = portions[p], Schedule = null, DurationSeconds = durations[p], ReportTimesSeconds = [durations[p]] };
            var (system, initial) = DiffusionSystemBuilder.Build(one, grid);
            var node = system.CompartmentNode(Side.Right);
            var state = initial.ToArray();
            cells?.AsSpan(0, node).CopyTo(state);
            var fresh = system.Capacity[node] * state[node];
            state = StagedIntegration.Run(
                [new StageSystem(one, system, 0, durations[p])], state, [durations[p]], durations[p],
                (stage, first) => Simulator.InitialStep(stage.Case, grid, first), one.Numerics.Solver, new Unobserved()).FinalState;
            var received = (system.Capacity[node] * state[node]) - fresh;
            var scale = result.Schedule!.Periods.Max(period => Math.Abs(period.Media.Single().ReceivedKgPerSquareMeter));
            Tolerance.Absolute(received, result.Schedule.Periods[p].Media.Single().ReceivedKgPerSquareMeter, 1e-5 * scale, $"seed {seed}: portion {p + 1} received");
            cells = state;
        }
    }

    private sealed class Unobserved : ITimeLoopObserver
    {
        public bool WantsMoreTime => false;

        public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
        {
        }

        public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
        {
        }
    }
}
