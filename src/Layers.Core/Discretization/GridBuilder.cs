using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// Builds the mesh: cells are shared among layers (half in proportion to thickness, half equally, so a thin but
/// slow layer is not starved), every layer gets at least the minimum, and inside each layer the widths grow
/// geometrically from both edges toward the middle.
/// </summary>
public static class GridBuilder
{
    /// <summary>
    /// Builds the mesh of a case: by diffusion lengths when its mesh settings ask for it
    /// (<see cref="GridOptions.ByDiffusionLength"/>, with the earliest report time and the duration of the case and
    /// small cells only at the edges where something crosses), else by the shared cell count.
    /// </summary>
    public static Grid Build(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (simulation.Grid.ByDiffusionLength is not { } mesh)
        {
            return Build(simulation.Stack, simulation.Grid);
        }

        var stack = simulation.Stack;
        var leftOpen = simulation.Left is not ClosedFace;
        var rightOpen = simulation.Right is not ClosedFace;
        var earliestReport = simulation.ReportTimesSeconds.Where(time => time > 0).DefaultIfEmpty(simulation.DurationSeconds).Min();
        var earliest = DiffusionLengthCells.EarliestResolvedPerReportTime * earliestReport;
        var shares = DiffusionLengthCells.Shares(stack, leftOpen, rightOpen, simulation.DurationSeconds);
        return Assemble(stack, layer => mesh.Widths(
            stack.Layers[layer].ThicknessMeters,
            stack.Layers[layer].DiffusivitySquareMetersPerSecond,
            shares[layer],
            earliest,
            layer > 0 || leftOpen,
            layer < stack.Count - 1 || rightOpen));
    }

    /// <summary>Builds the mesh for a stack by the shared cell count of <paramref name="options"/>.</summary>
    public static Grid Build(LayerStack stack, GridOptions options)
    {
        ArgumentNullException.ThrowIfNull(stack);
        ArgumentNullException.ThrowIfNull(options);
        var counts = CellsPerLayer(stack, options);
        return Assemble(stack, layer =>
        {
            var edge = options.ResolvedFromSeconds is { } early
                ? EdgeWidthPerDiffusionLength * Math.Sqrt(stack.Layers[layer].DiffusivitySquareMetersPerSecond * early)
                : double.PositiveInfinity;
            return GradedWidths(stack.Layers[layer].ThicknessMeters, counts[layer], options, edge);
        });
    }

    private static Grid Assemble(LayerStack stack, Func<int, double[]> widthsOfLayer)
    {
        var widths = new List<double>();
        var owners = new List<int>();
        for (var layer = 0; layer < stack.Count; layer++)
        {
            var layerWidths = widthsOfLayer(layer);
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

    /// <summary>Widest edge cell, as a fraction of the diffusion length at <see cref="GridOptions.ResolvedFromSeconds"/>.</summary>
    public const double EdgeWidthPerDiffusionLength = 0.25;

    /// <summary>
    /// Steepest grading used to reach that edge width (a bound that keeps the grading smooth; common practice, no
    /// source).
    /// </summary>
    public const double SteepestGradingRatio = 1.3;

    /// <summary>
    /// Widths of <paramref name="cellCount"/> cells over a thickness, symmetric, smallest at both edges, neighbours
    /// in the grading ratio (reduced if needed so the widest cell is at most the maximum width ratio times the
    /// narrowest; raised, up to <see cref="SteepestGradingRatio"/>, when the edge cells would be wider than
    /// <paramref name="edgeWidthMeters"/>). A smooth geometric grading keeps the cell-centred scheme second-order
    /// accurate.
    /// </summary>
    public static double[] GradedWidths(double thicknessMeters, int cellCount, GridOptions options, double edgeWidthMeters = double.PositiveInfinity)
    {
        ArgumentNullException.ThrowIfNull(options);
        var half = (cellCount + 1) / 2;
        var ratio = options.GradingRatio;
        if (half > 1)
        {
            ratio = Math.Min(ratio, Math.Pow(options.MaximumWidthRatio, 1.0 / (half - 1)));
        }

        if (half > 1 && EdgeWidth(thicknessMeters, cellCount, ratio) > edgeWidthMeters)
        {
            // The edge width falls as the ratio grows; bisect for the ratio that meets it, or take the steepest.
            var low = ratio;
            var high = Math.Max(ratio, SteepestGradingRatio);
            if (EdgeWidth(thicknessMeters, cellCount, high) > edgeWidthMeters)
            {
                low = high;
            }

            for (var i = 0; i < 50 && high - low > 1e-6; i++)
            {
                var middle = 0.5 * (low + high);
                (low, high) = EdgeWidth(thicknessMeters, cellCount, middle) > edgeWidthMeters ? (middle, high) : (low, middle);
            }

            ratio = high;
        }

        var relative = RelativeWidths(cellCount, ratio);
        var scale = thicknessMeters / relative.Sum();
        return relative.Select(width => width * scale).ToArray();
    }

    private static double EdgeWidth(double thicknessMeters, int cellCount, double ratio)
        => thicknessMeters / RelativeWidths(cellCount, ratio).Sum();

    private static double[] RelativeWidths(int cellCount, double ratio)
    {
        var relative = new double[cellCount];
        for (var i = 0; i < cellCount; i++)
        {
            var fromNearestEdge = Math.Min(i, cellCount - 1 - i);
            relative[i] = Math.Pow(ratio, fromNearestEdge);
        }

        return relative;
    }
}
