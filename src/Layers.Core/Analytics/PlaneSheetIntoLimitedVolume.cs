namespace Layers.Core.Analytics;

/// <summary>
/// Release from a plane sheet of thickness L into a well-stirred solution of limited volume: the face x = 0 is
/// impermeable, the face x = L touches the solution, the sheet starts at uniform concentration C0 and the
/// solution starts free of solute.
/// </summary>
/// <remarks>
/// <para>
/// Assumptions: constant diffusivity D in the sheet, the solution perfectly mixed (no film resistance), and
/// equilibrium at the face, c_sheet = K c_solution, with K = c_sheet / c_solution the partition coefficient.
/// With V/A the solution volume per unit face area, alpha = (V/A) / (K L) is the ratio of the solution's to the
/// sheet's final share of solute. A mass balance gives M_inf = C0 L alpha / (1 + alpha) per unit area.
/// </para>
/// <para>
/// Series form: Crank (1975), The Mathematics of Diffusion, 2nd ed., ch. 4, section 4.3 (the subsection on
/// diffusion from a stirred solution of limited volume; subsection number from memory), eq. 4.37 (from memory):
/// M_t/M_inf = 1 - sum_{n&gt;=1} 2 alpha (1 + alpha) / (1 + alpha + alpha^2 q_n^2) exp(-q_n^2 tau), tau = D t / L^2,
/// q_n the positive non-zero roots of tan q = -alpha q. Crank writes it for uptake by a sheet of thickness 2l
/// from solution on both sides; the eigenproblem for release from our half sheet is the same, since
/// cos(q x / L) exp(-q^2 tau) satisfies the face balance alpha L dc/dt = -D dc/dx only if tan q = -alpha q.
/// </para>
/// <para>
/// Short-time form, Crank (1975), ch. 4, eq. 4.38 (from memory):
/// M_t/M_inf = (1 + alpha) [1 - exp(tau / alpha^2) erfc(sqrt(tau) / alpha)]. It is exact for a semi-infinite
/// sheet (Laplace transform of the same problem with the impermeable face removed) and differs from the finite
/// sheet only by terms of order exp(-1/tau), below 1e-40 for tau &lt; 0.01, where it is therefore used. For
/// tau &gt;= 0.01 the series is summed root by root until the last term is below 1e-16 of the result; that needs
/// about twenty roots at tau = 0.01 and fewer later, far below the cap of 2000 roots.
/// </para>
/// </remarks>
public static class PlaneSheetIntoLimitedVolume
{
    /// <summary>Dimensionless time D t / L^2 below which the short-time form is evaluated.</summary>
    internal const double ShortTimeLimit = 0.01;

    private const double RelativeTolerance = 1e-16;
    private const int MaxRoots = 2000;
    private const int MaxNewtonIterations = 100;

    /// <summary>
    /// The first <paramref name="count"/> positive roots q_n of tan q = -alpha q (Crank 1975, ch. 4, eq. 4.37,
    /// from memory); q_n lies in ((n - 1/2) pi, n pi).
    /// </summary>
    /// <remarks>
    /// Solved as h(q) = q - n pi + atan(alpha q) = 0, which has the same root in that interval. h is increasing
    /// with slope between 1 and 1 + 1/pi and is concave, so Newton's method started at q = n pi converges
    /// monotonically for every alpha &gt; 0, and the root is as well conditioned as q itself.
    /// </remarks>
    /// <param name="alpha">alpha = (V/A) / (K L), greater than zero.</param>
    /// <param name="count">How many roots, zero or more.</param>
    /// <returns>q_1 &lt; q_2 &lt; ... &lt; q_count.</returns>
    public static double[] Roots(double alpha, int count)
    {
        AnalyticArguments.RequirePositive(alpha);
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        var roots = new double[count];
        for (int n = 1; n <= count; n++)
        {
            roots[n - 1] = Root(alpha, n);
        }

        return roots;
    }

