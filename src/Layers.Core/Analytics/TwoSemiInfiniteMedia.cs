using MathNet.Numerics;

namespace Layers.Core.Analytics;

/// <summary>
/// Two semi-infinite media in contact at x = 0: medium 1 (x &lt; 0, diffusivity D1) starts at uniform
/// concentration C0, medium 2 (x &gt; 0, diffusivity D2) starts empty; at the interface c1 = K c2 with
/// K = c1 / c2 at equilibrium, and the flux is continuous.
/// </summary>
/// <remarks>
/// <para>
/// The composite-media problem of Crank (1975), The Mathematics of Diffusion, 2nd ed., ch. 3 (infinite and
/// semi-infinite media; the subsection on composite media with a partition factor, section and equation numbers
/// from memory), and the heat-conduction analogue of two semi-infinite solids in contact in Carslaw and Jaeger
/// (1959), Conduction of Heat in Solids, 2nd ed., ch. 2 (section 2.15, from memory). Assumptions: constant
/// D1 and D2, instantaneous equilibrium at the interface, no film resistance.
/// </para>
/// <para>
/// Derivation: try c2 = A erfc(x / (2 sqrt(D2 t))) and c1 = C0 - B erfc(-x / (2 sqrt(D1 t))), each a similarity
/// solution of its own diffusion equation meeting its initial and far-field conditions. At x = 0 both erfc
/// equal 1, so c1 = K c2 gives C0 - B = K A, and the gradients there are -A / sqrt(pi D2 t) and
/// -B / sqrt(pi D1 t), so D1 dc1/dx = D2 dc2/dx gives B sqrt(D1) = A sqrt(D2). Hence
/// B = A sqrt(D2 / D1) and A = C0 / (K + sqrt(D2 / D1)): the interface concentrations are constant in time.
/// The mass per unit area gained by medium 2 is the integral of c2 over x &gt; 0, A * 2 sqrt(D2 t / pi), using
/// the integral of erfc from 0 to infinity, 1 / sqrt(pi); medium 1 loses B * 2 sqrt(D1 t / pi), the same amount.
/// </para>
/// </remarks>
public static class TwoSemiInfiniteMedia
{
    /// <summary>
    /// Concentration at position x and time t: c1 = C0 - B erfc(-x / (2 sqrt(D1 t))) for x &lt; 0 and
    /// c2 = A erfc(x / (2 sqrt(D2 t))) for x &gt;= 0, with A = C0 / (K + sqrt(D2 / D1)) and B = A sqrt(D2 / D1)
    /// (composite media, Crank 1975, ch. 3, and Carslaw and Jaeger 1959, ch. 2; numbers from memory).
    /// At x = 0 the medium-2 side is returned; at t = 0 the initial condition is returned.
    /// </summary>
    /// <param name="d1">Diffusivity D1 of medium 1 (x &lt; 0), m2/s.</param>
    /// <param name="d2">Diffusivity D2 of medium 2 (x &gt; 0), m2/s.</param>
    /// <param name="partitionCoefficient">K = c1 / c2 at equilibrium, dimensionless.</param>
    /// <param name="initialConcentration1">Uniform initial concentration C0 of medium 1, kg/m3.</param>
    /// <param name="positionMeters">Position x, negative in medium 1, m.</param>
    /// <param name="timeSeconds">Time since contact, s.</param>
    /// <returns>Concentration on the side of the interface that x lies in, kg/m3.</returns>
    public static double Concentration(
        double d1,
        double d2,
        double partitionCoefficient,
        double initialConcentration1,
        double positionMeters,
        double timeSeconds)
    {
        double a = InterfaceConcentration2(d1, d2, partitionCoefficient, initialConcentration1);
        AnalyticArguments.RequireFinite(positionMeters);
        AnalyticArguments.RequireNonNegative(timeSeconds);
        if (positionMeters < 0)
        {
            // erfc(+infinity) = 0 recovers the initial condition at t = 0.
            double b = a * Math.Sqrt(d2 / d1);
            double depth = -positionMeters / (2 * Math.Sqrt(d1 * timeSeconds));
            return initialConcentration1 - b * SpecialFunctions.Erfc(depth);
        }

        if (timeSeconds == 0)
        {
            return 0;
        }

        return a * SpecialFunctions.Erfc(positionMeters / (2 * Math.Sqrt(d2 * timeSeconds)));
    }

    /// <summary>
    /// Mass per unit interface area that has entered medium 2 by time t: A * 2 sqrt(D2 t / pi), with
    /// A = C0 / (K + sqrt(D2 / D1)) (integral of the composite-media profile; see the class remarks).
    /// </summary>
    /// <param name="d1">Diffusivity D1 of medium 1, m2/s.</param>
    /// <param name="d2">Diffusivity D2 of medium 2, m2/s.</param>
    /// <param name="partitionCoefficient">K = c1 / c2 at equilibrium, dimensionless.</param>
    /// <param name="initialConcentration1">Uniform initial concentration C0 of medium 1, kg/m3.</param>
    /// <param name="timeSeconds">Time since contact, s.</param>
    /// <returns>Transferred mass per unit area, kg/m2.</returns>
    public static double MassPerAreaTransferred(
        double d1,
        double d2,
        double partitionCoefficient,
        double initialConcentration1,
        double timeSeconds)
    {
        double a = InterfaceConcentration2(d1, d2, partitionCoefficient, initialConcentration1);
        AnalyticArguments.RequireNonNegative(timeSeconds);
        return a * 2 * Math.Sqrt(d2 * timeSeconds / Math.PI);
    }

    // A, the medium-2 interface concentration, which stays constant for t > 0.
    private static double InterfaceConcentration2(
        double d1,
        double d2,
        double partitionCoefficient,
        double initialConcentration1)
    {
        AnalyticArguments.RequirePositive(d1);
        AnalyticArguments.RequirePositive(d2);
        AnalyticArguments.RequirePositive(partitionCoefficient);
        AnalyticArguments.RequireNonNegative(initialConcentration1);
        return initialConcentration1 / (partitionCoefficient + Math.Sqrt(d2 / d1));
    }
}
