namespace Layers.Core.Domain;

/// <summary>
/// A mesh whose cells are sized by what each layer's profile can do in the run rather than by its thickness: the
/// cells at the edges of a layer where something crosses (interfaces, open faces) are a fraction f of the layer's
/// diffusion length sqrt(D t) at the earliest time to resolve, and grow by 1 + f toward the middle (a width
/// proportional to the distance from the edge, as the self-similar early profile needs at every later time), up to
/// the layer's thickness over its minimum cell count. A layer that diffusion crosses many times over the run gets
/// few cells; a slow, thick layer gets small cells at its edges and a few wide ones where nothing arrives.
/// The settings only; Discretization/DiffusionLengthCells places the cells by them.
/// </summary>
/// <param name="WidthPerDiffusionLength">
/// Cell width over the distance from the nearer edge (or over the early diffusion length, whichever is larger) in the
/// layer that can exchange the most; coarser in proportion to 1/sqrt(share) in a layer that exchanges a smaller share.
/// </param>
/// <param name="MinimumCellsPerLayer">Fewest cells in a layer; also caps the widest cell at thickness / this.</param>
public sealed record DiffusionLengthMesh(
    double WidthPerDiffusionLength,
    int MinimumCellsPerLayer) : GridOptions
{
    /// <summary>Fewest cells in a layer; also caps the widest cell at thickness / this. Admissible 4 to 10 000.</summary>
    public override int MinimumCellsPerLayer { get; init; } = MinimumCellsPerLayer;

    /// <summary>
    /// Coarsest width per diffusion length, however little a layer exchanges: 0.35 as chosen for an accuracy, scaled
    /// with the width when the mesh is coarsened or refined for an error estimate.
    /// </summary>
    public double CoarsestWidthPerDiffusionLength { get; init; } = 0.35;

    /// <inheritdoc/>
    public override T Match<T>(Func<DiffusionLengthMesh, T> byDiffusionLength, Func<CellCountMesh, T> byCellCount)
    {
        ArgumentNullException.ThrowIfNull(byDiffusionLength);
        return byDiffusionLength(this);
    }

    /// <inheritdoc/>
    public override IEnumerable<(string Setting, string Message)> Problems()
    {
        // The width comes from an accuracy, checked where it is read.
        if (MinimumCellsPerLayer is < 4 or > 10_000)
        {
            yield return ("minimumCellsPerLayer", $"must be from 4 to 10000; got {MinimumCellsPerLayer}");
        }
    }
}
