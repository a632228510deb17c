using Layers.Core.Analytics;
using MathNet.Numerics;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Analytics;

public sealed class TwoSemiInfiniteMediaTests
{
    private const double InitialConcentration1 = 5.0;
    private const double TimeSeconds = 3600.0;

    [Theory]
    [InlineData(1e-10, 1e-10, 1.0)]
    [InlineData(1e-10, 4e-12, 0.2)]
    [InlineData(2e-12, 5e-10, 7.0)]
    public void Interface_keeps_the_partition_ratio(double d1, double d2, double partitionCoefficient)
    {
        foreach (double timeSeconds in new[] { 1.0, TimeSeconds, 1e6 })
        {
            double c1 = Medium1(d1, d2, partitionCoefficient, 0, timeSeconds);
            double c2 = TwoSemiInfiniteMedia.Concentration(
                d1, d2, partitionCoefficient, InitialConcentration1, 0, timeSeconds);

            // Crank (1975), The Mathematics of Diffusion, ch. 3, composite media with a partition factor, and
            // Carslaw and Jaeger (1959), ch. 2 (both from memory): c1 = K c2 at the interface for all t > 0.
            Tolerance.Relative(partitionCoefficient * c2, c1, 1e-14, "c1 against K c2 at x = 0");
        }
    }

    [Theory]
    [InlineData(1e-10, 1e-10, 1.0)]
    [InlineData(1e-10, 4e-12, 0.2)]
    [InlineData(2e-12, 5e-10, 7.0)]
    public void Flux_is_continuous_at_the_interface(double d1, double d2, double partitionCoefficient)
    {
        // Second-order one-sided differences, each taken inside its own medium.
        double h1 = 1e-4 * Math.Sqrt(d1 * TimeSeconds);
        double h2 = 1e-4 * Math.Sqrt(d2 * TimeSeconds);
        double gradient1 = (3 * Medium1(d1, d2, partitionCoefficient, 0, TimeSeconds)
            - 4 * Medium1(d1, d2, partitionCoefficient, -h1, TimeSeconds)
            + Medium1(d1, d2, partitionCoefficient, -2 * h1, TimeSeconds)) / (2 * h1);
        double gradient2 = (-3 * Medium2(d1, d2, partitionCoefficient, 0)
            + 4 * Medium2(d1, d2, partitionCoefficient, h2)
            - Medium2(d1, d2, partitionCoefficient, 2 * h2)) / (2 * h2);

        // Crank (1975), ch. 3, and Carslaw and Jaeger (1959), ch. 2 (both from memory): D1 dc1/dx = D2 dc2/dx
        // at the interface.
        Tolerance.Relative(d2 * gradient2, d1 * gradient1, 1e-6, "flux on the two sides");
    }

    [Theory]
    [InlineData(1e-10, 1e-10, 1.0)]
    [InlineData(1e-10, 4e-12, 0.2)]
    [InlineData(2e-12, 5e-10, 7.0)]
    public void Mass_lost_by_medium_one_equals_mass_gained_by_medium_two(
        double d1, double d2, double partitionCoefficient)
    {
        // Beyond 24 diffusion lengths the profiles differ from their initial values by less than erfc(12).
        double reach1 = 24 * Math.Sqrt(d1 * TimeSeconds);
        double reach2 = 24 * Math.Sqrt(d2 * TimeSeconds);
        double transferred = TwoSemiInfiniteMedia.MassPerAreaTransferred(
            d1, d2, partitionCoefficient, InitialConcentration1, TimeSeconds);
        double tolerance = 1e-12 * transferred;
        double lost = Integrate.OnClosedInterval(
            x => InitialConcentration1 - Medium1(d1, d2, partitionCoefficient, x, TimeSeconds), -reach1, 0, tolerance);
        double gained = Integrate.OnClosedInterval(
            x => Medium2(d1, d2, partitionCoefficient, x), 0, reach2, tolerance);

        // Conservation of mass across an interface with continuous flux (Crank 1975, ch. 1 and ch. 3; Carslaw
        // and Jaeger 1959, ch. 2; chapter numbers from memory).
        Tolerance.Relative(gained, lost, 1e-9, "mass lost by 1 against mass gained by 2");

        // The integral of erfc from 0 to infinity is 1/sqrt(pi) (Abramowitz and Stegun 1964, ch. 7, from memory),
        // which gives the closed form of MassPerAreaTransferred.
        Tolerance.Relative(transferred, gained, 1e-9, "integral of c2 against the closed form");
    }

