using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// Places the cells of a <see cref="DiffusionLengthMesh"/>: each layer's share of what the run can get wrong, and the
/// cell widths across one layer, smallest at the edges where something crosses and growing toward the middle.
/// </summary>
public static class DiffusionLengthCells
{
    /// <summary>
    /// The earliest time resolved, as a fraction of the earliest report time: an error made while the edge cells are
    /// still wider than the diffusion length decays only slowly, so the mesh resolves somewhat earlier than the first
    /// time reported (measured on the benchmark cases, docs/numerics.md).
    /// </summary>
    public const double EarliestResolvedPerReportTime = 0.2;

    /// <summary>
    /// Each layer's share of what the run can get wrong, 0 to 1, the larger of two: the mass it could take up or give
    /// off over the run (K times the largest initial value of u = c/K times the smaller of its thickness and its
    /// diffusion length at the end) over the initial mass of the stack; and its part of the series resistance
    /// R = L / (D K) of the layers that lie on a path between something loaded (a loaded layer or an open face) and
    /// an open face, because a layer that controls a flux sets the amount transferred however little it holds.
    /// With nothing loaded (a donor bath), mass shares are relative to the largest layer.
    /// </summary>
    /// <param name="stack">The layers.</param>
    /// <param name="leftFaceOpen">Whether the left face exchanges with a medium.</param>
    /// <param name="rightFaceOpen">Whether the right face exchanges with a medium.</param>
    /// <param name="latestSeconds">The end of the run, s.</param>
    public static double[] Shares(LayerStack stack, bool leftFaceOpen, bool rightFaceOpen, double latestSeconds)
    {
        ArgumentNullException.ThrowIfNull(stack);
        var layers = stack.Layers;
        var largestValue = layers.Max(layer => layer.InitialContinuousVariable);
        var capacities = layers
            .Select(layer => layer.PartitionCoefficient * Math.Min(layer.ThicknessMeters, Math.Sqrt(layer.DiffusivitySquareMetersPerSecond * latestSeconds)))
            .ToArray();
        var initialMass = layers.Sum(layer => layer.InitialMassPerArea);
        var reference = largestValue > 0 && initialMass > 0 ? initialMass / largestValue : capacities.Max();

        var onPath = new bool[layers.Count];
        for (var i = 0; i < layers.Count; i++)
        {
            var sourceLeft = leftFaceOpen || layers.Take(i + 1).Any(layer => layer.InitialMassPerArea > 0);
            var sourceRight = rightFaceOpen || layers.Skip(i).Any(layer => layer.InitialMassPerArea > 0);
            onPath[i] = (rightFaceOpen && sourceLeft) || (leftFaceOpen && sourceRight);
        }

        var pathResistance = layers.Where((_, i) => onPath[i]).Sum(layer => layer.ResistanceSecondsPerMeter);
        return [.. layers.Select((layer, i) => Math.Max(
            Math.Min(1, capacities[i] / reference),
            onPath[i] ? layer.ResistanceSecondsPerMeter / pathResistance : 0))];
    }

    /// <summary>
    /// The cell widths across one layer, m, summing to the thickness: smallest at each edge to be resolved, growing
    /// geometrically from there. An edge on a closed face needs no small cells: no flux crosses it, so no steep
    /// gradient forms there.
    /// </summary>
    /// <param name="mesh">The mesh settings.</param>
    /// <param name="thicknessMeters">The layer's thickness, m.</param>
    /// <param name="diffusivitySquareMetersPerSecond">The layer's diffusion coefficient, m2/s.</param>
    /// <param name="share">The layer's share from <see cref="Shares"/>.</param>
    /// <param name="earliestSeconds">The earliest time whose profile the edge cells resolve, s.</param>
    /// <param name="resolveStart">Whether the edge at the start of the layer gets small cells.</param>
    /// <param name="resolveEnd">Whether the edge at the end of the layer gets small cells.</param>
    public static double[] Widths(this DiffusionLengthMesh mesh, double thicknessMeters, double diffusivitySquareMetersPerSecond, double share, double earliestSeconds, bool resolveStart, bool resolveEnd)
    {
        var fraction = Math.Min(mesh.CoarsestWidthPerDiffusionLength, mesh.WidthPerDiffusionLength / Math.Sqrt(Math.Max(share, 1e-12)));
        var widest = thicknessMeters / mesh.MinimumCellsPerLayer;
        if (!resolveStart && !resolveEnd)
        {
            return Enumerable.Repeat(widest, mesh.MinimumCellsPerLayer).ToArray();
        }

        // The floor keeps the count finite (logarithmic in it) for extreme inputs.
        var edge = Math.Clamp(fraction * Math.Sqrt(diffusivitySquareMetersPerSecond * earliestSeconds), 1e-9 * thicknessMeters, widest);
        var growth = 1 + fraction;

        // From a resolved edge over half the layer (both edges resolved) or all of it (one): geometric growth up to
        // the widest cell, then constant.
        var reach = resolveStart && resolveEnd ? 0.5 * thicknessMeters : thicknessMeters;
        var graded = new List<double>();
        var covered = 0.0;
        var width = edge;
        while (covered < reach * (1 - 1e-12))
        {
            graded.Add(width);
            covered += width;
            width = Math.Min(width * growth, widest);
        }

        double[] widths;
        if (resolveStart && resolveEnd)
        {
            // The last cell overshoots the middle: mirror, sharing the middle cell when that fits better.
            var shareMiddle = graded.Count > 1 && Math.Abs((2 * covered) - graded[^1] - thicknessMeters) < Math.Abs((2 * covered) - thicknessMeters);
            var count = shareMiddle ? (2 * graded.Count) - 1 : 2 * graded.Count;
            widths = new double[count];
            for (var i = 0; i < graded.Count; i++)
            {
                widths[i] = graded[i];
                widths[count - 1 - i] = graded[i];
            }
        }
        else
        {
            widths = resolveStart ? [.. graded] : [.. Enumerable.Reverse(graded)];
        }

        // Scale to the thickness exactly (a change of less than one cell's width).
        var scale = thicknessMeters / widths.Sum();
        for (var i = 0; i < widths.Length; i++)
        {
            widths[i] *= scale;
        }

        return widths;
    }
}
