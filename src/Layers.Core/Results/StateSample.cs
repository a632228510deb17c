namespace Layers.Core.Results;

/// <summary>The integral quantities of the solution at one output time.</summary>
/// <param name="TimeSeconds">Time, s.</param>
/// <param name="LayerMassPerArea">Mass per unit area held by each layer, kg/m2.</param>
/// <param name="Left">The left face medium, or null when the left face is closed.</param>
/// <param name="Right">The right face medium, or null when the right face is closed.</param>
/// <param name="FractionOfFinalState">
/// 1 - (sum of |m - m_final| over all nodes) / (the same at t = 0): how far the whole system has gone toward its
/// equilibrium (closed systems) or steady state (with baths); NaN (not applicable) when it starts there, to round-off.
/// </param>
/// <param name="MassBalanceError">
/// (mass now - mass at t = 0 - mass received from baths) / reference mass, where the reference is the larger of the
/// initial mass and the mass exchanged with baths.
/// </param>
public sealed record StateSample(
    double TimeSeconds,
    IReadOnlyList<double> LayerMassPerArea,
    FaceSample? Left,
    FaceSample? Right,
    double FractionOfFinalState,
    double MassBalanceError);
