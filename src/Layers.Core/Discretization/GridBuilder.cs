using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// Builds the mesh: cells are shared among layers (half in proportion to thickness, half equally, so a thin but
/// slow layer is not starved), every layer gets at least the minimum, and inside each layer the widths grow
/// geometrically from both edges toward the middle.
/// </summary>
public static class GridBuilder
{
    /// <summary>Builds the mesh for a stack.</summary>
    public static Grid Build(LayerStack stack, GridOptions options)
    {
        var counts = CellsPerLayer(stack, options);
        var widths = new List<double>();
        var owners = new List<int>();
        for (var layer = 0; layer < stack.Count; layer++)
        {
            var layerWidths = GradedWidths(stack.Layers[layer].ThicknessMeters, counts[layer], options);
            widths.AddRange(layerWidths);
            owners.AddRange(Enumerable.Repeat(layer, layerWidths.Length));
        }

        return new Grid(widths.ToArray(), owners.ToArray(), stack.Count);
    }

    /// <summary>Number of cells given to each layer.</summary>
    public static int[] CellsPerLayer(LayerStack stack, GridOptions options)
    {
        var total = stack.TotalThicknessMeters;
        var counts = new int[stack.Count];
        for (var layer = 0; layer < stack.Count; layer++)
        {
            var share = (0.5 * stack.Layers[layer].ThicknessMeters / total) + (0.5 / stack.Count);
            counts[layer] = Math.Max(options.MinimumCellsPerLayer, (int)Math.Round(share * options.TotalCells));
        }

        return counts;
    }

    /// <summary>
    /// Widths of <paramref name="cellCount"/> cells over a thickness, symmetric, smallest at both edges, neighbours
    /// in the grading ratio (reduced if needed so the widest cell is at most the maximum width ratio times the
    /// narrowest). A smooth geometric grading keeps the cell-centred scheme second-order accurate.
    /// </summary>
    public static double[] GradedWidths(double thicknessMeters, int cellCount, GridOptions options)
    {
        var half = (cellCount + 1) / 2;
        var ratio = options.GradingRatio;
        if (half > 1)
        {
            ratio = Math.Min(ratio, Math.Pow(options.MaximumWidthRatio, 1.0 / (half - 1)));
        }

        var relative = new double[cellCount];
        for (var i = 0; i < cellCount; i++)
        {
            var fromNearestEdge = Math.Min(i, cellCount - 1 - i);
            relative[i] = Math.Pow(ratio, fromNearestEdge);
        }

        var scale = thicknessMeters / relative.Sum();
        return relative.Select(width => width * scale).ToArray();
    }
}
