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
}
