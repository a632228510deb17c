namespace Layers.Core.Domain;

/// <summary>Mesh settings. Defaults reach 0.1 % relative error on the verification cases.</summary>
public sealed record GridOptions
{
    /// <summary>Target total number of cells over the stack. Default 240; admissible 8 to 200 000.</summary>
    public int TotalCells { get; init; } = 240;

    /// <summary>Minimum number of cells in every layer, however thin. Default 12; admissible 4 to 10 000.</summary>
    public int MinimumCellsPerLayer { get; init; } = 12;

    /// <summary>
    /// Ratio between neighbouring cell widths inside a layer, cells being smallest at both edges of the layer
    /// (interfaces and faces, where steep gradients live at early times). Default 1.08; admissible 1 to 1.5.
    /// </summary>
    public double GradingRatio { get; init; } = 1.08;

    /// <summary>Largest allowed ratio between the widest and the narrowest cell of one layer. Default 20.</summary>
    public double MaximumWidthRatio { get; init; } = 20;

    /// <summary>
    /// The earliest time whose profiles the mesh must resolve at the edges of every layer, s, or null (default) for
    /// the plain grading. When set, the cells at both edges of a layer are made no wider than
    /// <c>Discretization.GridBuilder.EdgeWidthPerDiffusionLength</c> times the diffusion length sqrt(D t) of that layer at this
    /// time, by raising the grading ratio up to <c>Discretization.GridBuilder.SteepestGradingRatio</c> (the width-ratio cap
    /// then does not apply): a slow layer next to a fast one, or a layer with a large partition coefficient that takes
    /// up much from its neighbour, gets its cells where its steep early profile lies.
    /// </summary>
    public double? ResolvedFromSeconds { get; init; }

    /// <summary>
    /// Cells placed by each layer's diffusion lengths instead of shared out by <see cref="TotalCells"/>, or null (the
    /// default) for the shared count. See <see cref="DiffusionLengthMesh"/>.
    /// </summary>
    public DiffusionLengthMesh? ByDiffusionLength { get; init; }

    /// <summary>Lists every setting outside its admissible range, as (setting, message) pairs.</summary>
    public IEnumerable<(string Setting, string Message)> Problems()
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
