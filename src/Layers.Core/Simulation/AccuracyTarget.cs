using Layers.Core.Discretization;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Mesh and step tolerance for a target relative accuracy of the amounts a run reports (masses per layer, amount
/// transferred to a face medium, at every output time, relative to the largest of them), chosen from measured errors
/// against analytic and fine-mesh references (docs/numerics.md, "Choosing the accuracy").
/// </summary>
/// <remarks>
/// The spatial error of the cell-centred scheme falls with the square of the cell width, so the number of cells
/// grows with 1/sqrt(accuracy): 320 cells at 1e-4, 100 at 1e-3. The cells at the edges of each layer are made
/// narrower than a quarter of the layer's diffusion length at 1 % of the duration, so that a slow layer, or one that
/// takes up much from its neighbour, resolves its steep early profile. The step tolerance is a quarter of the target:
/// an output interpolated inside a step carries an error of the order of that step's local error.
/// </remarks>
public static class AccuracyTarget
{
    /// <summary>Finest target the setting accepts.</summary>
    public const double Finest = 1e-6;

    /// <summary>Coarsest target the setting accepts.</summary>
    public const double Coarsest = 1e-2;

    /// <summary>Cells at a target of 1e-4.</summary>
    public const int CellsAtOneInTenThousand = 320;

    /// <summary>The mesh and solver settings for a target relative accuracy within [<see cref="Finest"/>, <see cref="Coarsest"/>].</summary>
    public static (GridOptions Grid, SolverOptions Solver) Settings(double accuracy, double durationSeconds)
    {
        var cells = (int)Math.Ceiling(CellsAtOneInTenThousand * Math.Sqrt(1e-4 / accuracy));
        var grid = new GridOptions { TotalCells = Math.Clamp(cells, 24, 200_000), ResolvedFromSeconds = 0.01 * durationSeconds };
        var solver = new SolverOptions { RelativeTolerance = 0.25 * accuracy };
        return (grid, solver);
    }
}
