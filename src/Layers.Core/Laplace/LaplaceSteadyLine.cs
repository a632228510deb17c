using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// The long-time line of the amount received by a face medium, Q(t) → J (t - t_lag), read from the transform's
/// behaviour at small s (Q(s) = J / s^2 - J t_lag / s + O(1)); exact, not fitted to the inverted curve.
/// </summary>
/// <param name="Side">The receiving face.</param>
/// <param name="FluxKgPerSquareMeterSecond">Steady flux J into the medium, kg/(m2 s).</param>
/// <param name="LagTimeSeconds">Intercept of the line on the time axis, s (negative for a burst, e.g. a loaded stack).</param>
public sealed record LaplaceSteadyLine(Side Side, double FluxKgPerSquareMeterSecond, double LagTimeSeconds);
