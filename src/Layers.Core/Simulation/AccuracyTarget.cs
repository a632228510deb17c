using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Core.Simulation;

/// <summary>
/// Mesh and step tolerance for a target relative accuracy of the amounts a run reports (masses per layer, amount
/// transferred to a face medium, at every report time, relative to the largest of them), chosen from measured errors
/// against analytic and fine-mesh references (docs/numerics.md, "Choosing the accuracy").
/// </summary>
/// <remarks>
/// The cells are placed by each layer's diffusion lengths (<see cref="DiffusionLengthMesh"/>): the error a layer adds
/// is about 0.05 (width / diffusion length)^2 times its share, so the width per diffusion length is
/// <see cref="WidthPerDiffusionLengthAtOneInTenThousand"/> x sqrt(accuracy / 1e-4). The step tolerance equals the
/// target at 1e-4 and coarser: measured, the time and space errors are then of similar size and together below the
/// target on the benchmark cases and the analytic tests (at 1.5 times the target, a plane sheet into a limited volume
/// missed). Finer targets get target x sqrt(target / 1e-4): the global error of a second-order method under local error
/// control grows as the tolerance to the power 2/3, so a tolerance equal to the target would leave the time error an
/// ever larger part of it (the plane sheet missed 1e-5 by 2.4 times).
/// </remarks>
public static class AccuracyTarget
{
    /// <summary>Finest target the setting accepts.</summary>
    public const double Finest = 1e-6;

    /// <summary>Coarsest target the setting accepts.</summary>
    public const double Coarsest = 1e-2;

    /// <summary>The target of a case file that names none.</summary>
    public const double Default = 1e-4;

    /// <summary>Cell width per diffusion length, at the edges of the layer that matters most, at a target of 1e-4.</summary>
    public const double WidthPerDiffusionLengthAtOneInTenThousand = 0.05;

    /// <summary>Step tolerance over the target.</summary>
    public const double ToleranceOverTarget = 1.0;

    /// <summary>Fewest cells in any layer.</summary>
    public const int MinimumCellsPerLayer = 4;

    /// <summary>The mesh and solver settings for a target relative accuracy within [<see cref="Finest"/>, <see cref="Coarsest"/>].</summary>
    public static (GridOptions Grid, SolverOptions Solver) Settings(double accuracy)
    {
        var width = WidthPerDiffusionLengthAtOneInTenThousand * Math.Sqrt(accuracy / 1e-4);
        var grid = new GridOptions { ByDiffusionLength = new DiffusionLengthMesh(width, MinimumCellsPerLayer) };
        var tolerance = ToleranceOverTarget * accuracy * Math.Min(1, Math.Sqrt(accuracy / 1e-4));
        var solver = new SolverOptions { RelativeTolerance = Math.Min(1e-2, tolerance) };
        return (grid, solver);
    }
}
