using Layers.Core.Analytics;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Analytics;

public sealed class PlaneSheetIntoLimitedVolumeTests
{
    private const double Diffusivity = 1e-10;
    private const double ThicknessMeters = 1e-3;

    // L^2 / D: multiplying a dimensionless time D t / L^2 by it gives seconds.
    private const double DiffusionTimeSeconds = ThicknessMeters * ThicknessMeters / Diffusivity;

    [Theory]
    [InlineData(1e-3)]
    [InlineData(0.1)]
    [InlineData(1.0)]
    [InlineData(10.0)]
    [InlineData(1e3)]
    public void Roots_satisfy_tan_q_equals_minus_alpha_q_and_lie_in_their_intervals(double alpha)
    {
        double[] roots = PlaneSheetIntoLimitedVolume.Roots(alpha, 2000);

        Assert.Equal(2000, roots.Length);
        for (int i = 0; i < roots.Length; i++)
        {
            int n = i + 1;
            double q = roots[i];

            // Crank (1975), ch. 4, eq. 4.37 (from memory): q_n is the n-th positive root of tan q = -alpha q,
            // which lies where tan q < 0, in ((n - 1/2) pi, n pi).
            Assert.InRange(q, (n - 0.5) * Math.PI, n * Math.PI);

            // The same equation times cos q / sqrt(1 + alpha^2 q^2): tan q + alpha q itself is ill-conditioned
            // near the poles of tan, where the roots sit for large alpha; this form is the sine of the angle by
            // which q misses the root, so it measures the root's own error. Above q ~ 2000 a double cannot
            // resolve 1e-12, so there four units in the last place of q are allowed instead.
            double residual = (Math.Sin(q) + alpha * q * Math.Cos(q)) / Math.Sqrt(1 + alpha * alpha * q * q);
            double tolerance = Math.Max(1e-12, 4 * (Math.BitIncrement(q) - q));
            Tolerance.Absolute(0, residual, tolerance, "normalised residual of tan q = -alpha q");
        }
    }

    [Fact]
    public void Roots_for_alpha_one_match_the_published_roots_of_tan_q_equals_minus_q()
    {
        double[] roots = PlaneSheetIntoLimitedVolume.Roots(1.0, 4);

        // Abramowitz and Stegun (1964), Handbook of Mathematical Functions, ch. 4, table of solutions of
        // tan x = lambda x, at lambda = -1 (table number and values from memory, to the four decimals quoted).
        Tolerance.Absolute(2.0288, roots[0], 1e-4, "q_1");
        Tolerance.Absolute(4.9132, roots[1], 1e-4, "q_2");
        Tolerance.Absolute(7.9787, roots[2], 1e-4, "q_3");
        Tolerance.Absolute(11.0855, roots[3], 1e-4, "q_4");
    }

    [Fact]
    public void Roots_move_to_the_sink_values_as_alpha_grows()
    {
        double[] roots = PlaneSheetIntoLimitedVolume.Roots(1e9, 10);
        for (int i = 0; i < roots.Length; i++)
        {
            // Crank (1975), ch. 4, eq. 4.37 (from memory): as alpha tends to infinity tan q = -alpha q is met at
            // the poles (n - 1/2) pi, the eigenvalues of the sink problem, eq. 4.18 with (2n+1) pi / 2.
            Tolerance.Absolute((i + 0.5) * Math.PI, roots[i], 1e-8, "root at alpha = 1e9");
        }
    }

    [Theory]
    [InlineData(1e-3)]
    [InlineData(0.1)]
    [InlineData(1.0)]
    [InlineData(10.0)]
    [InlineData(1e3)]
    public void Series_and_short_time_forms_agree_where_both_hold(double alpha)
    {
        foreach (double tau in new[] { 0.001, 0.003, 0.01, 0.02 })
        {
            double series = PlaneSheetIntoLimitedVolume.FractionSeries(alpha, tau);
            double shortTime = PlaneSheetIntoLimitedVolume.FractionShortTime(alpha, tau);

            // Crank (1975), ch. 4, eq. 4.37 against eq. 4.38 (both from memory): the short-time form neglects
            // terms of order exp(-1/tau) < 1e-21 here.
            Tolerance.Absolute(series, shortTime, 1e-12, "eq. 4.37 against eq. 4.38");
        }
    }

