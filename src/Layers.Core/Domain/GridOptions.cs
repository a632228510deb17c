namespace Layers.Core.Domain;

/// <summary>
/// How the mesh is chosen: one of two kinds, so a setting is never half of one and half of the other. Cells placed by
/// each layer's diffusion lengths for a target accuracy (<see cref="DiffusionLengthMesh"/>, the default of every
/// case), or an explicit cell count shared among the layers (<see cref="CellCountMesh"/>).
/// </summary>
public abstract record GridOptions
{
    // Only the two kinds below derive from it.
    private protected GridOptions()
    {
    }

    /// <summary>Fewest cells in every layer, however thin.</summary>
    public abstract int MinimumCellsPerLayer { get; init; }

    /// <summary>Lists every setting outside its admissible range, as (setting, message) pairs.</summary>
    public abstract IEnumerable<(string Setting, string Message)> Problems();

    /// <summary>
    /// The one way to tell the kinds apart: each kind calls its own arm. A switch with a fallback arm would let a new
    /// kind build and fail at run time; a new kind here adds an arm, so every use fails to build until it handles it.
    /// </summary>
    /// <param name="byDiffusionLength">What to do with a <see cref="DiffusionLengthMesh"/>.</param>
    /// <param name="byCellCount">What to do with a <see cref="CellCountMesh"/>.</param>
    public abstract T Match<T>(Func<DiffusionLengthMesh, T> byDiffusionLength, Func<CellCountMesh, T> byCellCount);
}
