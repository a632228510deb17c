using System.Numerics;

namespace Layers.Core.Laplace;

/// <summary>
/// The one function from which every hyperbolic expression of a layer is built in scaled form:
/// phi(w) = (1 - e^(-w)) / w, for Re w &gt;= 0.
/// </summary>
/// <remarks>
/// With E = e^(-w) bounded by 1, sinh, cosh, coth and tanh of a layer are ratios of E and phi that neither overflow
/// when |w| is in the thousands (thick or slow layers) nor lose digits when |w| is tiny (thin or fast layers,
/// late times), where 1 - e^(-w) would cancel: below |w| = 1/2 the Taylor series is summed instead.
/// </remarks>
internal static class ScaledExponentials
{
    private const double SeriesRadius = 0.5;

    // 0.5^18 / 19! is 3e-23: eighteen terms reach round-off inside the series radius.
    private const int SeriesTerms = 18;

    // Fewer terms for smaller |w|: the first term left out, |w|^(K+1) / (K+2)!, stays below 3e-18 (1e-4: K = 3,
    // 1e-2: K = 6, 0.1: K = 9, 1/2: K = 18), and phi is near 1 there.
    private static int TermsFor(double modulus) => modulus <= 1e-4 ? 3 : modulus <= 1e-2 ? 6 : modulus <= 0.1 ? 9 : SeriesTerms;

    // 1 / (k + 1), so that the series multiplies by reals instead of dividing by complex numbers.
    private static readonly double[] Reciprocals = [.. Enumerable.Range(1, SeriesTerms + 1).Select(k => 1.0 / k)];

    /// <summary>e^w for a finite w, from one real exponential and one sine-cosine pair.</summary>
    public static Complex Exp(Complex w)
    {
        var magnitude = Math.Exp(w.Real);
        var (sin, cos) = Math.SinCos(w.Imaginary);
        return new Complex(magnitude * cos, magnitude * sin);
    }

    /// <summary>phi(w) = (1 - e^(-w)) / w, with phi(0) = 1.</summary>
    public static Complex Phi(Complex w)
    {
        if (Complex.Abs(w) >= SeriesRadius)
        {
            return (Complex.One - Exp(-w)) / w;
        }

        // sum over k of (-w)^k / (k + 1)!, summed from the smallest term for accuracy.
        var (real, imaginary) = (-w.Real, -w.Imaginary);
        var (sumReal, sumImaginary) = (0.0, 0.0);
        for (var k = TermsFor(Complex.Abs(w)); k >= 0; k--)
        {
            var reciprocal = Reciprocals[k];
            (sumReal, sumImaginary) = ((1 + (real * sumReal) - (imaginary * sumImaginary)) * reciprocal, ((real * sumImaginary) + (imaginary * sumReal)) * reciprocal);
        }

        return new Complex(sumReal, sumImaginary);
    }
}
