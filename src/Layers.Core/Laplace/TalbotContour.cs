using System.Numerics;

namespace Layers.Core.Laplace;

/// <summary>
/// Numerical inversion of a Laplace transform on a fixed Talbot-type contour, scaled by the time: the Bromwich
/// integral f(t) = (1 / 2 pi i) integral of e^(s t) F(s) ds along s = z(theta) / t, theta in (-pi, pi), by the
/// midpoint rule. Suited to transforms whose singularities lie on the closed negative real axis (diffusion).
/// </summary>
/// <remarks>
/// The contour z(theta) = N (a theta cot(b theta) - c + i d theta) with a = 0.5017, b = 0.6407, c = 0.6122,
/// d = 0.2645 is the optimised cotangent contour of Trefethen, Weideman and Schmelzer, "Talbot quadratures and
/// rational approximations", BIT Numer. Math. 46 (2006) 653-670 (constants from memory; they were checked by the
/// round-trip tests on transforms with known inverses). Its error falls about like e^(-1.36 N); round-off grows like
/// e^(max Re z) = e^(0.171 N) times the machine epsilon, so N = 32 (16 evaluations of F for a real f, by conjugate
/// symmetry) is near the best double precision can do: 1e-10 or better relative to the size of f on the transforms of
/// the round-trip tests. On random three-layer stacks its values are within 5e-8 of each figure's largest value of a
/// round-off-level inversion (1e-10 typically; the fluxes at the earliest times are the worst). For many times at
/// once see <see cref="HyperbolicContour"/>.
/// </remarks>
public sealed class TalbotContour
{
    private const double A = 0.5017;
    private const double B = 0.6407;
    private const double C = 0.6122;
    private const double D = 0.2645;

    private readonly Complex[] _nodes;
    private readonly Complex[] _weights;

    /// <summary>A contour of <paramref name="points"/> midpoints (even, at least 8).</summary>
    public TalbotContour(int points = DefaultPoints)
    {
        if (points < 8 || points % 2 != 0)
        {
            throw new ArgumentOutOfRangeException(nameof(points), points, "The contour needs an even number of points, at least 8.");
        }

        Points = points;
        var half = points / 2;
        _nodes = new Complex[half];
        _weights = new Complex[half];
        for (var k = 0; k < half; k++)
        {
            // Midpoints of the upper half, theta in (0, pi); the lower half is their conjugate.
            var theta = (k + 0.5) * 2 * Math.PI / points;
            var cot = 1 / Math.Tan(B * theta);
            var sin = Math.Sin(B * theta);
            var z = points * new Complex((A * theta * cot) - C, D * theta);
            var dz = points * new Complex((A * cot) - (A * B * theta / (sin * sin)), D);

            // f(t) = (2 / (N t)) sum over the upper half of Im[e^z z' F(z/t)]; the weight holds 2 e^z z' / N.
            _nodes[k] = z;
            _weights[k] = 2 * Complex.Exp(z) * dz / points;
        }
    }

    /// <summary>The number of points used by default: 32, or 16 evaluations of the transform per time.</summary>
    public const int DefaultPoints = 32;

    /// <summary>The number of midpoints on the whole contour.</summary>
    public int Points { get; }

    /// <summary>Number of evaluations of the transform per time (half the points, by conjugate symmetry).</summary>
    public int EvaluationsPerTime => _nodes.Length;

    /// <summary>The value of s at evaluation k for time t.</summary>
    public Complex Node(int k, double timeSeconds) => _nodes[k] / timeSeconds;

    /// <summary>The factor of evaluation k at time t: the real f(t) is the sum over k of Im[factor F(s_k)].</summary>
    public Complex Factor(int k, double timeSeconds) => _weights[k] / timeSeconds;

    /// <summary>Inverts a real function's transform F at time t &gt; 0.</summary>
    public double Invert(Func<Complex, Complex> transform, double timeSeconds)
    {
        ArgumentNullException.ThrowIfNull(transform);
        RequirePositive(timeSeconds);
        var sum = 0.0;
        for (var k = 0; k < _nodes.Length; k++)
        {
            sum += (_weights[k] * transform(_nodes[k] / timeSeconds)).Imaginary;
        }

        return sum / timeSeconds;
    }

    /// <summary>
    /// Inverts several transforms at once at time t &gt; 0: <paramref name="transforms"/> fills, for one s, the
    /// transformed values of all <paramref name="count"/> quantities, so each value of s is solved for once.
    /// </summary>
    public double[] Invert(int count, Action<Complex, Complex[]> transforms, double timeSeconds)
    {
        ArgumentNullException.ThrowIfNull(transforms);
        RequirePositive(timeSeconds);
        var sums = new double[count];
        var values = new Complex[count];
        for (var k = 0; k < _nodes.Length; k++)
        {
            transforms(_nodes[k] / timeSeconds, values);
            for (var i = 0; i < count; i++)
            {
                sums[i] += (_weights[k] * values[i]).Imaginary;
            }
        }

        for (var i = 0; i < count; i++)
        {
            sums[i] /= timeSeconds;
        }

        return sums;
    }

    /// <summary>
    /// Inverts several transforms at once at time t &gt; 0 from values already computed at each evaluation point:
    /// <paramref name="transformsAtNode"/> fills, for evaluation k (at s = <see cref="Node"/>(k, t)), the transformed
    /// values of all <paramref name="count"/> quantities.
    /// </summary>
    public double[] InvertByNode(int count, Action<int, Complex[]> transformsAtNode, double timeSeconds)
    {
        ArgumentNullException.ThrowIfNull(transformsAtNode);
        var k = 0;
        return Invert(count, (_, values) => transformsAtNode(k++, values), timeSeconds);
    }

    private static void RequirePositive(double timeSeconds)
    {
        if (!(timeSeconds > 0) || double.IsInfinity(timeSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(timeSeconds), timeSeconds, "The inversion needs a finite time above zero.");
        }
    }
}
