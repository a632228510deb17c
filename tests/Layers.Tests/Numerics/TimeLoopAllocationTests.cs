using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Numerics;

/// <summary>
/// The time loop allocates nothing per step (common practice, no source: a loop that allocates per step makes the
/// garbage collector's work grow with the number of steps). Allocation is counted, not timed.
/// </summary>
public sealed class TimeLoopAllocationTests
{
    [Fact]
    public void Stepping_a_fifty_layer_stack_allocates_nothing_between_the_first_and_the_last_step()
    {
        // Invented stack: 50 layers alternating fast and slow, with partition jumps, between a bath and a compartment.
        var layers = Enumerable.Range(0, 50)
            .Select(i => Cases.Layer($"layer {i}", (10 + (i % 7)) * 1e-6, i % 2 == 0 ? 1e-12 : 1e-14, 1 + (i % 3), i % 5 == 0 ? 100 : 0))
            .ToArray();
        var simulation = Cases.Make(Cases.Bath(10), Cases.Compartment(1e-3), 3e5, numerics: NumericsSettings.FixedCells(600, 1e-6), layers: layers);
        var grid = GridBuilder.Build(simulation);
        var (system, initial) = DiffusionSystemBuilder.Build(simulation, grid);
        var outputs = OutputSchedule.For(simulation);
        var plan = new TimeLoopPlan(outputs, simulation.DurationSeconds, 10 * simulation.DurationSeconds, 1e-3);
        var solver = new TransientSolver(system, simulation.Numerics.Solver);

        // Once to compile every path, then counted.
        solver.Run(initial, plan, new AllocationProbe());
        var probe = new AllocationProbe();
        var statistics = solver.Run(initial, plan, probe);

        Assert.Equal(StopReason.Completed, statistics.StopReason);
        Assert.True(probe.Steps > 100, $"only {probe.Steps} steps");
        Assert.True(probe.Outputs > outputs.Length / 2, $"only {probe.Outputs} outputs");
        Assert.True(probe.StepsAfterEnd > 0, "no steps after the end");
        Assert.Equal(0, probe.BytesAtLastStep - probe.BytesAtFirstStep);
    }

    /// <summary>Reads the thread's allocation counter at every step and allocates nothing itself.</summary>
    private sealed class AllocationProbe : ITimeLoopObserver
    {
        private const double End = 3e5;

        public long BytesAtFirstStep { get; private set; }

        public long BytesAtLastStep { get; private set; }

        public int Steps { get; private set; }

        public int StepsAfterEnd { get; private set; }

        public int Outputs { get; private set; }

        // Keeps the loop going past the end for a while, as the search for the times to equilibrium does.
        public bool WantsMoreTime => StepsAfterEnd < 20;

        public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow) => Outputs++;

        public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
        {
            var bytes = GC.GetAllocatedBytesForCurrentThread();
            if (Steps == 0)
            {
                BytesAtFirstStep = bytes;
            }

            BytesAtLastStep = bytes;
            Steps++;
            if (timeSeconds > End)
            {
                StepsAfterEnd++;
            }
        }
    }
}
