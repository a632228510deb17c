using MathNet.Numerics;

namespace Layers.Core.Analytics;

/// <summary>
/// Release from a plane sheet of thickness L, initially at uniform concentration C0, whose face x = 0 is
/// impermeable and whose face x = L is held at zero concentration (a perfect sink).
/// </summary>
/// <remarks>
/// <para>
/// By symmetry this is one half of a sheet -l &lt; x &lt; l of thickness 2l = 2L with both faces held at zero,
/// the case solved in Crank (1975), The Mathematics of Diffusion, 2nd ed., ch. 4, section 4.3 (eqs. 4.17 to 4.20),
/// taken with l = L, surface concentration C1 = 0, and x measured from the mid-plane, which is our impermeable
/// face. Assumptions: constant diffusivity D, no reaction, uniform initial concentration, sink fixed for t &gt; 0.
/// </para>
/// <para>
/// Long-time (Fourier) forms, Crank eqs. 4.17 and 4.18, with tau = D t / L^2:
/// C/C0 = (4/pi) sum_{n&gt;=0} (-1)^n / (2n+1) exp(-(2n+1)^2 pi^2 tau / 4) cos((2n+1) pi x / (2L)) and
/// M_t/M_inf = 1 - sum_{n&gt;=0} 8 / ((2n+1)^2 pi^2) exp(-(2n+1)^2 pi^2 tau / 4).
/// </para>
/// <para>
/// Short-time (error-function) forms, Crank eqs. 4.19 and 4.20:
/// C/C0 = 1 - sum_{n&gt;=0} (-1)^n [erfc(((2n+1) L - x) / (2 sqrt(D t))) + erfc(((2n+1) L + x) / (2 sqrt(D t)))]
/// and M_t/M_inf = 2 sqrt(tau) [pi^(-1/2) + 2 sum_{n&gt;=1} (-1)^n i erfc(n / sqrt(tau))]; the argument
/// n l / sqrt(D t) of eq. 4.20 becomes n / sqrt(tau) because l = L.
/// </para>
/// <para>
/// Both pairs are exact. The short-time forms are used for tau &lt; 0.1 and the long-time forms otherwise, so
/// each series needs about a dozen terms at most and neither loses digits to cancellation.
/// Truncation rule: terms are added until a bound on the magnitude of the last term added falls below 1e-16 of
/// the accumulated sum (fractions) or of the initial concentration (profiles). The exponential and
/// error-function factors fall faster than geometrically, and the alternating series have decreasing terms, so
/// the neglected tail is smaller than that last term.
/// </para>
/// </remarks>
public static class PlaneSheetIntoSink
{
    /// <summary>Dimensionless time D t / L^2 below which the short-time forms are evaluated.</summary>
    internal const double ShortTimeLimit = 0.1;

    private const double RelativeTolerance = 1e-16;

    /// <summary>
    /// Fraction of the initial content that has left through the sink face, M_t/M_inf (Crank 1975, ch. 4,
    /// eq. 4.18 for D t / L^2 &gt;= 0.1, eq. 4.20 below).
    /// </summary>
    /// <param name="diffusivity">Diffusion coefficient D in the sheet, m2/s.</param>
    /// <param name="thicknessMeters">Sheet thickness L, from the impermeable face to the sink face, m.</param>
    /// <param name="timeSeconds">Time since the sink was applied, s.</param>
    /// <returns>M_t/M_inf, between 0 (t = 0) and 1 (t to infinity).</returns>
    public static double FractionReleased(double diffusivity, double thicknessMeters, double timeSeconds)
    {
        double tau = DimensionlessTime(diffusivity, thicknessMeters, timeSeconds);
        if (tau == 0)
        {
            return 0;
        }

        return tau < ShortTimeLimit ? FractionReleasedShortTime(tau) : FractionReleasedLongTime(tau);
    }

