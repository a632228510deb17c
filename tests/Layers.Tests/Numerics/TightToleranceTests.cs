using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Numerics;

/// <summary>
/// The tightest settings the case format admits must still start: a fine mesh resolves the initial step change in
/// cells whose relaxation times are far below the run's duration, so the first steps must be allowed to be that
/// short (they used to be refused below 1e-14 of the duration, and the run stopped before its first step).
/// </summary>
public sealed class TightToleranceTests
{
    [Fact]
    public void A_laminate_on_2000_cells_at_relative_tolerance_1e_10_gets_past_its_first_steps_without_losing_mass()
    {
        // The layers of the benchmark laminate (tests/Layers.Benchmarks/cases/laminate.json), in SI, 10 days.
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Compartment(1.087e-3 / 0.06),
            10 * 86400,
            numerics: NumericsSettings.FixedCells(2000, 1e-10),
            layers:
            [
                Cases.Layer("print layer", 12e-6, 5e-18, 2),
                Cases.Layer("adhesive", 3e-6, 2e-14, 1.5),
                Cases.Layer("sealant", 50e-6, 8e-14, 1, 0.92),
            ]);
        var grid = GridBuilder.Build(simulation);
        var (system, initial) = DiffusionSystemBuilder.Build(simulation, grid);
        using var stop = new CancellationTokenSource();
        var observer = new FirstSteps(50, stop, system, initial);
        var plan = new TimeLoopPlan([simulation.DurationSeconds], simulation.DurationSeconds, simulation.DurationSeconds, 1e-3);

        var statistics = new TransientSolver(system, simulation.Numerics.Solver).Run(initial, plan, observer, stop.Token);

        // The run is stopped on purpose after 50 accepted steps; before, it ended with StepSizeUnderflow and none.
        Assert.True(statistics.StopReason == StopReason.Cancelled, statistics.ToString());
        Assert.Equal(50, statistics.AcceptedSteps);
        Assert.True(observer.WorstRelativeMassChange < 1e-12, $"mass change {observer.WorstRelativeMassChange}");
    }

    private sealed class FirstSteps(int count, CancellationTokenSource stop, DiffusionSystem system, double[] initial) : ITimeLoopObserver
    {
        private readonly double _initialMass = system.TotalMass(initial);
        private int _steps;

        public double WorstRelativeMassChange { get; private set; }

        public bool WantsMoreTime => false;

        public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
        {
        }

        // A closed stack with a compartment: the total held by the nodes is conserved (no baths).
        public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
        {
            WorstRelativeMassChange = Math.Max(WorstRelativeMassChange, Math.Abs(system.TotalMass(state) - _initialMass) / _initialMass);
            if (++_steps == count)
            {
                stop.Cancel();
            }
        }
    }
}
