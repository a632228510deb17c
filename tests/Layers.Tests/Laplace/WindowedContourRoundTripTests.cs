using System.Numerics;
using Layers.Core.Laplace;
using MathNet.Numerics;

namespace Layers.Tests.Laplace;

/// <summary>
/// The hyperbolic contour of a window of times on transforms whose inverses are tabulated: Abramowitz and Stegun,
/// Handbook of Mathematical Functions (1964), table 29.3 of Laplace transforms (entry numbers from memory), at both
/// ends and inside windows of one time to three decades; and its parameters against the single-time constants of
/// Weideman and Trefethen, Math. Comp. 76 (2007) 1341-1356 (from memory).
/// </summary>
public sealed class WindowedContourRoundTripTests
{
    private const double Tolerance = 1e-12;

    public static TheoryData<double, double> Windows => new()
    {
        { 1e-3, 1 },
        { 1e-3, 10 },
        { 0.5, 1 },
        { 0.5, 7 },
        { 0.5, 100 },
        { 20, 30 },
        { 1e-2, 1000 },
    };

    [Theory]
    [MemberData(nameof(Windows))]
    public void Exponential_decay_from_one_over_s_plus_a(double start, double ratio)
    {
        // 1 / (s + a) <-> e^(-a t) (A&S 29.3.8 with a -> -a, from memory).
        const double a = 2.5;
        Check(start, ratio, s => 1 / (s + a), t => Math.Exp(-a * t), "1/(s+a)", scale: 1);
    }

    [Theory]
    [MemberData(nameof(Windows))]
    public void Square_root_of_time_and_its_inverse(double start, double ratio)
    {
        // s^(-3/2) <-> 2 sqrt(t / pi) (A&S 29.3.4, from memory); s^(-1/2) <-> 1 / sqrt(pi t) (A&S 29.3.3, from memory).
        Check(start, ratio, s => 1 / (s * Complex.Sqrt(s)), t => 2 * Math.Sqrt(t / Math.PI), "s^(-3/2)");
        Check(start, ratio, s => 1 / Complex.Sqrt(s), t => 1 / Math.Sqrt(Math.PI * t), "s^(-1/2)");
    }

    [Theory]
    [MemberData(nameof(Windows))]
    public void Complementary_error_function_and_the_diffusion_kernel(double start, double ratio)
    {
        // e^(-k sqrt s) / s <-> erfc(k / (2 sqrt t)) (A&S 29.3.83, from memory); erfc from MathNet.Numerics.
        // e^(-k sqrt s) / sqrt s <-> e^(-k^2 / (4 t)) / sqrt(pi t) (A&S 29.3.84, from memory).
        foreach (var k in new[] { 0.3, 2.0 })
        {
            Check(start, ratio, s => Complex.Exp(-k * Complex.Sqrt(s)) / s, t => SpecialFunctions.Erfc(k / (2 * Math.Sqrt(t))), $"e^(-{k} sqrt s)/s", scale: 1);
            Check(
                start,
                ratio,
                s => Complex.Exp(-k * Complex.Sqrt(s)) / Complex.Sqrt(s),
                t => Math.Exp(-k * k / (4 * t)) / Math.Sqrt(Math.PI * t),
                $"e^(-{k} sqrt s)/sqrt s",
                scale: 1 / Math.Sqrt(Math.PI * start));
        }
    }

    [Fact]
    public void Half_the_evaluations_miss_1e_8_so_the_checks_can_fail()
    {
        // The window of a hundred of the erfc check above with half the points its bound asks for.
        var full = HyperbolicContour.EvaluationsFor(100, Tolerance);
        var coarse = new HyperbolicContour(0.5, 100, full / 2);
        var error = Times(0.5, 100).Max(t => Math.Abs(coarse.Invert(s => Complex.Exp(-2 * Complex.Sqrt(s)) / s, t) - SpecialFunctions.Erfc(1 / Math.Sqrt(t))));
        Assert.True(error > 1e-8, $"{full / 2} points gave {error:G3}");
    }

    [Fact]
    public void One_time_gives_the_published_single_time_contour()
    {
        // For one time, alpha = 1.1721, h = 1.0818 / n and mu t = 4.4921 n (Weideman and Trefethen 2007, from memory):
        // node 0 sits at u = h / 2.
        const int n = 20;
        var contour = new HyperbolicContour(2.0, 1, n);
        Assert.Equal(1.1721, contour.Angle, 3);
        var u = 0.5 * 1.0818 / n;
        var mu = 4.4921 * n / 2.0;
        var expected = mu * new Complex(1 - (Math.Sin(1.1721) * Math.Cosh(u)), Math.Cos(1.1721) * Math.Sinh(u));
        Assert.True(Complex.Abs(contour.Node(0) - expected) <= 1e-3 * Complex.Abs(expected), $"node 0 at {contour.Node(0)}, expected {expected}");
    }

    [Fact]
    public void A_decade_costs_about_thirty_evaluations_and_one_time_about_thirteen()
    {
        // The rate of the bound: 2.32 per evaluation for one time, 1.02 for a decade (ln 10 per 2.3 evaluations or so).
        Assert.InRange(HyperbolicContour.EvaluationsFor(1, Tolerance), 12, 14);
        Assert.InRange(HyperbolicContour.EvaluationsFor(10, Tolerance), 30, 34);
        Assert.InRange(HyperbolicContour.EvaluationsFor(1000, Tolerance), 70, 90);
    }

    private static double[] Times(double start, double ratio) => [.. Enumerable.Range(0, 5).Select(j => start * Math.Pow(ratio, j / 4.0))];

    // The error is taken relative to |f|, or to the scale of f where f has decayed far below it (as in
    // TalbotRoundTripTests): the contour's error is a fixed fraction of the largest terms, not of f(t).
    private static void Check(double start, double ratio, Func<Complex, Complex> transform, Func<double, double> inverse, string what, double scale = 0)
    {
        var contour = HyperbolicContour.ForWindow(start, ratio, Tolerance);
        foreach (var t in Times(start, ratio))
        {
            var expected = inverse(t);
            var actual = contour.Invert(transform, t);
            var error = Math.Abs(actual - expected) / Math.Max(Math.Abs(expected), scale);
            Assert.True(error < 1e-10, $"{what} at t = {t} in [{start}, {start * ratio}] ({contour.Evaluations} points): expected {expected:R}, got {actual:R}, error {error:G3}");
        }
    }
}
