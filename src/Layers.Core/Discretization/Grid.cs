namespace Layers.Core.Discretization;

/// <summary>
/// Cell-centred, non-uniform 1-D mesh over the stack. Faces sit exactly on layer interfaces, so every cell belongs
/// to exactly one layer and the partition jump falls on a face, never inside a cell.
/// </summary>
public sealed class Grid
{
    private readonly double[] _widths;
    private readonly double[] _centres;
    private readonly int[] _layerOfCell;
    private readonly int[] _firstCellOfLayer;

    internal Grid(double[] widths, int[] layerOfCell, int layerCount)
    {
        _widths = widths;
        _layerOfCell = layerOfCell;
        _centres = new double[widths.Length];
        _firstCellOfLayer = new int[layerCount + 1];
        var edge = 0.0;
        for (var i = 0; i < widths.Length; i++)
        {
            _centres[i] = edge + (0.5 * widths[i]);
            edge += widths[i];
        }

        for (var layer = 0; layer <= layerCount; layer++)
        {
            _firstCellOfLayer[layer] = Array.FindIndex(layerOfCell, owner => owner >= layer) is var index && index >= 0
                ? index
                : widths.Length;
        }
    }

    /// <summary>Number of cells.</summary>
    public int CellCount => _widths.Length;

    /// <summary>Width of each cell, m.</summary>
    public ReadOnlySpan<double> WidthsMeters => _widths;

    /// <summary>Centre of each cell measured from the left face, m.</summary>
    public ReadOnlySpan<double> CentresMeters => _centres;

    /// <summary>Index of the layer that owns each cell.</summary>
    public ReadOnlySpan<int> LayerOfCell => _layerOfCell;

    /// <summary>Index of the first cell of a layer.</summary>
    public int FirstCell(int layer) => _firstCellOfLayer[layer];

    /// <summary>Number of cells in a layer.</summary>
    public int CellsIn(int layer) => _firstCellOfLayer[layer + 1] - _firstCellOfLayer[layer];
}
