using System.Numerics;
using Layers.Core.Laplace;
using MathNet.Numerics;

namespace Layers.Tests.Laplace;

/// <summary>
/// The contour inversion on transforms whose inverses are tabulated: Abramowitz and Stegun, Handbook of Mathematical
/// Functions (1964), table 29.3 of Laplace transforms (entry numbers from memory).
/// </summary>
public sealed class TalbotRoundTripTests
{
    private static readonly double[] Times = [1e-3, 0.01, 0.1, 0.5, 1, 3, 10, 100];

    [Fact]
    public void Exponential_decay_from_one_over_s_plus_a()
    {
        // 1 / (s + a) <-> e^(-a t) (A&S 29.3.8 with a -> -a, from memory).
        const double a = 2.5;
        Check(s => 1 / (s + a), t => Math.Exp(-a * t), "1/(s+a)", scale: 1);
    }

    [Fact]
    public void Square_root_of_time_from_s_to_the_minus_three_halves()
    {
        // s^(-3/2) <-> 2 sqrt(t / pi) (A&S 29.3.4, from memory).
        Check(s => 1 / (s * Complex.Sqrt(s)), t => 2 * Math.Sqrt(t / Math.PI), "s^(-3/2)");
    }

    [Fact]
    public void Inverse_square_root_from_one_over_root_s()
    {
        // s^(-1/2) <-> 1 / sqrt(pi t) (A&S 29.3.3, from memory).
        Check(s => 1 / Complex.Sqrt(s), t => 1 / Math.Sqrt(Math.PI * t), "s^(-1/2)");
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(2)]
    public void Complementary_error_function_from_exp_of_minus_root_s_over_s(double k)
    {
        // e^(-k sqrt s) / s <-> erfc(k / (2 sqrt t)) (A&S 29.3.83, from memory); erfc from MathNet.Numerics.
        Check(s => Complex.Exp(-k * Complex.Sqrt(s)) / s, t => SpecialFunctions.Erfc(k / (2 * Math.Sqrt(t))), "e^(-k sqrt s)/s", scale: 1);
    }

    [Fact]
    public void Fewer_points_are_less_accurate_so_the_check_can_fail()
    {
        // The same exponential with a contour of 8 points misses 1e-8: the tolerance above is not loose.
        var coarse = new TalbotContour(8);
        var error = Times.Max(t => Math.Abs(coarse.Invert(s => 1 / (s + 1), t) - Math.Exp(-t)));
        Assert.True(error > 1e-8, $"8 points gave {error:G3}");
    }

    // The error is taken relative to |f|, or to the scale of f where f has decayed far below it (e^(-a t) against
    // its initial value 1): round-off of the contour sum is a fixed fraction of the largest terms, not of f(t).
    private static void Check(Func<Complex, Complex> transform, Func<double, double> inverse, string what, double scale = 0)
    {
        var contour = new TalbotContour();
        foreach (var t in Times)
        {
            var expected = inverse(t);
            var actual = contour.Invert(transform, t);

            var error = Math.Abs(actual - expected) / Math.Max(Math.Abs(expected), scale);
            Assert.True(error < 1e-10, $"{what} at t = {t}: expected {expected:R}, got {actual:R}, error {error:G3}");
        }
    }
}
