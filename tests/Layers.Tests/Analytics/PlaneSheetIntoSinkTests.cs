using Layers.Core.Analytics;
using MathNet.Numerics;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Analytics;

public sealed class PlaneSheetIntoSinkTests
{
    private const double Diffusivity = 1e-10;
    private const double ThicknessMeters = 1e-3;
    private const double InitialConcentration = 2.5;

    // L^2 / D: multiplying a dimensionless time D t / L^2 by it gives seconds.
    private const double DiffusionTimeSeconds = ThicknessMeters * ThicknessMeters / Diffusivity;

    [Theory]
    [InlineData(0.005)]
    [InlineData(0.02)]
    [InlineData(0.1)]
    [InlineData(0.3)]
    [InlineData(1.0)]
    public void Long_and_short_time_series_agree_where_both_converge(double tau)
    {
        double longTime = PlaneSheetIntoSink.FractionReleasedLongTime(tau);
        double shortTime = PlaneSheetIntoSink.FractionReleasedShortTime(tau);

        // Crank (1975), The Mathematics of Diffusion, ch. 4, eq. 4.18 and eq. 4.20: two published forms of one
        // solution.
        Tolerance.Absolute(longTime, shortTime, 1e-14, "eq. 4.18 against eq. 4.20");
    }

    [Theory]
    [InlineData(0.01)]
    [InlineData(0.05)]
    [InlineData(0.2)]
    [InlineData(0.6)]
    public void Long_and_short_time_profiles_agree_where_both_converge(double tau)
    {
        for (int i = 0; i <= 20; i++)
        {
            double xi = i / 20.0;
            double longTime = PlaneSheetIntoSink.ProfileLongTime(xi, tau);
            double shortTime = PlaneSheetIntoSink.ProfileShortTime(xi, tau);

            // Crank (1975), ch. 4, eq. 4.17 against eq. 4.19 (C1 = 0): two published forms of one profile.
            Tolerance.Absolute(longTime, shortTime, 1e-13, "eq. 4.17 against eq. 4.19");
        }
    }

    [Theory]
    [InlineData(1e-8)]
    [InlineData(1e-5)]
    [InlineData(1e-3)]
    public void Early_release_follows_the_square_root_of_time(double tau)
    {
        double fraction = ReleasedAt(tau);

        // Crank (1975), ch. 4, eq. 4.20, leading term; the n >= 1 terms are below i erfc(31), far under 1e-300.
        Tolerance.Relative(2 * Math.Sqrt(tau / Math.PI), fraction, 1e-13, "leading term of eq. 4.20");
    }

    [Theory]
    [InlineData(1e-3)]
    [InlineData(4e-3)]
    public void Fourier_series_alone_reproduces_the_early_square_root_law(double tau)
    {
        double fourier = PlaneSheetIntoSink.FractionReleasedLongTime(tau);

        // Crank (1975), ch. 4, eq. 4.18 summed far from its comfort zone against the leading term of eq. 4.20;
        // the cancellation in 1 - sum costs about three digits here.
        Tolerance.Relative(2 * Math.Sqrt(tau / Math.PI), fourier, 1e-12, "eq. 4.18 at early time");
    }

    [Fact]
    public void Half_time_matches_the_published_value()
    {
        // Crank (1975), ch. 4 (and ch. 10 on measuring D): M_t/M_inf = 1/2 at D t / l^2 = 0.049 (from memory)
        // with l the full thickness of a sheet open on both faces, i.e. twice our L.
        double halfTimeSeconds = 0.049 * Math.Pow(2 * ThicknessMeters, 2) / Diffusivity;
        double fraction = PlaneSheetIntoSink.FractionReleased(Diffusivity, ThicknessMeters, halfTimeSeconds);
        Tolerance.Absolute(0.5, fraction, 2e-3, "fraction at the published half-time");
    }

    [Fact]
    public void Late_release_follows_the_slowest_mode()
    {
        const double tau = 2.0;
        double slowestMode = 8 / (Math.PI * Math.PI) * Math.Exp(-Math.PI * Math.PI * tau / 4);
        double remaining = 1 - ReleasedAt(tau);

        // Crank (1975), ch. 4, eq. 4.18, first term: the next one is smaller by a factor 9 exp(2 pi^2 tau) > 1e18.
        Tolerance.Relative(slowestMode, remaining, 1e-10, "unreleased fraction against eq. 4.18 n = 0");
    }

