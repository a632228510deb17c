using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>The exact solution's integral quantities at one time.</summary>
/// <param name="TimeSeconds">Time, s.</param>
/// <param name="LayerMassPerArea">Mass per unit area held by each layer, kg/m2.</param>
/// <param name="FluxAtInterfaces">
/// Flux in +x (left to right) at each face and interface, kg/(m2 s): index 0 is the left face, index i the interface
/// after layer i-1, the last the right face (N + 1 values); NaN at t = 0, where the flux is singular.
/// </param>
/// <param name="ContinuousValueAtInterfaces">u = c / K at the same N + 1 places, kg/m3; NaN at t = 0.</param>
/// <param name="Left">The left face medium, or null for a closed face.</param>
/// <param name="Right">The right face medium, or null for a closed face.</param>
public sealed record LaplaceSnapshot(
    double TimeSeconds,
    IReadOnlyList<double> LayerMassPerArea,
    IReadOnlyList<double> FluxAtInterfaces,
    IReadOnlyList<double> ContinuousValueAtInterfaces,
    LaplaceFaceValues? Left,
    LaplaceFaceValues? Right)
{
    /// <summary>Mass per unit area held by all layers, kg/m2.</summary>
    public double StackMassPerArea => LayerMassPerArea.Sum();

    /// <summary>The face medium on a side, or null for a closed face.</summary>
    public LaplaceFaceValues? Face(Side side) => side == Side.Left ? Left : Right;
}