    [Theory]
    [InlineData(-3e-4)]
    [InlineData(-1e-6)]
    [InlineData(0.0)]
    [InlineData(2e-5)]
    [InlineData(4e-4)]
    public void Equal_media_without_partition_reduce_to_the_half_erfc_profile(double positionMeters)
    {
        const double diffusivity = 1e-10;
        double c = TwoSemiInfiniteMedia.Concentration(
            diffusivity, diffusivity, 1.0, InitialConcentration1, positionMeters, TimeSeconds);
        double expected = InitialConcentration1 / 2
            * SpecialFunctions.Erfc(positionMeters / (2 * Math.Sqrt(diffusivity * TimeSeconds)));

        // Crank (1975), ch. 2, eq. 2.14 (from memory): an extended initial distribution C0 for x < 0 spreads
        // as C = (C0 / 2) erfc(x / (2 sqrt(D t))).
        Tolerance.Relative(expected, c, 1e-13, "profile with D1 = D2 and K = 1");
    }

    [Fact]
    public void Initial_condition_holds_at_time_zero()
    {
        const double d1 = 1e-10;
        const double d2 = 2e-10;
        const double partitionCoefficient = 0.5;

        // Crank (1975), ch. 3, composite media (from memory): medium 1 starts at C0, medium 2 empty.
        Assert.Equal(
            InitialConcentration1,
            TwoSemiInfiniteMedia.Concentration(d1, d2, partitionCoefficient, InitialConcentration1, -1e-6, 0));
        Assert.Equal(0, TwoSemiInfiniteMedia.Concentration(d1, d2, partitionCoefficient, InitialConcentration1, 0, 0));
        Assert.Equal(
            0, TwoSemiInfiniteMedia.Concentration(d1, d2, partitionCoefficient, InitialConcentration1, 1e-6, 0));
        Assert.Equal(
            0, TwoSemiInfiniteMedia.MassPerAreaTransferred(d1, d2, partitionCoefficient, InitialConcentration1, 0));
    }

    [Fact]
    public void Far_field_keeps_the_initial_concentrations()
    {
        const double d1 = 1e-10;
        const double d2 = 3e-10;
        double far1 = TwoSemiInfiniteMedia.Concentration(d1, d2, 2.0, InitialConcentration1, -5e-2, TimeSeconds);
        double far2 = TwoSemiInfiniteMedia.Concentration(d1, d2, 2.0, InitialConcentration1, 5e-2, TimeSeconds);

        // Crank (1975), ch. 3 (from memory): semi-infinite media keep their initial values far from the interface;
        // 5 cm is over 45 diffusion lengths sqrt(D t) in either medium, and erfc(24) < 1e-250.
        Tolerance.Absolute(InitialConcentration1, far1, 1e-15, "medium 1 far field");
        Tolerance.Absolute(0, far2, 1e-200, "medium 2 far field");
    }

    [Fact]
    public void Invalid_arguments_are_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(
            () => TwoSemiInfiniteMedia.Concentration(0, 1e-10, 1, 1, 0, 1));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => TwoSemiInfiniteMedia.Concentration(1e-10, 1e-10, 1, 1, double.NaN, 1));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => TwoSemiInfiniteMedia.MassPerAreaTransferred(1e-10, 1e-10, -1, 1, 1));
    }

    // The medium-1 formula at x <= 0: at x = 0 itself the public function reports the medium-2 side, so the
    // interface value of medium 1 is read at the largest double below zero.
    private static double Medium1(double d1, double d2, double partitionCoefficient, double x, double timeSeconds)
        => TwoSemiInfiniteMedia.Concentration(
            d1, d2, partitionCoefficient, InitialConcentration1, Math.Min(x, -double.Epsilon), timeSeconds);

    private static double Medium2(double d1, double d2, double partitionCoefficient, double x)
        => TwoSemiInfiniteMedia.Concentration(d1, d2, partitionCoefficient, InitialConcentration1, x, TimeSeconds);
}
