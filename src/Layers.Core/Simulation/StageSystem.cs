using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.FoodContact;

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
    /// The stages of a case on a grid: one per temperature stage when the case has a history, else one for the whole
    /// duration with the case as it is. Partition coefficients are the same in every stage, so storage (and with it
    /// every mass the observers compute) is the same too; only the conductances change.
    /// </summary>
    public static IReadOnlyList<StageSystem> For(SimulationCase simulation, Grid grid)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (simulation.FoodContact is not { } food)
        {
            return [new StageSystem(simulation, DiffusionSystemBuilder.Build(simulation, grid).System, 0, simulation.DurationSeconds)];
        }

        return For(simulation, grid, food.Stages, food.Diffusivities);
    }

    /// <summary>The stages of a given history (also used for a test condition) on a grid.</summary>
    public static IReadOnlyList<StageSystem> For(
        SimulationCase simulation,
        Grid grid,
        IReadOnlyList<TemperatureStage> stages,
        IReadOnlyDictionary<string, DiffusivitySource> sources)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        ArgumentNullException.ThrowIfNull(stages);
        var result = new List<StageSystem>();
        var start = 0.0;
        foreach (var stage in stages)
        {
            var layers = simulation.Stack.Layers
                .Select(layer => layer with { DiffusivitySquareMetersPerSecond = stage.DiffusivityOf(layer.Name, sources[layer.Name]).Value })
                .ToArray();
            var stageCase = simulation with { Stack = new LayerStack(layers) };
            var end = start + stage.DurationSeconds;
            result.Add(new StageSystem(stageCase, DiffusionSystemBuilder.Build(stageCase, grid).System, start, end));
            start = end;
        }

        return result;
    }
}
