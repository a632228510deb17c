using System.Numerics;

namespace Layers.Core.Laplace;

/// <summary>
/// Numerical inversion of a Laplace transform for every time of a window [t0, Lambda t0] on one hyperbolic contour,
/// so that each evaluation of the transform serves all the times of the window: the Bromwich integral
/// f(t) = (1 / 2 pi i) integral of e^(s t) F(s) ds along s(u) = mu (1 + sin(i u - alpha)), u real, by the midpoint
/// rule u_k = (k + 1/2) h, k = 0..n-1 (the lower half being the conjugate for a real f).
/// </summary>
/// <remarks>
/// <para>
/// The contour and its parameters are those of Weideman and Trefethen, "Parabolic and hyperbolic contours for
/// computing the Bromwich integral", Math. Comp. 76 (2007) 1341-1356, written here from memory and checked two ways:
/// for Lambda = 1 they reduce to the single-time constants alpha = 1.1721, h = 1.0818 / n, mu t = 4.4921 n of that
/// paper, and the round-trip tests invert transforms with known inverses over whole windows. The map u + i v
/// turns the hyperbola's angle to alpha + v, so the integrand is analytic in the strip -alpha &lt; v &lt; pi/2 - alpha for a
/// transform whose singularities lie on the closed negative real axis. Three errors follow: from the upper edge of
/// the strip e^(-2 pi (pi/2 - alpha) / h), from the lower edge e^(mu t1 - 2 pi alpha / h) (largest at t1 = Lambda t0),
/// and from cutting the sum at n terms e^(mu t0 (1 - sin(alpha) cosh(n h))) (largest at t0). Equal, they give
/// </para>
/// <para>
/// h = A / n, mu = (4 pi alpha - pi^2) n / (A t1), A = arccosh(((pi - 2 alpha) Lambda + 4 alpha - pi) / ((4 alpha - pi) sin alpha)),
/// and the error e^(-rate n) with rate = pi (pi - 2 alpha) / A; alpha is the angle that maximises the rate for the
/// window (1.17 for Lambda = 1, 1.02 for 10, 0.92 for 100, 0.88 for 1000). The rate falls with the window: 2.32 per
/// evaluation for one time, 1.02 for a decade, 0.47 for three decades. Measured on the round-trip transforms the
/// error stays below 10 Lambda e^(-rate n) relative to the size of f (the estimate leaves out the constants), and
/// that is the bound <see cref="EvaluationsFor"/> sizes the contour by. Round-off grows like e^(mu t1 (1 - sin alpha))
/// times the machine epsilon, below 1e-14 for the sizes used here (under a hundred evaluations).
/// </para>
/// </remarks>
public sealed class HyperbolicContour
{
    /// <summary>The widest window one contour serves; wider spans are split into several windows.</summary>
    public const double WidestWindowRatio = 1000;

    // The windows a contour is designed for: a span of times is rounded up to the next of these ratios, so the angle
    // and the rate of each are found once.
    private static readonly double[] DesignRatios = [1, 1.5, 2, 3, 5, 7, 10, 15, 20, 30, 50, 70, 100, 150, 200, 300, 500, 700, 1000];
    private static readonly (double Angle, double Rate, double Arc)[] Designs = [.. DesignRatios.Select(Design)];

    private readonly Complex[] _nodes;
    private readonly Complex[] _weights;

    /// <summary>A contour of <paramref name="evaluations"/> points for the times from t0 to <paramref name="windowRatio"/> t0.</summary>
    public HyperbolicContour(double startSeconds, double windowRatio, int evaluations)
    {
        RequirePositive(startSeconds);
        if (!(windowRatio >= 1) || windowRatio > WidestWindowRatio)
        {
            throw new ArgumentOutOfRangeException(nameof(windowRatio), windowRatio, $"The window ratio must lie between 1 and {WidestWindowRatio}.");
        }

        if (evaluations < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(evaluations), evaluations, "The contour needs at least 2 points.");
        }

        var design = DesignIndex(windowRatio);
        var (angle, _, arc) = Designs[design];
        StartSeconds = startSeconds;
        EndSeconds = startSeconds * DesignRatios[design];
        Evaluations = evaluations;
        Angle = angle;
        var step = arc / evaluations;
        var scale = ((4 * Math.PI * angle) - (Math.PI * Math.PI)) * evaluations / (arc * EndSeconds);
        var (sinAngle, cosAngle) = Math.SinCos(angle);
        _nodes = new Complex[evaluations];
        _weights = new Complex[evaluations];