    [Theory]
    [InlineData(0.003)]
    [InlineData(0.05)]
    [InlineData(0.3)]
    [InlineData(1.5)]
    public void Profile_integrates_to_the_mass_not_yet_released(double tau)
    {
        double timeSeconds = tau * DiffusionTimeSeconds;
        double initialMass = InitialConcentration * ThicknessMeters;
        double inSheet = Integrate.OnClosedInterval(
            x => PlaneSheetIntoSink.Concentration(Diffusivity, ThicknessMeters, InitialConcentration, x, timeSeconds),
            0,
            ThicknessMeters,
            1e-13 * initialMass);
        double released = PlaneSheetIntoSink.FractionReleased(Diffusivity, ThicknessMeters, timeSeconds);

        // Crank (1975), ch. 4: eq. 4.18 is the integral of eq. 4.17 over the sheet, so the two must balance.
        Tolerance.Relative((1 - released) * initialMass, inSheet, 1e-9, "integral of eq. 4.17/4.19");
    }

    [Theory]
    [InlineData(0.001)]
    [InlineData(0.05)]
    [InlineData(0.4)]
    public void Profile_is_zero_at_the_sink_face(double tau)
    {
        double atSink = PlaneSheetIntoSink.Concentration(
            Diffusivity, ThicknessMeters, InitialConcentration, ThicknessMeters, tau * DiffusionTimeSeconds);

        // Crank (1975), ch. 4, eqs. 4.17 and 4.19: boundary condition C = C1 = 0 at the exposed face.
        Tolerance.Absolute(0, atSink, 1e-14 * InitialConcentration, "concentration at x = L");
    }

    [Fact]
    public void Profile_keeps_the_initial_concentration_away_from_the_sink_at_early_times()
    {
        double timeSeconds = 1e-4 * DiffusionTimeSeconds;
        double interior = PlaneSheetIntoSink.Concentration(
            Diffusivity, ThicknessMeters, InitialConcentration, 0.5 * ThicknessMeters, timeSeconds);
        double atStart = PlaneSheetIntoSink.Concentration(
            Diffusivity, ThicknessMeters, InitialConcentration, ThicknessMeters, 0);

        // Crank (1975), ch. 4, eq. 4.19: the disturbance has reached depth ~ sqrt(D t) = L/100, erfc(25) ~ 1e-274.
        Tolerance.Absolute(InitialConcentration, interior, 1e-15, "interior concentration");

        // Crank (1975), ch. 4: the initial condition is uniform C0; the sink value applies only for t > 0.
        Tolerance.Absolute(InitialConcentration, atStart, 0, "concentration at t = 0");
    }

    [Fact]
    public void Fraction_starts_at_zero_rises_monotonically_and_tends_to_one()
    {
        // Crank (1975), ch. 4, eq. 4.18: M_t/M_inf = 0 at t = 0, increasing, and 1 as t tends to infinity.
        Assert.Equal(0, PlaneSheetIntoSink.FractionReleased(Diffusivity, ThicknessMeters, 0));
        double previous = 0;
        for (double tau = 1e-6; tau < 20; tau *= 1.25)
        {
            double fraction = ReleasedAt(tau);
            Assert.True(fraction > previous, FormattableString.Invariant($"fraction must increase at tau = {tau:R}"));
            previous = fraction;
        }

        Tolerance.Absolute(1, previous, 1e-15, "fraction at tau = 20");
    }

    [Fact]
    public void Time_and_thickness_enter_only_through_D_t_over_L_squared()
    {
        const double timeSeconds = 777.0;
        double reference = PlaneSheetIntoSink.FractionReleased(Diffusivity, ThicknessMeters, timeSeconds);
        double scaled = PlaneSheetIntoSink.FractionReleased(4 * Diffusivity, 2 * ThicknessMeters, timeSeconds);

        // Crank (1975), ch. 4, eq. 4.18: the solution depends on D t / l^2 only.
        Tolerance.Relative(reference, scaled, 1e-14, "fraction under D -> 4D, L -> 2L");
    }

    [Fact]
    public void Invalid_arguments_are_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PlaneSheetIntoSink.FractionReleased(0, ThicknessMeters, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => PlaneSheetIntoSink.FractionReleased(Diffusivity, -1, 1));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => PlaneSheetIntoSink.FractionReleased(Diffusivity, ThicknessMeters, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => PlaneSheetIntoSink.Concentration(Diffusivity, ThicknessMeters, 1, 1.5 * ThicknessMeters, 1));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => PlaneSheetIntoSink.Concentration(Diffusivity, ThicknessMeters, 1, -1e-9, 1));
    }

    private static double ReleasedAt(double tau)
        => PlaneSheetIntoSink.FractionReleased(Diffusivity, ThicknessMeters, tau * DiffusionTimeSeconds);
}
