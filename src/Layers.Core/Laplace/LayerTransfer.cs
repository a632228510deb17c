using System.Numerics;

namespace Layers.Core.Laplace;

/// <summary>
/// One layer in the Laplace domain at one value of s: how the transformed flux at its two faces follows from the
/// transformed values of u = c / K there, in scaled form (docs/numerics.md, "The exact method in the Laplace domain").
/// </summary>
/// <remarks>
/// In the layer, D u'' = s u - u0, so u(xi) = u0/s + [a sinh(q (L - xi)) + b sinh(q xi)] / sinh(q L) with
/// q = sqrt(s / D), a and b the excess of u over u0/s at the left and right face. The flux in +x, -P u' with
/// P = D K, is then F(0) = G a - H b and F(L) = H a - G b, with the self admittance G = P q coth(q L) and the cross
/// admittance H = P q csch(q L); their difference T = G - H = P q tanh(q L / 2). All three are written through
/// E = e^(-q L) and phi (see <see cref="ScaledExponentials"/>), so they hold for |q L| from 1e-8 to 1e4 and more.
/// </remarks>
internal readonly struct LayerTransfer
{
    // From |q L| = 1/2 on, phi(q L) and phi(2 q L) are both outside their series radius and follow from E alone.
    private const double ClosedFormFrom = 0.5;

    private readonly double _thicknessMeters;
    private readonly Complex _q;

    /// <summary>The layer at s, given sqrt(s) and 1/s (shared by the layers) and the layer's 1/sqrt(D), P/L and 1/K.</summary>
    public LayerTransfer(Complex sqrtS, Complex inverseS, double thicknessMeters, double inverseRootDiffusivity, double conductance, double inversePartition)
    {
        _thicknessMeters = thicknessMeters;
        _q = sqrtS * inverseRootDiffusivity;
        var ql = _q * thicknessMeters;
        Decay = ScaledExponentials.Exp(-ql);
        if ((ql.Real * ql.Real) + (ql.Imaginary * ql.Imaginary) >= ClosedFormFrom * ClosedFormFrom)
        {
            // phi(2x) = (1 - E^2) / (2x) and phi(x) = (1 - E) / x with E computed once; with r = x / (1 - E^2):
            // G = (P/L) r (1 + E^2), H = (P/L) r 2E, T = (P/L) r (1 - E)^2, the forms below at one division.
            var decaySquared = Decay * Decay;
            var oneMinusSquare = Complex.One - decaySquared;
            var scaled = conductance * ql / oneMinusSquare;
            var oneMinusDecay = Complex.One - Decay;
            Self = scaled * (1 + decaySquared);
            Cross = 2 * scaled * Decay;
            Storage = scaled * oneMinusDecay * oneMinusDecay;
        }
        else
        {
            var phiOfQl = ScaledExponentials.Phi(ql);
            var phiOfTwoQl = ScaledExponentials.Phi(2 * ql);

            // coth(x) = (1 + E^2) / (2 x phi(2x)) and csch(x) = E / (x phi(2x)), times P q = (P/L) x.
            Self = conductance * (1 + (Decay * Decay)) / (2 * phiOfTwoQl);
            Cross = conductance * Decay / phiOfTwoQl;

            // tanh(x/2) = x phi(x) / (1 + E): no cancellation of G - H when x is small.
            Storage = conductance * ql * ql * phiOfQl / (1 + Decay);
        }

        // tanh(q L / 2) / q = L phi(q L) / (1 + E) = T / (K s), since (P/L) (q L)^2 = K L s: no further division by q.
        ContentFactor = Storage * inverseS * inversePartition;
    }

    /// <summary>E = e^(-q L), of modulus at most 1.</summary>
    public Complex Decay { get; }

    /// <summary>G = P q coth(q L), m/s.</summary>
    public Complex Self { get; }

    /// <summary>H = P q csch(q L), m/s.</summary>
    public Complex Cross { get; }

    /// <summary>T = G - H = P q tanh(q L / 2), m/s: what the layer takes up when both faces rise together.</summary>
    public Complex Storage { get; }

    /// <summary>tanh(q L / 2) / q, m: the integral of u over the layer per unit rise of both faces.</summary>
    public Complex ContentFactor { get; }

    /// <summary>Transformed flux in +x at the left face, from the face values of u and the layer's u0 / s.</summary>
    public Complex FluxAtLeft(Complex left, Complex right, Complex initialOverS)
        => (Self * (left - right)) + (Storage * (right - initialOverS));

    /// <summary>Transformed flux in +x at the right face.</summary>
    public Complex FluxAtRight(Complex left, Complex right, Complex initialOverS)
        => (Self * (left - right)) - (Storage * (left - initialOverS));

    /// <summary>
    /// Transformed integral of u over the layer: L u0/s + (a + b) tanh(q L / 2) / q, with tanh(x/2)/q = L phi(x) / (1 + E).
    /// </summary>
    public Complex IntegralOfU(Complex left, Complex right, Complex initialOverS)
        => (_thicknessMeters * initialOverS) + ((left - initialOverS + right - initialOverS) * ContentFactor);

    /// <summary>Transformed u at depth xi from the layer's left face, 0 &lt;= xi &lt;= L.</summary>
    public Complex ValueAt(double depthMeters, Complex left, Complex right, Complex initialOverS)
    {
        var length = _thicknessMeters;
        var remaining = length - depthMeters;
        var phiOfTwoQl = PhiOfTwoQl();

        // sinh(q (L - xi)) / sinh(q L) = e^(-q xi) (L - xi) phi(2 q (L - xi)) / (L phi(2 q L)), and the mirror image.
        var fromLeft = Complex.Exp(-_q * depthMeters) * remaining * ScaledExponentials.Phi(2 * _q * remaining) / (length * phiOfTwoQl);
        var fromRight = Complex.Exp(-_q * remaining) * depthMeters * ScaledExponentials.Phi(2 * _q * depthMeters) / (length * phiOfTwoQl);
        return initialOverS + ((left - initialOverS) * fromLeft) + ((right - initialOverS) * fromRight);
    }

    /// <summary>
    /// Transformed integral of u from depth x1 to depth x2 inside the layer (0 &lt;= x1 &lt;= x2 &lt;= L), in scaled form.
    /// </summary>
    /// <remarks>
    /// The integral of sinh(q (L - xi)) / sinh(q L) over [x1, x2] is [cosh(q (L - x1)) - cosh(q (L - x2))] / (q sinh(q L));
    /// with w = x2 - x1, each difference of exponentials is e^(-a) (b - a) phi(b - a), which gives
    /// w phi(q w) e^(-q x1) (2L - x1 - x2) phi(q (2L - x1 - x2)) / (2 L phi(2 q L)), and for sinh(q xi) / sinh(q L) the
    /// mirror image w phi(q w) e^(-q (L - x2)) (x1 + x2) phi(q (x1 + x2)) / (2 L phi(2 q L)). For small q they tend to
    /// w (2L - x1 - x2) / (2L) and w (x1 + x2) / (2L), the integrals of the straight lines; over the whole layer their
    /// sum is L phi(q L) / (1 + E), as in <see cref="IntegralOfU"/>.
    /// </remarks>
    public Complex IntegralOfUBetween(double fromMeters, double toMeters, Complex left, Complex right, Complex initialOverS)
    {
        var length = _thicknessMeters;
        var width = toMeters - fromMeters;
        var common = width * ScaledExponentials.Phi(_q * width) / (2 * length * PhiOfTwoQl());
        var towardLeft = (2 * length) - fromMeters - toMeters;
        var towardRight = fromMeters + toMeters;
        var fromLeft = common * Complex.Exp(-_q * fromMeters) * towardLeft * ScaledExponentials.Phi(_q * towardLeft);
        var fromRight = common * Complex.Exp(-_q * (length - toMeters)) * towardRight * ScaledExponentials.Phi(_q * towardRight);
        return (width * initialOverS) + ((left - initialOverS) * fromLeft) + ((right - initialOverS) * fromRight);
    }

    /// <summary>phi(2 q L), from E outside the series radius (as the constructor forms it).</summary>
    private Complex PhiOfTwoQl()
    {
        var ql = _q * _thicknessMeters;
        return Complex.Abs(ql) >= ClosedFormFrom ? (Complex.One - (Decay * Decay)) / (2 * ql) : ScaledExponentials.Phi(2 * ql);
    }
}
