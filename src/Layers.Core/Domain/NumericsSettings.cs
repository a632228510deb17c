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

    /// <summary>
    /// The negligible floor of a case that names none and has no detection limit to go by, as a fraction of the
    /// largest content of the run (docs/numerics.md, "The accuracy promise").
    /// </summary>
    public const double NegligibleFractionOfContent = 1e-9;

    /// <summary>
    /// The negligible floor of a food-contact case that names none, as a fraction of its detection limit in the food.
    /// </summary>
    public const double NegligibleFractionOfDetectionLimit = 1e-3;

    /// <summary>Fewest cells in any layer of the mesh chosen for an accuracy.</summary>
    public const int MinimumCellsPerLayerForAccuracy = 4;

    /// <summary>
    /// The step tolerance of a case file's explicit cell count (<c>numerics.cells</c>) that gives neither an accuracy
    /// nor a tolerance (docs/case-format.md, <c>$.numerics.cells</c>).
    /// </summary>
    public const double CellCountRelativeTolerance = 1e-6;

    /// <summary>
    /// The relative accuracy promised for every key figure above the negligible floor, against its own value; the
    /// error estimate of a run is judged against it.
    /// </summary>
    public double Accuracy { get; init; } = DefaultAccuracy;

    /// <summary>
    /// Amounts below this, kg/m2, count as negligible (and concentrations, fluxes below what such an amount makes);
    /// null for the default (<see cref="NegligibleFractionOfContent"/>, or
    /// <see cref="NegligibleFractionOfDetectionLimit"/> for a food-contact case).
    /// </summary>
    public double? NegligibleAmountPerArea { get; init; }

    /// <summary>
    /// What the run does about its numerical error; by default, estimate and refine on a mesh chosen for an accuracy,
    /// estimate only on an explicit cell count (which fixes the mesh).
    /// </summary>
    public ErrorControl ErrorControl { get; init; } = Grid is CellCountMesh ? ErrorControl.EstimateOnly : ErrorControl.EstimateAndRefine;

    /// <summary>
    /// Which method solves the case: by default the exact method where it applies (<see cref="SolutionMethod.Auto"/>);
    /// a fixed mesh (<see cref="FixedCells"/>) asks for the finite volumes.
    /// </summary>
    public SolutionMethod Method { get; init; } = SolutionMethod.Auto;

    /// <summary>The numerics of every case that names none: the mesh and tolerance for <see cref="DefaultAccuracy"/>.</summary>
    public static NumericsSettings Default { get; } = ForAccuracy(DefaultAccuracy);

    /// <summary>The mesh and solver settings for a target relative accuracy within [<see cref="FinestAccuracy"/>, <see cref="CoarsestAccuracy"/>].</summary>
    public static NumericsSettings ForAccuracy(double accuracy)
    {
        var width = WidthPerDiffusionLengthAtOneInTenThousand * Math.Sqrt(accuracy / 1e-4);
        var tolerance = ToleranceOverTarget * accuracy * Math.Min(1, Math.Sqrt(accuracy / 1e-4));
        return new NumericsSettings(
            new DiffusionLengthMesh(width, MinimumCellsPerLayerForAccuracy),
            new SolverOptions { RelativeTolerance = Math.Min(1e-2, tolerance) })
        {
            Accuracy = accuracy,
        };
    }

    /// <summary>
    /// The same numerics with every error source scaled by about <paramref name="errorFactor"/> (4: twice as coarse;
    /// 1/4: twice as fine): cell widths and the minimum cell count by its square root (space error goes as width^2),
    /// the step tolerance by its 3/2 power (the global error of TR-BDF2 under local error control goes as tolerance^(2/3)).
    /// The mesh keeps its kind; the promise is unchanged.
    /// </summary>
    public NumericsSettings Scaled(double errorFactor)
    {
        var widthFactor = Math.Sqrt(errorFactor);
        int Count(int cells, int fewest) => Math.Max(fewest, (int)Math.Round(cells / widthFactor));
        var grid = Grid.Match<GridOptions>(
            mesh => mesh with
            {
                WidthPerDiffusionLength = mesh.WidthPerDiffusionLength * widthFactor,
                CoarsestWidthPerDiffusionLength = mesh.CoarsestWidthPerDiffusionLength * widthFactor,
                MinimumCellsPerLayer = Count(mesh.MinimumCellsPerLayer, 2),
            },
            count => count with
            {
                TotalCells = Count(count.TotalCells, 4),
                MinimumCellsPerLayer = Count(count.MinimumCellsPerLayer, 2),
            });
        return this with
        {
            Grid = grid,
            Solver = Solver with
            {
                RelativeTolerance = Solver.RelativeTolerance * Math.Pow(errorFactor, 1.5),
                RelativeToleranceAfterEnd = Solver.RelativeToleranceAfterEnd * Math.Pow(errorFactor, 1.5),
            },
        };
    }

    /// <summary>
    /// A fixed mesh of <paramref name="totalCells"/> cells shared among the layers, at the step tolerance given
    /// (for convergence studies and checks that must not depend on the mesh the accuracy would choose).
    /// </summary>
    public static NumericsSettings FixedCells(int totalCells, double relativeTolerance) =>
        new(new CellCountMesh(totalCells), new SolverOptions { RelativeTolerance = relativeTolerance })
        {
            ErrorControl = ErrorControl.None,
            Method = SolutionMethod.FiniteVolume,
        };

    /// <summary>Lists every setting outside its admissible range, as (setting, message) pairs.</summary>
    public IEnumerable<(string Setting, string Message)> Problems() => Grid.Problems().Concat(Solver.Problems());
}
