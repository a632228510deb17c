using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// Builds the mesh of a case from its numerics setting: cells by each layer's diffusion lengths
/// (<see cref="DiffusionLengthMesh"/>), or an explicit count shared among layers (half in proportion to thickness,
/// half equally, so a thin but slow layer is not starved), every layer getting at least the minimum, the widths inside
/// each layer growing geometrically from both edges toward the middle (<see cref="CellCountMesh"/>).
/// </summary>
public static class GridBuilder
{
    /// <summary>
    /// Builds the mesh of a case as its numerics setting asks: by diffusion lengths (with the earliest report time and
    /// the duration of the case, small cells only at the edges where something crosses), or by the shared cell count.
    /// </summary>
    public static Grid Build(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        return simulation.Numerics.Grid.Match(
            mesh => Build(simulation, mesh),
            count => Build(simulation.Stack, count));
    }

    private static Grid Build(SimulationCase simulation, DiffusionLengthMesh mesh)
    {
        var stack = simulation.Stack;
        var leftOpen = simulation.Left.IsOpen;
        var rightOpen = simulation.Right.IsOpen;
        var earliestReport = simulation.ReportTimesSeconds.Where(time => time > 0).DefaultIfEmpty(simulation.DurationSeconds).Min();
        var earliest = DiffusionLengthCells.EarliestResolvedPerReportTime * Math.Min(earliestReport, DetectionEstimateSeconds(simulation));
        var shares = DiffusionLengthCells.Shares(stack, leftOpen, rightOpen, simulation.DurationSeconds);
        return Assemble(stack, layer => mesh.Widths(
            stack.Layers[layer].ThicknessMeters,
            stack.Layers[layer].DiffusivitySquareMetersPerSecond,
            shares[layer],
            earliest,
            layer > 0 || leftOpen,
            layer < stack.Count - 1 || rightOpen));
    }

    /// <summary>
    /// For food contact, an early estimate of when the food reaches its detection limit, a time the run reports and so
    /// must resolve however far before the first report time it falls; +infinity when no estimate applies. When the
    /// layer touching the food is loaded, it releases at first as a semi-infinite sheet into a sink, M(t) =
    /// 2 C0 sqrt(D t / pi) (Crank, The Mathematics of Diffusion, 2nd ed. 1975, ch. 4, eq. 4.18 at short times, from
    /// memory), and the food holds M(t) once M(t) = limit x density x (V/A): a film or a partition that slows the
    /// release only moves the crossing later, so the estimate errs toward finer cells. A loaded layer behind a barrier
    /// reaches the food after a lag the report times already cover.
    /// </summary>
    private static double DetectionEstimateSeconds(SimulationCase simulation)
    {
        if (simulation.FoodContact is not { } food || simulation.Face(food.FoodSide) is not CompartmentFace compartment)
        {
            return double.PositiveInfinity;
        }

        var touching = food.FoodSide == Side.Right ? simulation.Stack.Layers[^1] : simulation.Stack.Layers[0];
        var density = compartment.DensityKgPerCubicMeter ?? FoodContactSettings.DefaultFoodDensity;
        var toReach = ((food.DetectionLimit * density) - compartment.InitialConcentrationKgPerCubicMeter) * compartment.VolumePerAreaMeters;
        if (touching.InitialConcentrationKgPerCubicMeter <= 0 || toReach <= 0)
        {
            return double.PositiveInfinity;
        }

        var ratio = toReach / (2 * touching.InitialConcentrationKgPerCubicMeter);
        return Math.Max(Math.PI * ratio * ratio / touching.DiffusivitySquareMetersPerSecond, EarliestDetectionResolved * simulation.DurationSeconds);
    }

    /// <summary>
    /// The earliest detection time the mesh is made to resolve, as a fraction of the run: cells fine enough for earlier
    /// ones relax in steps the run's clock cannot tell apart late in a long run (a step below 1e-14 of the time is given
    /// up), as after a renewal empties the food.
    /// </summary>
    public const double EarliestDetectionResolved = 1e-8;

    /// <summary>Builds the mesh for a stack by the shared cell count of <paramref name="options"/>.</summary>
    public static Grid Build(LayerStack stack, CellCountMesh options)
    {
        ArgumentNullException.ThrowIfNull(stack);
        ArgumentNullException.ThrowIfNull(options);
        var counts = CellsPerLayer(stack, options);
        return Assemble(stack, layer => GradedWidths(stack.Layers[layer].ThicknessMeters, counts[layer], options));
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
    public static int[] CellsPerLayer(LayerStack stack, CellCountMesh options)
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
    public static double[] GradedWidths(double thicknessMeters, int cellCount, CellCountMesh options)
    {
        ArgumentNullException.ThrowIfNull(options);
        var half = (cellCount + 1) / 2;
        var ratio = options.GradingRatio;
        if (half > 1)
        {
            ratio = Math.Min(ratio, Math.Pow(options.MaximumWidthRatio, 1.0 / (half - 1)));
        }

        var relative = RelativeWidths(cellCount, ratio);
        var scale = thicknessMeters / relative.Sum();
        return relative.Select(width => width * scale).ToArray();
    }

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
