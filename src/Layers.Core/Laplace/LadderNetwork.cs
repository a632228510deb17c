using System.Numerics;

namespace Layers.Core.Laplace;

/// <summary>
/// Solves the node equations of a ladder network: nodes 0..n-1 in a row, node i joined to node i+1 by the series
/// admittance H[i] and to ground by the shunt admittance E[i], with a source J[i] at each node:
/// -H[i-1] x[i-1] + (H[i-1] + H[i] + E[i]) x[i] - H[i] x[i+1] = J[i]. Either end may instead be held at a value.
/// </summary>
/// <remarks>
/// This is tridiagonal elimination with the pivots kept in the form "series admittance plus the admittance to
/// ground seen to the left", delta[i] = E[i] + H[i-1] delta[i-1] / (H[i-1] + delta[i-1]): a series-parallel
/// reduction of the network. Plain elimination forms H + delta - H^2 / (H + delta) and loses delta whenever it
/// is small next to H: a thin, fast layer (large P / L) whose storage s K L is tiny at late times, or a weak film
/// before a conductive layer. Written this way no difference of large terms is ever formed, so the solve keeps
/// its relative accuracy over any spread of D, K and thickness (the same idea as the Grassmann-Taksar-Heyman
/// elimination for Markov chains).
/// </remarks>
internal static class LadderNetwork
{
    /// <summary>Solves the network; <paramref name="heldLeft"/> / <paramref name="heldRight"/> fix x[0] / x[n-1] when given.</summary>
    /// <param name="series">H[i] between node i and i+1, n-1 values.</param>
    /// <param name="shunt">E[i] from node i to ground, n values (ignored at a held end).</param>
    /// <param name="source">J[i], n values (ignored at a held end).</param>
    /// <param name="heldLeft">The value at which node 0 is held, or null.</param>
    /// <param name="heldRight">The value at which node n-1 is held, or null.</param>
    public static Complex[] Solve(Complex[] series, Complex[] shunt, Complex[] source, Complex? heldLeft, Complex? heldRight)
    {
        var n = shunt.Length;
        var x = new Complex[n];
        Solve(series, shunt, source, heldLeft, heldRight, x, new Complex[n], new Complex[n]);
        return x;
    }

    /// <summary>The same into <paramref name="x"/>, with the caller's scratch for the pivots and reduced sources (n values each).</summary>
    public static void Solve(
        ReadOnlySpan<Complex> series,
        ReadOnlySpan<Complex> shunt,
        ReadOnlySpan<Complex> source,
        Complex? heldLeft,
        Complex? heldRight,
        Span<Complex> x,
        Span<Complex> pivot,
        Span<Complex> reduced)
    {
        var n = shunt.Length;
        var first = 0;
        var last = n - 1;
        if (heldLeft is { } left)
        {
            x[0] = left;
            first = 1;
        }

        if (heldRight is { } right)
        {
            x[n - 1] = right;
            last = n - 2;
        }

        // delta[i]: admittance to ground of node i and everything left of it; reduced[i]: the source carried along.
        var toGround = Complex.Zero;
        var carried = Complex.Zero;
        for (var i = first; i <= last; i++)
        {
            var delta = shunt[i];
            var j = source[i];
            if (i > 0)
            {
                if (i == first)
                {
                    // Held neighbour on the left: its link goes straight to a node of known value.
                    delta += series[i - 1];
                    j += series[i - 1] * x[i - 1];
                }
                else
                {
                    // H / (H + delta) once: the share of the link in the series pair.
                    var share = Divide(series[i - 1], series[i - 1] + toGround);
                    delta += share * toGround;
                    j += share * carried;
                }
            }

            if (i == last && i < n - 1)
            {
                // Held neighbour on the right.
                delta += series[i];
                j += series[i] * x[i + 1];
            }

            toGround = delta;
            carried = j;
            pivot[i] = i < last ? series[i] + delta : delta;
            reduced[i] = j;
        }

        for (var i = last; i >= first; i--)
        {
            var coupled = i < last ? series[i] * x[i + 1] : Complex.Zero;
            x[i] = Divide(reduced[i] + coupled, pivot[i]);
        }
    }

    // a / b as a conj(b) / |b|^2, one real division instead of Smith's three; admittances stay far inside the range
    // where |b|^2 neither overflows nor underflows, and outside it the library's scaled division is used.
    private static Complex Divide(Complex a, Complex b)
    {
        var squared = (b.Real * b.Real) + (b.Imaginary * b.Imaginary);
        if (!(squared > 1e-280 && squared < 1e280))
        {
            return a / b;
        }

        var inverse = 1 / squared;
        return new Complex(
            ((a.Real * b.Real) + (a.Imaginary * b.Imaginary)) * inverse,
            ((a.Imaginary * b.Real) - (a.Real * b.Imaginary)) * inverse);
    }
}
