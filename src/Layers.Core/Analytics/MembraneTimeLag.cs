namespace Layers.Core.Analytics;

/// <summary>
/// Permeation through an initially empty membrane of thickness L whose upstream face is held at
/// C1 = K C_donor and whose downstream face is held at zero (a sink): the Daynes-Barrer time-lag experiment.
/// </summary>
/// <remarks>
/// <para>
/// Assumptions: constant diffusivity D in the membrane, both faces switched on at t = 0 and then held fixed,
/// K = c_membrane / c_donor at equilibrium, donor concentration constant (an unlimited, well-stirred donor).
/// </para>
/// <para>
/// Long-time form, Crank (1975), The Mathematics of Diffusion, 2nd ed., ch. 4, section 4.3, eq. 4.24a (from
/// memory), after H. A. Daynes, Proc. R. Soc. Lond. A 97 (1920) 286, and R. M. Barrer, Trans. Faraday Soc. 35
/// (1939) 628 (volume and page numbers from memory), with tau = D t / L^2:
/// Q_t = L C1 [tau - 1/6 - (2/pi^2) sum_{n&gt;=1} (-1)^n / n^2 exp(-n^2 pi^2 tau)].
/// Its asymptote Q_t = (D C1 / L)(t - L^2 / (6 D)) gives the time lag L^2 / (6 D) (Crank eqs. 4.24b and 4.24c,
/// from memory).
/// </para>
/// <para>
/// Short-time form, derived here by the method of images that Crank (1975, ch. 4) uses for eq. 4.19: the
/// profile c/C1 = sum_{m&gt;=0} [erfc((2m L + x) / (2 sqrt(D t))) - erfc((2(m+1) L - x) / (2 sqrt(D t)))] meets
/// both face conditions and the initial condition, its outflux at x = L is
/// 2 C1 sqrt(D / (pi t)) sum_{m&gt;=0} exp(-(2m+1)^2 L^2 / (4 D t)), and integrating in time gives
/// Q_t = 4 C1 sqrt(D t) sum_{m&gt;=0} i erfc((2m+1) / (2 sqrt(tau))).
/// </para>
/// <para>
/// Precision: for small tau the long-time form is a difference of numbers of order 1/6 whose result is
/// exponentially small, so it carries an absolute error of about 1e-17 L C1 but no relative accuracy. The
/// short-time form has only positive terms, so it is used for tau &lt; 0.1 and keeps full relative accuracy down
/// to underflow; the long-time form is used from tau = 0.1 on, where at most two digits cancel. Either series is
/// summed until its last term falls below 1e-16 of the result's scale; its terms decay faster than geometrically.
/// </para>
/// </remarks>
public static class MembraneTimeLag
{
    /// <summary>Dimensionless time D t / L^2 below which the short-time form is evaluated.</summary>
    internal const double ShortTimeLimit = 0.1;

    private const double RelativeTolerance = 1e-16;

    /// <summary>
    /// Cumulative mass per unit area Q_t that has left the downstream face by time t (Crank 1975, ch. 4,
    /// eq. 4.24a, from memory, for D t / L^2 &gt;= 0.1; the image sum described on the class below that).
    /// </summary>
    /// <param name="diffusivity">Diffusion coefficient D in the membrane, m2/s.</param>
    /// <param name="thicknessMeters">Membrane thickness L, m.</param>
    /// <param name="partitionCoefficient">K = c_membrane / c_donor at equilibrium, dimensionless.</param>
    /// <param name="donorConcentration">Donor concentration C_donor, kg/m3.</param>
    /// <param name="timeSeconds">Time since the upstream face was loaded, s.</param>
    /// <returns>Q_t, kg/m2.</returns>
    public static double CumulativeMassPerArea(
        double diffusivity,
        double thicknessMeters,
        double partitionCoefficient,
        double donorConcentration,
        double timeSeconds)
    {
        AnalyticArguments.RequirePositive(diffusivity);
        AnalyticArguments.RequirePositive(thicknessMeters);
        AnalyticArguments.RequirePositive(partitionCoefficient);
        AnalyticArguments.RequireNonNegative(donorConcentration);
        AnalyticArguments.RequireNonNegative(timeSeconds);
        double tau = diffusivity * timeSeconds / (thicknessMeters * thicknessMeters);
        if (tau == 0)
        {
            return 0;
        }

        double upstreamConcentration = partitionCoefficient * donorConcentration;
        double scaled = tau < ShortTimeLimit ? ScaledShortTime(tau) : ScaledLongTime(tau);
        return thicknessMeters * upstreamConcentration * scaled;
    }

    /// <summary>
    /// Daynes-Barrer time lag L^2 / (6 D), the intercept of the steady asymptote of Q_t on the time axis
    /// (Crank 1975, ch. 4, eq. 4.24c, from memory).
    /// </summary>
    /// <param name="diffusivity">Diffusion coefficient D in the membrane, m2/s.</param>
    /// <param name="thicknessMeters">Membrane thickness L, m.</param>
    /// <returns>Time lag, s.</returns>
    public static double LagTimeSeconds(double diffusivity, double thicknessMeters)
    {
        AnalyticArguments.RequirePositive(diffusivity);
        AnalyticArguments.RequirePositive(thicknessMeters);
        return thicknessMeters * thicknessMeters / (6 * diffusivity);
    }

    /// <summary>
    /// Steady permeation flux D K C_donor / L (Fick's first law across the membrane; Crank 1975, ch. 4).
    /// </summary>
    /// <param name="diffusivity">Diffusion coefficient D in the membrane, m2/s.</param>
    /// <param name="thicknessMeters">Membrane thickness L, m.</param>
    /// <param name="partitionCoefficient">K = c_membrane / c_donor at equilibrium, dimensionless.</param>
    /// <param name="donorConcentration">Donor concentration C_donor, kg/m3.</param>
    /// <returns>Steady flux, kg/(m2 s).</returns>
    public static double SteadyFluxKgPerSquareMeterSecond(
        double diffusivity,
        double thicknessMeters,
        double partitionCoefficient,
        double donorConcentration)
    {
        AnalyticArguments.RequirePositive(diffusivity);
        AnalyticArguments.RequirePositive(thicknessMeters);
        AnalyticArguments.RequirePositive(partitionCoefficient);
        AnalyticArguments.RequireNonNegative(donorConcentration);
        return diffusivity * partitionCoefficient * donorConcentration / thicknessMeters;
    }

    /// <summary>Q_t / (L C1) from Crank eq. 4.24a (from memory) at tau = D t / L^2 &gt; 0.</summary>
    internal static double ScaledLongTime(double tau)
    {
        double scale = tau + 1.0 / 6.0;
        double series = 0;
        for (int n = 1; ; n++)
        {
            double magnitude = 2 / (Math.PI * Math.PI * n * n) * Math.Exp(-n * n * Math.PI * Math.PI * tau);
            series += n % 2 == 0 ? magnitude : -magnitude;
            if (magnitude <= RelativeTolerance * scale)
            {
                return tau - 1.0 / 6.0 - series;
            }
        }
    }

    /// <summary>Q_t / (L C1) from the image sum at tau = D t / L^2 &gt; 0.</summary>
    internal static double ScaledShortTime(double tau)
    {
        double twoRootTau = 2 * Math.Sqrt(tau);
        double sum = 0;
        for (int m = 0; ; m++)
        {
            double term = ErrorFunctionIntegrals.IntegralErfc((2 * m + 1) / twoRootTau);
            sum += term;
            if (term <= RelativeTolerance * sum)
            {
                return 2 * twoRootTau * sum;
            }
        }
    }
}