        // e^u at u_k = (k + 1/2) h by a running product (a relative error of k epsilon at most): sinh and cosh
        // without two hyperbolic functions per point.
        var growth = Math.Exp(step);
        var rising = Math.Exp(0.5 * step);
        for (var k = 0; k < evaluations; k++)
        {
            // s = mu (1 - sin(alpha) cosh u + i cos(alpha) sinh u), ds/du = mu (-sin(alpha) sinh u + i cos(alpha) cosh u);
            // f(t) = (h / pi) sum over the upper half of Im[e^(s t) s'(u) F(s)]: the weight holds h s' / pi.
            var falling = 1 / rising;
            var sinh = 0.5 * (rising - falling);
            var cosh = 0.5 * (rising + falling);
            _nodes[k] = scale * new Complex(1 - (sinAngle * cosh), cosAngle * sinh);
            _weights[k] = step / Math.PI * scale * new Complex(-sinAngle * sinh, cosAngle * cosh);
            rising *= growth;
        }
    }

    /// <summary>The first time of the window, s.</summary>
    public double StartSeconds { get; }

    /// <summary>The last time of the window the contour was designed for, s (at least the ratio asked for times t0).</summary>
    public double EndSeconds { get; }

    /// <summary>Number of evaluations of the transform (points on the upper half of the contour).</summary>
    public int Evaluations { get; }

    /// <summary>The angle alpha of the hyperbola, rad.</summary>
    public double Angle { get; }

    /// <summary>The value of s at evaluation k.</summary>
    public Complex Node(int k) => _nodes[k];

    /// <summary>
    /// A term whose e^(s t) is below e^(-50) (2e-22) is left out: the weights grow no faster than cosh(u), under
    /// Lambda, and the transforms of the exact method fall along the contour, so such a term is below 1e-16 of f.
    /// Later times of a window drop most of the outer points this way (the contour is sized for the first).
    /// </summary>
    public const double NegligibleExponent = -50;

    /// <summary>Whether evaluation k adds anything at time t (see <see cref="NegligibleExponent"/>).</summary>
    public bool Contributes(int k, double timeSeconds) => _nodes[k].Real * timeSeconds >= NegligibleExponent;

    /// <summary>The factor of evaluation k at time t: the real f(t) is the sum over k of Im[factor F(s_k)].</summary>
    public Complex Factor(int k, double timeSeconds) => _weights[k] * ScaledExponentials.Exp(_nodes[k] * timeSeconds);

    /// <summary>
    /// The number of evaluations for which the error bound 10 Lambda e^(-rate n) (see the remarks) is below the
    /// tolerance, relative to the size of f, for a window of the given ratio.
    /// </summary>
    public static int EvaluationsFor(double windowRatio, double tolerance)
    {
        if (!(tolerance > 0 && tolerance < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(tolerance), tolerance, "The tolerance must lie between 0 and 1.");
        }

        var design = DesignIndex(windowRatio);
        return (int)Math.Ceiling(Math.Log(10 * DesignRatios[design] / tolerance) / Designs[design].Rate);
    }

    /// <summary>The contour for a window of times from t0 to the given ratio times t0, sized for the tolerance.</summary>
    public static HyperbolicContour ForWindow(double startSeconds, double windowRatio, double tolerance)
        => new(startSeconds, windowRatio, EvaluationsFor(windowRatio, tolerance));

    /// <summary>Inverts a real function's transform F at a time of the window.</summary>
    public double Invert(Func<Complex, Complex> transform, double timeSeconds)
    {
        ArgumentNullException.ThrowIfNull(transform);
        RequirePositive(timeSeconds);
        var sum = 0.0;
        for (var k = 0; k < _nodes.Length; k++)
        {
            if (Contributes(k, timeSeconds))
            {
                sum += (Factor(k, timeSeconds) * transform(_nodes[k])).Imaginary;
            }
        }

        return sum;
    }

    private static int DesignIndex(double windowRatio)
    {
        // A ratio a rounding step above a design ratio still counts as that one.
        var index = 0;
        while (index < DesignRatios.Length - 1 && windowRatio > DesignRatios[index] * (1 + 1e-12))
        {
            index++;
        }

        return index;
    }

    // The angle that maximises the rate for a window ratio: a golden-section search on alpha in (pi/4, pi/2), where the
    // rate has one maximum.
    private static (double Angle, double Rate, double Arc) Design(double windowRatio)
    {
        static (double Rate, double Arc) RateAt(double angle, double ratio)
        {
            var arc = Math.Acosh((((Math.PI - (2 * angle)) * ratio) + (4 * angle) - Math.PI) / (((4 * angle) - Math.PI) * Math.Sin(angle)));
            return (Math.PI * (Math.PI - (2 * angle)) / arc, arc);
        }

        var golden = (Math.Sqrt(5) - 1) / 2;
        var low = 0.8;
        var high = 1.3;
        for (var i = 0; i < 60; i++)
        {
            var a = high - (golden * (high - low));
            var b = low + (golden * (high - low));
            if (RateAt(a, windowRatio).Rate < RateAt(b, windowRatio).Rate)
            {
                low = a;
            }
            else
            {
                high = b;
            }
        }

        var angle = 0.5 * (low + high);
        var (rate, arcLength) = RateAt(angle, windowRatio);
        return (angle, rate, arcLength);
    }

    private static void RequirePositive(double timeSeconds)
    {
        if (!(timeSeconds > 0) || double.IsInfinity(timeSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(timeSeconds), timeSeconds, "The inversion needs a finite time above zero.");
        }
    }
}
