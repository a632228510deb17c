namespace Layers.Core.Domain;

/// <summary>
/// The numerics of a case, one setting: how the mesh is chosen and the step tolerance. Every case starts from
/// <see cref="Default"/>, whether read from a file or built in code; a case that needs a fixed mesh says so with a
/// <see cref="CellCountMesh"/>.
/// </summary>
/// <param name="Grid">The mesh: by diffusion length for an accuracy, or an explicit cell count.</param>
/// <param name="Solver">The time-stepping settings.</param>
/// <remarks>
/// <see cref="ForAccuracy"/> picks both for a target relative accuracy of the amounts a run reports (masses per layer,
/// amount transferred to a face medium, at every report time, relative to the largest of them), chosen from measured
/// errors against analytic and fine-mesh references (docs/numerics.md, "Choosing the accuracy"). The cells are placed
/// by each layer's diffusion lengths (<see cref="DiffusionLengthMesh"/>): the error a layer adds is about
/// 0.05 (width / diffusion length)^2 times its share, so the width per diffusion length is
/// <see cref="WidthPerDiffusionLengthAtOneInTenThousand"/> x sqrt(accuracy / 1e-4). The step tolerance equals the
/// target at 1e-4 and coarser: measured, the time and space errors are then of similar size and together below the
/// target on the benchmark cases and the analytic tests (at 1.5 times the target, a plane sheet into a limited volume
/// missed). Finer targets get target x sqrt(target / 1e-4): the global error of a second-order method under local
/// error control grows as the tolerance to the power 2/3, so a tolerance equal to the target would leave the time
/// error an ever larger part of it (the plane sheet missed 1e-5 by 2.4 times).
/// </remarks>
public sealed record NumericsSettings(GridOptions Grid, SolverOptions Solver)
{
    /// <summary>Finest accuracy target accepted.</summary>
    public const double FinestAccuracy = 1e-6;

    /// <summary>Coarsest accuracy target accepted.</summary>
    public const double CoarsestAccuracy = 1e-2;

    /// <summary>The accuracy target of every case that names none, read from a file or built in code.</summary>
    public const double DefaultAccuracy = 1e-4;

    /// <summary>Cell width per diffusion length, at the edges of the layer that matters most, at a target of 1e-4.</summary>
    public const double WidthPerDiffusionLengthAtOneInTenThousand = 0.05;

    /// <summary>Step tolerance over the target.</summary>
    public const double ToleranceOverTarget = 1.0;

    /// <summary>Fewest cells in any layer of the mesh chosen for an accuracy.</summary>
    public const int MinimumCellsPerLayerForAccuracy = 4;

    /// <summary>
    /// The step tolerance of a case file's explicit cell count (<c>numerics.cells</c>) that gives neither an accuracy
    /// nor a tolerance (docs/case-format.md, <c>$.numerics.cells</c>).
    /// </summary>
    public const double CellCountRelativeTolerance = 1e-6;

    /// <summary>The numerics of every case that names none: the mesh and tolerance for <see cref="DefaultAccuracy"/>.</summary>
    public static NumericsSettings Default { get; } = ForAccuracy(DefaultAccuracy);

    /// <summary>The mesh and solver settings for a target relative accuracy within [<see cref="FinestAccuracy"/>, <see cref="CoarsestAccuracy"/>].</summary>
    public static NumericsSettings ForAccuracy(double accuracy)
    {
        var width = WidthPerDiffusionLengthAtOneInTenThousand * Math.Sqrt(accuracy / 1e-4);
        var tolerance = ToleranceOverTarget * accuracy * Math.Min(1, Math.Sqrt(accuracy / 1e-4));
        return new NumericsSettings(
            new DiffusionLengthMesh(width, MinimumCellsPerLayerForAccuracy),
            new SolverOptions { RelativeTolerance = Math.Min(1e-2, tolerance) });
    }

    /// <summary>
    /// A fixed mesh of <paramref name="totalCells"/> cells shared among the layers, at the step tolerance given
    /// (for convergence studies and checks that must not depend on the mesh the accuracy would choose).
    /// </summary>
    public static NumericsSettings FixedCells(int totalCells, double relativeTolerance) =>
        new(new CellCountMesh(totalCells), new SolverOptions { RelativeTolerance = relativeTolerance });

    /// <summary>Lists every setting outside its admissible range, as (setting, message) pairs.</summary>
    public IEnumerable<(string Setting, string Message)> Problems() => Grid.Problems().Concat(Solver.Problems());
}
