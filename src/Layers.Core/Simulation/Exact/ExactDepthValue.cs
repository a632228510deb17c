using Layers.Core.Laplace;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// The exact concentration of one named depth's reading: on its layer's edge the interface value of that side, as the
/// profiles' edge values are; inside the layer the inverted profile.
/// </summary>
internal static class ExactDepthValue
{
    /// <param name="reading">The reading (its depth and the layer it is read in).</param>
    /// <param name="layerEdgesMeters">Depths of that layer's left and right edges from the left face of the stack.</param>
    /// <param name="partitionCoefficient">The layer's K.</param>
    /// <param name="snapshot">The exact solution's integral quantities at the time, with u at every interface.</param>
    /// <param name="inside">The inverted concentration at the reading's depth, used when it is not on an edge.</param>
    /// <param name="slackMeters">How close to an edge a depth is on it.</param>
    public static double Of(
        DepthReading reading, (double Left, double Right) layerEdgesMeters, double partitionCoefficient, LaplaceSnapshot snapshot, double inside, double slackMeters)
        => Math.Abs(reading.DepthMeters - layerEdgesMeters.Left) <= slackMeters
            ? partitionCoefficient * snapshot.ContinuousValueAtInterfaces[reading.LayerIndex]
            : Math.Abs(reading.DepthMeters - layerEdgesMeters.Right) <= slackMeters
                ? partitionCoefficient * snapshot.ContinuousValueAtInterfaces[reading.LayerIndex + 1]
                : inside;
}
