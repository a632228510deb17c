namespace Layers.Core.Domain;

/// <summary>
/// An explicit cell count shared among the layers (half in proportion to thickness, half equally, so a thin but slow
/// layer is not starved), every layer getting at least <see cref="MinimumCellsPerLayer"/>, the widths inside a layer
/// growing geometrically from both edges toward the middle. For a fixed mesh: convergence studies, the numbers a test
/// or a benchmark needs to hold still, and a case file's <c>numerics.cells</c>.
/// </summary>
/// <param name="TotalCells">Target total number of cells over the stack; admissible 8 to 200 000.</param>
public sealed record CellCountMesh(int TotalCells) : GridOptions
{
    /// <summary>The fewest cells per layer a case file's <c>numerics.cells</c> gets unless it says otherwise.</summary>
    public const int DefaultMinimumCellsPerLayer = 12;

    /// <summary>Minimum number of cells in every layer, however thin. Default 12; admissible 4 to 10 000.</summary>
    public override int MinimumCellsPerLayer { get; init; } = DefaultMinimumCellsPerLayer;

    /// <summary>
    /// Ratio between neighbouring cell widths inside a layer, cells being smallest at both edges of the layer
    /// (interfaces and faces, where steep gradients live at early times). Default 1.08; admissible 1 to 1.5.
    /// </summary>
    public double GradingRatio { get; init; } = 1.08;

    /// <summary>Largest allowed ratio between the widest and the narrowest cell of one layer. Default 20.</summary>
    public double MaximumWidthRatio { get; init; } = 20;

    /// <inheritdoc/>
    public override T Match<T>(Func<DiffusionLengthMesh, T> byDiffusionLength, Func<CellCountMesh, T> byCellCount)
    {
        ArgumentNullException.ThrowIfNull(byCellCount);
        return byCellCount(this);
    }

    /// <inheritdoc/>
    public override IEnumerable<(string Setting, string Message)> Problems()
    {
        if (TotalCells is < 8 or > 200_000)
        {
            yield return ("cells", $"must be from 8 to 200000; got {TotalCells}");
        }

        if (MinimumCellsPerLayer is < 4 or > 10_000)
        {
            yield return ("minimumCellsPerLayer", $"must be from 4 to 10000; got {MinimumCellsPerLayer}");
        }

        if (!(GradingRatio >= 1 && GradingRatio <= 1.5))
        {
            yield return ("gradingRatio", $"must be from 1 to 1.5; got {GradingRatio}");
        }
    }
}
