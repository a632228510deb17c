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
    /// Per node, the factor from the case's own u = c/K to this stage's: the ratio of the storages, Cap_case /
    /// Cap_stage, which is K_case / K_stage for a cell (both share the grid) and for a compartment whose volume stays;
    /// null when the stage keeps the case's storages. States outside a stage are always in the case's own variable, so
    /// the mass, storage times u, is the same on both sides of a stage boundary, and a concentration carries over
    /// unchanged when K changes.
    /// </summary>
    public double[]? ToStage { get; init; }

    /// <summary>
    /// The stages of a case on a grid, one per stage of <see cref="SimulationCase.Stages"/> (a case without a
    /// temperature history has one, spanning its duration). Observers read every state in the case's own u = c/K
    /// (see <see cref="ToStage"/>), so their masses and concentrations hold in every stage.
    /// </summary>
    /// <param name="simulation">The case as read.</param>
    /// <param name="grid">The grid shared by every stage.</param>
    /// <param name="own">
    /// The case's own system, assembled once by the caller from <see cref="SimulationCase.WithFirstStageDiffusivities"/>:
    /// the first stage runs on it when it gives no K of its own, so a plain run assembles its discrete system once.
    /// </param>
    public static IReadOnlyList<StageSystem> For(SimulationCase simulation, Grid grid, DiffusionSystem own)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        return Build(simulation, grid, own, simulation.Stages, firstIsOwn: true);
    }

    /// <summary>
    /// The stages of another history for the case (a test condition) on a grid; each assembles its own system, and
    /// <paramref name="own"/> (see <see cref="For(SimulationCase, Grid, DiffusionSystem)"/>) gives the case's K per node.
    /// </summary>
    public static IReadOnlyList<StageSystem> For(
        SimulationCase simulation, Grid grid, DiffusionSystem own, IReadOnlyList<TemperatureStage> stages)
        => Build(simulation, grid, own, stages, firstIsOwn: false);

    private static List<StageSystem> Build(
        SimulationCase simulation, Grid grid, DiffusionSystem own, IReadOnlyList<TemperatureStage> stages, bool firstIsOwn)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        ArgumentNullException.ThrowIfNull(own);
        ArgumentNullException.ThrowIfNull(stages);
        var result = new List<StageSystem>();
        var start = 0.0;
        foreach (var stage in stages)
        {
            var stageCase = stage.Apply(simulation);
            var end = start + stage.DurationSeconds;

            // The case's own system holds its K and its first stage's D: exactly the first stage's, unless that stage
            // gives K of its own.
            var system = firstIsOwn && result.Count == 0 && !stage.HasPartitionOverrides
                ? own
                : DiffusionSystemBuilder.Build(stageCase, grid).System;
            result.Add(new StageSystem(stageCase, system, start, end) { ToStage = stage.HasPartitionOverrides ? StorageRatio(own, system) : null });
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

    /// <summary>
    /// Cap_case / Cap_stage per node, from the two systems' storages (both positive at every node): the factor that keeps
    /// the mass of every node when a state passes from the case's variable to the stage's.
    /// </summary>
    internal static double[] StorageRatio(DiffusionSystem own, DiffusionSystem stage)
    {
        var ratio = new double[own.NodeCount];
        for (var n = 0; n < ratio.Length; n++)
        {
            ratio[n] = own.Capacity[n] / stage.Capacity[n];
        }

        return ratio;
    }
}