    /// <summary>
    /// Concentration c(x, t) inside the sheet (Crank 1975, ch. 4, eq. 4.17 for D t / L^2 &gt;= 0.1, eq. 4.19
    /// below, with x measured from the impermeable face). At t = 0 the initial concentration is returned at
    /// every position, the sink value applying only for t &gt; 0.
    /// </summary>
    /// <param name="diffusivity">Diffusion coefficient D in the sheet, m2/s.</param>
    /// <param name="thicknessMeters">Sheet thickness L, m.</param>
    /// <param name="initialConcentration">Uniform initial concentration C0, kg/m3.</param>
    /// <param name="positionMeters">Distance x from the impermeable face, 0 &lt;= x &lt;= L, m.</param>
    /// <param name="timeSeconds">Time since the sink was applied, s.</param>
    /// <returns>c(x, t), kg/m3.</returns>
    public static double Concentration(
        double diffusivity,
        double thicknessMeters,
        double initialConcentration,
        double positionMeters,
        double timeSeconds)
    {
        double tau = DimensionlessTime(diffusivity, thicknessMeters, timeSeconds);
        AnalyticArguments.RequireNonNegative(initialConcentration);
        AnalyticArguments.RequireFinite(positionMeters);
        if (positionMeters < 0 || positionMeters > thicknessMeters)
        {
            throw new ArgumentOutOfRangeException(
                nameof(positionMeters), positionMeters, "Must lie between 0 and the sheet thickness.");
        }

        if (tau == 0)
        {
            return initialConcentration;
        }

        double xi = positionMeters / thicknessMeters;
        double scaled = tau < ShortTimeLimit ? ProfileShortTime(xi, tau) : ProfileLongTime(xi, tau);
        return initialConcentration * scaled;
    }

    /// <summary>Crank eq. 4.18 as a function of tau = D t / L^2 &gt; 0.</summary>
    internal static double FractionReleasedLongTime(double tau)
    {
        double remaining = 0;
        for (int n = 0; ; n++)
        {
            double m = 2 * n + 1;
            double term = 8 / (m * m * Math.PI * Math.PI) * Math.Exp(-m * m * Math.PI * Math.PI * tau / 4);
            remaining += term;
            if (term <= RelativeTolerance * remaining)
            {
                return 1 - remaining;
            }
        }
    }

    /// <summary>Crank eq. 4.20 with l = L as a function of tau = D t / L^2 &gt; 0.</summary>
    internal static double FractionReleasedShortTime(double tau)
    {
        double inverseRootTau = 1 / Math.Sqrt(tau);
        double bracket = Constants.InvSqrtPi;
        for (int n = 1; ; n++)
        {
            double term = 2 * ErrorFunctionIntegrals.IntegralErfc(n * inverseRootTau);
            bracket += n % 2 == 0 ? term : -term;
            if (term <= RelativeTolerance * bracket)
            {
                return 2 * Math.Sqrt(tau) * bracket;
            }
        }
    }

    /// <summary>Crank eq. 4.17 as c/C0 at xi = x/L and tau = D t / L^2 &gt; 0.</summary>
    internal static double ProfileLongTime(double xi, double tau)
    {
        double sum = 0;
        for (int n = 0; ; n++)
        {
            double m = 2 * n + 1;
            double bound = 4 / (Math.PI * m) * Math.Exp(-m * m * Math.PI * Math.PI * tau / 4);
            double term = bound * Math.Cos(m * Math.PI * xi / 2);
            sum += n % 2 == 0 ? term : -term;
            if (bound <= RelativeTolerance)
            {
                return sum;
            }
        }
    }

    /// <summary>Crank eq. 4.19 with C1 = 0 as c/C0 at xi = x/L and tau = D t / L^2 &gt; 0.</summary>
    internal static double ProfileShortTime(double xi, double tau)
    {
        double twoRootTau = 2 * Math.Sqrt(tau);
        double sum = 0;
        for (int n = 0; ; n++)
        {
            double m = 2 * n + 1;
            double pair = SpecialFunctions.Erfc((m - xi) / twoRootTau) + SpecialFunctions.Erfc((m + xi) / twoRootTau);
            sum += n % 2 == 0 ? pair : -pair;
            if (pair <= RelativeTolerance)
            {
                return 1 - sum;
            }
        }
    }

    private static double DimensionlessTime(double diffusivity, double thicknessMeters, double timeSeconds)
    {
        AnalyticArguments.RequirePositive(diffusivity);
        AnalyticArguments.RequirePositive(thicknessMeters);
        AnalyticArguments.RequireNonNegative(timeSeconds);
        return diffusivity * timeSeconds / (thicknessMeters * thicknessMeters);
    }
}
