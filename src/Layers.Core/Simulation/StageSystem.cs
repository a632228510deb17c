using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Core.Simulation;

/// <summary>
/// One stage of a run: the case with the stage's diffusion coefficients, its system assembled on the shared grid,
/// and the stage's time span on the run's clock.
/// </summary>
/// <param name="Case">The case with each layer's D for this stage.</param>
/// <param name="System">The assembled system for this stage.</param>
/// <param name="StartSeconds">Start of the stage, s from the start of the run.</param>
/// <param name="EndSeconds">End of the stage, s.</param>
public sealed record StageSystem(SimulationCase Case, DiffusionSystem System, double StartSeconds, double EndSeconds)
{
    /// <summary>
    /// Per node, the factor from the case's own u = c/K to this stage's, K_case / K_stage (the ratio of the
    /// storages, as both share the grid); null when the stage keeps the case's partition coefficients.
    /// States outside a stage are always in the case's own variable, so a concentration carries over unchanged
    /// when K changes and the mass, storage times u, is the same on both sides of a stage boundary.
    /// </summary>
    public double[]? ToStage { get; init; }

    /// <summary>
    /// The stages of a case on a grid: one per temperature stage when the case has a history, else one for the whole
    /// duration with the case as it is. Observers read every state in the case's own u = c/K (see
    /// <see cref="ToStage"/>), so their masses and concentrations hold in every stage.
    /// </summary>
    public static IReadOnlyList<StageSystem> For(SimulationCase simulation, Grid grid)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (simulation.FoodContact is not { } food)
        {
            return [Whole(simulation, DiffusionSystemBuilder.Build(simulation, grid).System)];
        }

        return For(simulation, grid, food.Stages, food.Diffusivities);
    }

    /// <summary>
    /// The single stage of a case without a temperature history, on a system already assembled for that case, so that
    /// a plain run assembles its discrete system once.
    /// </summary>
    public static StageSystem Whole(SimulationCase simulation, DiffusionSystem system)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        return new StageSystem(simulation, system, 0, simulation.DurationSeconds);
    }

    /// <summary>The stages of a given history (also used for a test condition) on a grid.</summary>
    public static IReadOnlyList<StageSystem> For(
        SimulationCase simulation,
        Grid grid,
        IReadOnlyList<TemperatureStage> stages,
        IReadOnlyList<DiffusivitySource> sources)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        ArgumentNullException.ThrowIfNull(stages);
        var result = new List<StageSystem>();
        var start = 0.0;
        var own = stages.Any(stage => stage.HasPartitionOverrides) ? DiffusionSystemBuilder.Build(simulation, grid).System : null;
        foreach (var stage in stages)
        {
            var stageCase = stage.Apply(simulation, sources);
            var end = start + stage.DurationSeconds;
            var system = DiffusionSystemBuilder.Build(stageCase, grid).System;
            result.Add(new StageSystem(stageCase, system, start, end) { ToStage = stage.HasPartitionOverrides ? StorageRatio(own!, system) : null });
            start = end;
        }

        return result;
    }

    /// <summary>This stage's u from the case's own (in place); nothing to do when K is the case's.</summary>
    public void IntoStage(Span<double> state)
    {
        if (ToStage is { } factors)
        {
            for (var n = 0; n < state.Length; n++)
            {
                state[n] *= factors[n];
            }
        }
    }

    /// <summary>The case's own u from this stage's (in place).</summary>
    public void OutOfStage(Span<double> state)
    {
        if (ToStage is { } factors)
        {
            for (var n = 0; n < state.Length; n++)
            {
                state[n] /= factors[n];
            }
        }
    }

    private static double[] StorageRatio(DiffusionSystem own, DiffusionSystem stage)
    {
        var ratio = new double[own.NodeCount];
        for (var n = 0; n < ratio.Length; n++)
        {
            ratio[n] = own.Capacity[n] / stage.Capacity[n];
        }

        return ratio;
    }
}