    [Theory]
    [InlineData(0.003)]
    [InlineData(0.05)]
    [InlineData(0.3)]
    [InlineData(1.0)]
    public void Very_large_alpha_approaches_the_sink_solution(double tau)
    {
        double timeSeconds = tau * DiffusionTimeSeconds;
        double limitedVolume = PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(
            Diffusivity, ThicknessMeters, 1e6, timeSeconds);
        double sink = PlaneSheetIntoSink.FractionReleased(Diffusivity, ThicknessMeters, timeSeconds);

        // Crank (1975), ch. 4: eq. 4.37 tends to eq. 4.18 as alpha tends to infinity (from memory); the gap is
        // of order 1/alpha.
        Tolerance.Absolute(sink, limitedVolume, 1e-5, "alpha = 1e6 against the sink");
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(20.0)]
    public void Early_uptake_follows_the_square_root_law_scaled_by_one_plus_alpha_over_alpha(double alpha)
    {
        foreach (double tau in new[] { 1e-10, 1e-8 })
        {
            double fraction = PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(
                Diffusivity, ThicknessMeters, alpha, tau * DiffusionTimeSeconds);
            double leadingTerm = (1 + alpha) / alpha * 2 * Math.Sqrt(tau / Math.PI);

            // Crank (1975), ch. 4, eq. 4.20 leading term, rescaled from M_inf = C0 L to alpha / (1 + alpha) C0 L:
            // while the solution is nearly empty the sheet sees a sink. The relative gap is about
            // sqrt(pi tau) / (2 alpha), the next term of eq. 4.38 (from memory).
            double gap = Math.Sqrt(Math.PI * tau) / (2 * alpha);
            Tolerance.Relative(leadingTerm, fraction, 1.1 * gap, "early uptake");
        }
    }

    [Theory]
    [InlineData(1e2)]
    [InlineData(1e3)]
    [InlineData(1e5)]
    public void Series_alone_reproduces_the_early_square_root_law(double alpha)
    {
        const double tau = 1e-3;
        double series = PlaneSheetIntoLimitedVolume.FractionSeries(alpha, tau);
        double shortTime = (1 + alpha) / alpha * 2 * Math.Sqrt(tau / Math.PI);

        // Crank (1975), ch. 4, eq. 4.37 (from memory) summed at an early time, against eq. 4.20's leading term
        // scaled by (1 + alpha) / alpha, with the gap bounded by the next term of eq. 4.38 (from memory).
        double gap = Math.Sqrt(Math.PI * tau) / (2 * alpha);
        Tolerance.Relative(shortTime, series, 1.1 * gap, "eq. 4.37 at tau = 1e-3");
    }

    [Theory]
    [InlineData(1e-3, 0.7)]
    [InlineData(2e-4, 3.0)]
    [InlineData(5e-2, 0.05)]
    public void Transferred_mass_tends_to_the_equilibrium_share_alpha_over_one_plus_alpha(
        double solutionVolumePerArea, double partitionCoefficient)
    {
        const double initialConcentration = 40.0;
        double mass = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            Diffusivity,
            ThicknessMeters,
            initialConcentration,
            solutionVolumePerArea,
            partitionCoefficient,
            60 * DiffusionTimeSeconds);

        // Mass balance C0 L = c_sheet L + c_solution V/A with c_sheet = K c_solution (Crank 1975, ch. 4, the
        // M_inf of eq. 4.37, from memory): the solution ends with C0 L (V/A) / (K L + V/A) = C0 L alpha/(1+alpha).
        double equilibrium = initialConcentration * ThicknessMeters * solutionVolumePerArea
            / (partitionCoefficient * ThicknessMeters + solutionVolumePerArea);
        Tolerance.Relative(equilibrium, mass, 1e-12, "mass in solution after 60 L^2/D");
    }

    [Theory]
    [InlineData(1e-3)]
    [InlineData(1.0)]
    [InlineData(1e3)]
    public void Fraction_starts_at_zero_and_rises_monotonically_through_the_switch(double alpha)
    {
        // Crank (1975), ch. 4, eq. 4.37 (from memory): M_t/M_inf = 0 at t = 0, increasing towards 1.
        Assert.Equal(0, PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(Diffusivity, ThicknessMeters, alpha, 0));
        double previous = 0;
        for (double tau = 1e-7; tau < 30; tau *= 1.2)
        {
            double fraction = PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(
                Diffusivity, ThicknessMeters, alpha, tau * DiffusionTimeSeconds);
            Assert.True(fraction >= previous, FormattableString.Invariant($"fraction must not fall at tau = {tau:R}"));
            Assert.True(fraction <= 1, FormattableString.Invariant($"fraction must not exceed 1 at tau = {tau:R}"));
            previous = fraction;
        }

        Tolerance.Absolute(1, previous, 1e-15, "fraction at tau = 30");
    }

    [Fact]
    public void Invalid_arguments_are_rejected()
    {
        Assert.Empty(PlaneSheetIntoLimitedVolume.Roots(1, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => PlaneSheetIntoLimitedVolume.Roots(0, 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => PlaneSheetIntoLimitedVolume.Roots(1, -1));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(Diffusivity, ThicknessMeters, 1, -1));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => PlaneSheetIntoLimitedVolume.TransferredMassPerArea(Diffusivity, ThicknessMeters, 1, 1e-3, 0, 1));
    }
}
