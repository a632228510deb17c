using Layers.Core.Analytics;

namespace Layers.Tests.TestSupport;

/// <summary>
/// The flux from a plane sheet, closed at x = 0, into a well-stirred solution of limited volume: the time derivative
/// of Crank's series for M_t (The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.37, from memory).
/// </summary>
internal static class LimitedVolumeFlux
{
    /// <summary>The flux into the solution, kg/(m2 s).</summary>
    /// <param name="diffusivity">D in the sheet, m2/s.</param>
    /// <param name="thickness">Sheet thickness L, m.</param>
    /// <param name="initialConcentration">Uniform initial concentration C0 in the sheet, kg/m3.</param>
    /// <param name="alpha">alpha = (V/A) / (K L).</param>
    /// <param name="time">Time since contact, s.</param>
    public static double Flux(double diffusivity, double thickness, double initialConcentration, double alpha, double time)
    {
        var roots = PlaneSheetIntoLimitedVolume.Roots(alpha, 400);
        var final = initialConcentration * thickness * alpha / (1 + alpha);
        var rate = diffusivity / (thickness * thickness);
        var tau = rate * time;
        return final * roots.Sum(q => 2 * alpha * (1 + alpha) / (1 + alpha + (alpha * alpha * q * q)) * (q * q * rate) * Math.Exp(-q * q * tau));
    }
}
