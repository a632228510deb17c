namespace Layers.Core.Results;

/// <summary>
/// The concentration at named depths, read from the profiles of one report time: the parabola through the three
/// nearest points of the layer's profile (cell centres, and the face values at its ends, which the face models and the
/// interface reconstruction gave the profile), so second order within a layer and nothing recomputed here.
/// </summary>
public static class DepthReadings
{
    /// <summary>
    /// A depth closer to a layer's edge than this fraction of the stack's thickness is on that edge: depths are read
    /// in units and edges are sums of thicknesses, so "on an interface" must allow round-off.
    /// </summary>
    public const double OnEdgeRelative = 1e-9;

    /// <summary>
    /// The readings at each depth, in the order given: one per depth inside a layer, two for a depth on an interface
    /// (the left layer's, then the right layer's: the partition jump leaves two values there). A depth outside the
    /// stack gives none (the case reader refuses it).
    /// </summary>
    /// <param name="profiles">The profiles of one report time, one per layer, left to right.</param>
    /// <param name="depthsMeters">Depths from the left face of the stack, m.</param>
    public static IReadOnlyList<DepthReading> Read(IReadOnlyList<LayerProfile> profiles, IReadOnlyList<double> depthsMeters)
    {
        ArgumentNullException.ThrowIfNull(profiles);
        ArgumentNullException.ThrowIfNull(depthsMeters);
        if (depthsMeters.Count == 0 || profiles.Count == 0)
        {
            return [];
        }

        var total = profiles[^1].PositionsMeters[^1] - profiles[0].PositionsMeters[0];
        var slack = OnEdgeRelative * total;
        var readings = new List<DepthReading>();
        foreach (var depth in depthsMeters)
        {
            foreach (var profile in profiles)
            {
                var positions = profile.PositionsMeters;
                if (depth >= positions[0] - slack && depth <= positions[^1] + slack)
                {
                    readings.Add(new DepthReading(depth, profile.LayerIndex, profile.LayerName, Interpolate(profile, depth)));
                }
            }
        }

        return readings;
    }

    /// <summary>Interpolation within one layer's profile; a depth a round-off beyond an end reads that end.</summary>
    private static double Interpolate(LayerProfile profile, double depth)
    {
        var positions = profile.PositionsMeters;
        var values = profile.ConcentrationsKgPerCubicMeter;
        if (depth <= positions[0])
        {
            return values[0];
        }

        if (depth >= positions[^1])
        {
            return values[^1];
        }

        // Bisection for the segment [positions[low], positions[low + 1]] that holds the depth.
        int low = 0, high = positions.Count - 1;
        while (high - low > 1)
        {
            var middle = (low + high) / 2;
            if (positions[middle] <= depth)
            {
                low = middle;
            }
            else
            {
                high = middle;
            }
        }

        // The parabola through the three profile points nearest the depth: its error is third order in the spacing, below
        // the second-order error of the values themselves, so the reading converges as cleanly as they do (a straight
        // line's error would change with where the depth falls between two points, from one mesh to the next).
        if (positions.Count < 3)
        {
            var weight = (depth - positions[low]) / (positions[high] - positions[low]);
            return values[low] + (weight * (values[high] - values[low]));
        }

        var first = Math.Clamp(depth - positions[low] < positions[high] - depth ? low - 1 : low, 0, positions.Count - 3);
        var (x0, x1, x2) = (positions[first], positions[first + 1], positions[first + 2]);
        return (values[first] * (depth - x1) * (depth - x2) / ((x0 - x1) * (x0 - x2)))
            + (values[first + 1] * (depth - x0) * (depth - x2) / ((x1 - x0) * (x1 - x2)))
            + (values[first + 2] * (depth - x0) * (depth - x1) / ((x2 - x0) * (x2 - x1)));
    }
}
