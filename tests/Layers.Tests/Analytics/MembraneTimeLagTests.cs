using Layers.Core.Analytics;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Analytics;

public sealed class MembraneTimeLagTests
{
    private const double Diffusivity = 3e-11;
    private const double ThicknessMeters = 2e-4;
    private const double PartitionCoefficient = 0.4;
    private const double DonorConcentration = 12.0;

    // L^2 / D: multiplying a dimensionless time D t / L^2 by it gives seconds.
    private const double DiffusionTimeSeconds = ThicknessMeters * ThicknessMeters / Diffusivity;

    [Theory]
    [InlineData(0.03)]
    [InlineData(0.1)]
    [InlineData(0.3)]
    [InlineData(1.0)]
    public void Long_and_short_time_forms_agree_where_both_converge(double tau)
    {
        double longTime = MembraneTimeLag.ScaledLongTime(tau);
        double shortTime = MembraneTimeLag.ScaledShortTime(tau);

        // Crank (1975), The Mathematics of Diffusion, ch. 4, eq. 4.24a (from memory), against its image-sum form
        // built with the method of images that Crank uses for eq. 4.19: two forms of one solution.
        Tolerance.Absolute(longTime, shortTime, 1e-15, "eq. 4.24a against the image sum");
    }

    [Theory]
    [InlineData(2.0)]
    [InlineData(5.0)]
    public void Approaches_the_Daynes_Barrer_asymptote_at_long_times(double tau)
    {
        double timeSeconds = tau * DiffusionTimeSeconds;
        double q = CumulativeAt(timeSeconds);
        double asymptote = Diffusivity * PartitionCoefficient * DonorConcentration / ThicknessMeters
            * (timeSeconds - ThicknessMeters * ThicknessMeters / (6 * Diffusivity));

        // Crank (1975), ch. 4, eq. 4.24b (from memory); Daynes (1920), Barrer (1939): the transient terms of
        // eq. 4.24a have fallen below exp(-pi^2 tau) < 3e-9 of L C1.
        Tolerance.Absolute(
            asymptote, q, 3e-9 * ThicknessMeters * PartitionCoefficient * DonorConcentration, "Q_t");
    }

    [Fact]
    public void Lag_time_and_steady_flux_are_the_intercept_and_slope_of_the_late_curve()
    {
        double t1 = 6 * DiffusionTimeSeconds;
        double t2 = 9 * DiffusionTimeSeconds;
        double q1 = CumulativeAt(t1);
        double q2 = CumulativeAt(t2);
        double slope = (q2 - q1) / (t2 - t1);
        double intercept = t1 - q1 / slope;

        // Crank (1975), ch. 4, eqs. 4.24b and 4.24c (from memory); Daynes (1920), Barrer (1939): the late
        // straight line has slope D C1 / L and meets the time axis at L^2 / (6 D).
        Tolerance.Relative(
            MembraneTimeLag.SteadyFluxKgPerSquareMeterSecond(
                Diffusivity, ThicknessMeters, PartitionCoefficient, DonorConcentration),
            slope,
            1e-12,
            "steady flux");
        Tolerance.Relative(
            MembraneTimeLag.LagTimeSeconds(Diffusivity, ThicknessMeters), intercept, 1e-10, "time lag");
    }

    [Fact]
    public void Nothing_has_passed_at_time_zero_and_almost_nothing_before_diffusion_crosses_the_membrane()
    {
        double scale = ThicknessMeters * PartitionCoefficient * DonorConcentration;

        // Crank (1975), ch. 4, eq. 4.24a (from memory): the membrane starts empty, so Q_0 = 0 exactly.
        Assert.Equal(0, CumulativeAt(0));

        // Crank (1975), ch. 4, eq. 4.24a: at D t / L^2 = 0.005 the front, depth ~ sqrt(D t) = L/14, has not
        // reached the far face; the first image term there is of order exp(-50) ~ 1e-22 of L C1.
        double early = CumulativeAt(0.005 * DiffusionTimeSeconds);
        Assert.InRange(early, double.Epsilon, 1e-20 * scale);
    }

    [Fact]
    public void Cumulative_mass_is_monotone_through_the_switch_between_forms()
    {
        // Crank (1975), ch. 4, eq. 4.24a (from memory): the outflux is positive, so Q_t increases.
        double previous = 0;
        for (double tau = 0.01; tau < 10; tau *= 1.1)
        {
            double q = CumulativeAt(tau * DiffusionTimeSeconds);
            Assert.True(q > previous, FormattableString.Invariant($"Q_t must increase at tau = {tau:R}"));
            previous = q;
        }
    }

    [Fact]
    public void Scaled_transient_vanishes_at_time_zero()
    {
        // Crank (1975), ch. 4, eq. 4.24a (from memory) at t = 0: -1/6 - (2/pi^2) sum (-1)^n / n^2 = 0 because
        // sum_{n>=1} (-1)^(n+1) / n^2 = pi^2 / 12 (Abramowitz and Stegun 1964, ch. 23, from memory). The
        // Fourier form cannot be summed at t = 0, so this checks its continuity: tiny tau gives nearly zero.
        Tolerance.Absolute(0, MembraneTimeLag.ScaledLongTime(1e-4), 1e-15, "eq. 4.24a near t = 0");
    }

    [Fact]
    public void Invalid_arguments_are_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(
            () => MembraneTimeLag.CumulativeMassPerArea(Diffusivity, ThicknessMeters, 0, DonorConcentration, 1));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => MembraneTimeLag.CumulativeMassPerArea(Diffusivity, ThicknessMeters, 1, -1, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => MembraneTimeLag.LagTimeSeconds(-1, ThicknessMeters));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => MembraneTimeLag.SteadyFluxKgPerSquareMeterSecond(Diffusivity, double.PositiveInfinity, 1, 1));
    }

    private static double CumulativeAt(double timeSeconds)
        => MembraneTimeLag.CumulativeMassPerArea(
            Diffusivity, ThicknessMeters, PartitionCoefficient, DonorConcentration, timeSeconds);
}