    /// <summary>
    /// M_t/M_inf, the approach of the solution's content to equilibrium (Crank 1975, ch. 4, eq. 4.37 for
    /// D t / L^2 &gt;= 0.01, eq. 4.38 below; equation numbers from memory).
    /// </summary>
    /// <param name="diffusivity">Diffusion coefficient D in the sheet, m2/s.</param>
    /// <param name="thicknessMeters">Sheet thickness L, m.</param>
    /// <param name="alpha">alpha = (V/A) / (K L), greater than zero.</param>
    /// <param name="timeSeconds">Time since contact, s.</param>
    /// <returns>M_t/M_inf, between 0 (t = 0) and 1 (t to infinity).</returns>
    public static double FractionOfEquilibrium(
        double diffusivity,
        double thicknessMeters,
        double alpha,
        double timeSeconds)
    {
        AnalyticArguments.RequirePositive(diffusivity);
        AnalyticArguments.RequirePositive(thicknessMeters);
        AnalyticArguments.RequirePositive(alpha);
        AnalyticArguments.RequireNonNegative(timeSeconds);
        double tau = diffusivity * timeSeconds / (thicknessMeters * thicknessMeters);
        if (tau == 0)
        {
            return 0;
        }

        return tau < ShortTimeLimit ? FractionShortTime(alpha, tau) : FractionSeries(alpha, tau);
    }

    /// <summary>
    /// Mass per unit face area in the solution at time t: M_t = C0 L alpha / (1 + alpha) * M_t/M_inf, with
    /// alpha = (V/A) / (K L) (Crank 1975, ch. 4, eq. 4.37, from memory, and the mass balance for M_inf).
    /// </summary>
    /// <param name="diffusivity">Diffusion coefficient D in the sheet, m2/s.</param>
    /// <param name="thicknessMeters">Sheet thickness L, m.</param>
    /// <param name="initialConcentration">Uniform initial concentration C0 in the sheet, kg/m3.</param>
    /// <param name="solutionVolumePerArea">Solution volume per unit face area V/A, m3/m2 = m.</param>
    /// <param name="partitionCoefficient">K = c_sheet / c_solution at equilibrium, dimensionless.</param>
    /// <param name="timeSeconds">Time since contact, s.</param>
    /// <returns>Solute mass per unit face area in the solution, kg/m2.</returns>
    public static double TransferredMassPerArea(
        double diffusivity,
        double thicknessMeters,
        double initialConcentration,
        double solutionVolumePerArea,
        double partitionCoefficient,
        double timeSeconds)
    {
        AnalyticArguments.RequirePositive(thicknessMeters);
        AnalyticArguments.RequireNonNegative(initialConcentration);
        AnalyticArguments.RequirePositive(solutionVolumePerArea);
        AnalyticArguments.RequirePositive(partitionCoefficient);
        double alpha = solutionVolumePerArea / (partitionCoefficient * thicknessMeters);
        double equilibriumMassPerArea = initialConcentration * thicknessMeters * alpha / (1 + alpha);
        return equilibriumMassPerArea * FractionOfEquilibrium(diffusivity, thicknessMeters, alpha, timeSeconds);
    }

    /// <summary>The n-th positive root (n &gt;= 1) of tan q = -alpha q.</summary>
    internal static double Root(double alpha, int n)
    {
        double q = n * Math.PI;
        for (int iteration = 0; iteration < MaxNewtonIterations; iteration++)
        {
            double alphaQ = alpha * q;
            double h = q - n * Math.PI + Math.Atan(alphaQ);
            double step = h / (1 + alpha / (1 + alphaQ * alphaQ));
            q -= step;
            if (Math.Abs(step) <= 1e-15 * q)
            {
                break;
            }
        }

        return q;
    }

    /// <summary>Crank eq. 4.37 (from memory) at tau = D t / L^2 &gt; 0, summed over roots until negligible.</summary>
    internal static double FractionSeries(double alpha, double tau)
    {
        double remaining = 0;
        for (int n = 1; n <= MaxRoots; n++)
        {
            double q = Root(alpha, n);

            // 2 alpha (1 + alpha) / (1 + alpha + alpha^2 q^2), divided through by alpha so that alpha^2 cannot
            // overflow.
            double weight = 2 * (1 + alpha) / ((1 + alpha) / alpha + alpha * q * q);
            double term = weight * Math.Exp(-q * q * tau);
            remaining += term;
            if (term <= RelativeTolerance * (1 - remaining))
            {
                return 1 - remaining;
            }
        }

        throw new InvalidOperationException(string.Create(
            System.Globalization.CultureInfo.InvariantCulture,
            $"Limited-volume series did not converge within {MaxRoots} roots at D t / L^2 = {tau}."));
    }

    /// <summary>Crank eq. 4.38 (from memory) at tau = D t / L^2 &gt; 0; exact up to O(exp(-1/tau)).</summary>
    internal static double FractionShortTime(double alpha, double tau)
        => (1 + alpha) * ErrorFunctionIntegrals.OneMinusScaledErfc(Math.Sqrt(tau) / alpha);
}
