using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Core.Simulation;

/// <summary>
/// The stages of a run whose schedule takes layers off or puts them on, or closes and opens faces: each stage is split
/// at those times; while layers are off the link between them and the rest of the stack is cut, and while a face is
/// closed its medium is out of contact. The cells of a layer that is off stay on the
/// grid, emptied when it is taken off (<see cref="SamplingEvents"/>), exchanging with nothing; so one grid serves the
/// whole run and a layer put on again is loaded in the same cells.
/// </summary>
internal static class LayerPresence
{
    public static IReadOnlyList<StageSystem> Split(IReadOnlyList<StageSystem> stages, SimulationCase simulation)
    {
        if (simulation.Schedule is not { ChangesContacts: true } schedule)
        {
            return stages;
        }

        var changes = schedule.ContactChangeTimes;
        var result = new List<StageSystem>();
        foreach (var stage in stages)
        {
            var inside = changes.Where(time => time > stage.StartSeconds * (1 + 1e-12) && time < stage.EndSeconds * (1 - 1e-12));
            var bounds = inside.Prepend(stage.StartSeconds).Append(stage.EndSeconds).ToArray();
            for (var i = 0; i + 1 < bounds.Length; i++)
            {
                var off = schedule.LayersOffAt(bounds[i]);
                var closed = schedule.FacesClosedAt(bounds[i]);
                var system = off.Count == 0 ? stage.System : stage.System.WithLinksCut(CutLinks(stage.System, off, simulation.Stack.Count));
                result.Add(stage with
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
