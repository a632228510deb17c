namespace Layers.Core.Discretization;

/// <summary>
/// What the cells on one side of a face say about u on it: the flux they send out through the face is
/// (<see cref="Value"/> - u_face) / <see cref="Resistance"/>. From one cell (a straight line from its centre, the
/// two-point law the system is assembled with) Value is the cell's u and Resistance its half-cell resistance: the face
/// value is then off by about (h^2 / 8) u''. From the two cells nearest the face in the same layer, a quadratic through
/// both with the slope at the face free, the error falls to O(h^3): at a closed face, where the slope is zero, the
/// value is that of the quadratic with zero slope, (x2^2 u1 - x1^2 u2) / (x2^2 - x1^2), x the distances of the
/// centres from the face ((9 u1 - u2) / 8 on a uniform mesh).
/// </summary>
/// <param name="Value">u the cells extrapolate to at the face when no flux crosses it.</param>
/// <param name="Resistance">Resistance of the cells' side to a flux through the face, s/m.</param>
public readonly record struct CellSide(double Value, double Resistance)
{
    /// <summary>
    /// The side from the nearest cell (u1, width h1, half-cell resistance) and, when it lies in the same layer, the
    /// next one (u2, width h2; null otherwise). The layer's D K is the same in both, h1 / (2 R_half).
    /// </summary>
    /// <remarks>
    /// With u = u_f + p x + q x^2 through the two centres at distances x1 = h1/2 and x2 = h1 + h2/2, the outward slope
    /// is p = (x1 + x2) / (x1 x2) u_f - (x2^2 u1 - x1^2 u2) / (x1 x2 (x2 - x1)), and the flux D K p gives the two
    /// numbers. Where that extrapolation crosses zero while the nearest cell does not (a front that has barely reached
    /// the face), the quadratic is not a sensible reconstruction and the straight line is used.
    /// </remarks>
    public static CellSide From(double nearestValue, double nearestWidthMeters, double nearestHalfResistance, double? nextValue, double nextWidthMeters)
    {
        var linear = new CellSide(nearestValue, nearestHalfResistance);
        if (nextValue is not { } next)
        {
            return linear;
        }

        var x1 = 0.5 * nearestWidthMeters;
        var x2 = nearestWidthMeters + (0.5 * nextWidthMeters);
        var value = ((x2 * x2 * nearestValue) - (x1 * x1 * next)) / ((x2 * x2) - (x1 * x1));
        if ((value < 0 && nearestValue >= 0) || (value > 0 && nearestValue <= 0))
        {
            return linear;
        }

        // D K = x1 / R_half, so the resistance x1 x2 / (D K (x1 + x2)) is R_half x2 / (x1 + x2).
        return new CellSide(value, nearestHalfResistance * x2 / (x1 + x2));
    }
}
