using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Core.Simulation;

/// <summary>
/// The stages of a run whose schedule changes the discrete system: takes layers off or puts them on, closes and opens
/// faces, or brings a face medium with other properties. Each stage is split at those times. While layers are off the
/// link between them and the rest of the stack is cut, and while a face is closed its medium is out of contact. The
/// cells of a layer that is off stay on the grid, emptied when it is taken off (<see cref="SamplingEvents"/>),
/// exchanging with nothing; so one grid serves the whole run and a layer put on again is loaded in the same cells. A
/// medium with other properties gets the stage's system assembled with it, and the stage works in its own variable
/// (<see cref="StageSystem.ToStage"/>): a compartment's node keeps its place, with the new portion's storage.
/// </summary>
internal static class ScheduleStages
{
    /// <summary>The stages split where the schedule changes the system.</summary>
    /// <param name="stages">The run's temperature stages.</param>
    /// <param name="simulation">The case as read.</param>
    /// <param name="own">The case's own system, whose u = c/K the states outside a stage are in.</param>
    public static IReadOnlyList<StageSystem> Split(IReadOnlyList<StageSystem> stages, SimulationCase simulation, DiffusionSystem own)
    {
        if (simulation.Schedule is not { } schedule || !schedule.Periods.Any(period => period.ChangesSystem))
        {
            return stages;
        }

        var changes = schedule.SystemChangeTimes;
        var result = new List<StageSystem>();
        foreach (var stage in stages)
        {
            var inside = changes.Where(time => time > stage.StartSeconds * (1 + 1e-12) && time < stage.EndSeconds * (1 - 1e-12));
            var bounds = inside.Prepend(stage.StartSeconds).Append(stage.EndSeconds).ToArray();
            for (var i = 0; i + 1 < bounds.Length; i++)
            {
                var piece = WithMedia(stage, schedule, simulation, own, bounds[i]);
                var off = schedule.LayersOffAt(bounds[i]);
                var closed = schedule.FacesClosedAt(bounds[i]);
                var system = off.Count == 0 ? piece.System : piece.System.WithLinksCut(CutLinks(piece.System, off, simulation.Stack.Count));
                result.Add(piece with
                {
                    StartSeconds = bounds[i],
                    EndSeconds = bounds[i + 1],
                    System = closed.Count == 0 ? system : system.WithFacesDetached(closed),
                });
            }
        }

        return result;
    }

    /// <summary>
    /// The stage with the media that stand from <paramref name="startSeconds"/>: itself when they are the case's, else
    /// its case with those media and the system assembled from it, in its own variable.
    /// </summary>
    private static StageSystem WithMedia(StageSystem stage, ContactSchedule schedule, SimulationCase simulation, DiffusionSystem own, double startSeconds)
    {
        var left = schedule.MediumFrom(Side.Left, simulation.Left, startSeconds);
        var right = schedule.MediumFrom(Side.Right, simulation.Right, startSeconds);
        if (ReferenceEquals(left, simulation.Left) && ReferenceEquals(right, simulation.Right))
        {
            return stage;
        }

        // A stage's K overrides never touch a face whose medium the schedule changes (checked when the case is read).
        var withMedia = stage.Case with { Left = left, Right = right };
        var system = DiffusionSystemBuilder.Build(withMedia, own.Grid).System;
        return stage with { Case = withMedia, System = system, ToStage = StageSystem.StorageRatio(own, system) };
    }

    /// <summary>
    /// The links between the layers that are off and the rest: the off layers form a block from one face or both
    /// (checked when the case is read), so at most one link per side.
    /// </summary>
    private static IEnumerable<int> CutLinks(DiffusionSystem system, IReadOnlySet<int> off, int layerCount)
    {
        var grid = system.Grid;
        var fromLeft = Enumerable.Range(0, layerCount).TakeWhile(off.Contains).Count();
        var fromRight = Enumerable.Range(0, layerCount).Reverse().TakeWhile(off.Contains).Count();
        if (fromLeft > 0)
        {
            yield return system.FirstCellNode + grid.FirstCell(fromLeft) - 1;
        }

        if (fromRight > 0)
        {
            yield return system.FirstCellNode + grid.FirstCell(layerCount - fromRight) - 1;
        }
    }

    /// <summary>The nodes of a layer's cells.</summary>
    public static IEnumerable<int> NodesOf(DiffusionSystem system, int layer)
        => Enumerable.Range(system.FirstCellNode + system.Grid.FirstCell(layer), system.Grid.CellsIn(layer));
}
