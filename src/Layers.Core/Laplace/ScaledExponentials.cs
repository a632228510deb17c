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

    /// <summary>phi(w) = (1 - e^(-w)) / w, with phi(0) = 1.</summary>
    public static Complex Phi(Complex w)
    {
        if (Complex.Abs(w) >= SeriesRadius)
        {
            return (Complex.One - Complex.Exp(-w)) / w;
        }

        // sum over k of (-w)^k / (k + 1)!, summed from the smallest term for accuracy.
        var sum = Complex.Zero;
        for (var k = SeriesTerms; k >= 0; k--)
        {
            sum = (Complex.One + (-w * sum)) / (k + 1);
        }

        return sum;
    }
}
