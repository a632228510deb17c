namespace Layers.Core.TimeStepping;

/// <summary>
/// The Thomas factorisation of a tridiagonal matrix and its solve; the factors are written by the caller that knows the
/// matrix (<see cref="ImplicitMatrix"/>). Without pivoting, so the matrix
/// must be diagonally dominant by rows or by columns. O(n) work, no allocation after construction.
/// </summary>
/// <remarks>
/// Each row keeps its inverse pivot 1/p and its elimination multipliers -l/p and -u/p, so that a forward step is
/// y_n = (b_n/p_n) + (-l_n/p_n) y_n-1 and a backward step x_n = y_n + (-u_n/p_n) x_n+1: one fused multiply-add on the
/// critical path of each recurrence instead of a multiply, a subtraction and a multiply. The sweeps are latency-bound
/// (each row waits for the one before), so the length of that chain is the cost of a solve.
/// </remarks>
internal sealed class TridiagonalFactors
{
    private readonly double[] _inversePivot;
    private readonly double[] _lowerMultiplier;
    private readonly double[] _upperMultiplier;

    public TridiagonalFactors(int size)
    {
        _inversePivot = new double[size];
        _lowerMultiplier = new double[size];
        _upperMultiplier = new double[size];
    }

    /// <summary>1 / p_n of every row.</summary>
    public Span<double> InversePivot => _inversePivot;

    /// <summary>-l_n / p_n: minus the entry left of the diagonal over the pivot (0 in the first row).</summary>
    public Span<double> LowerMultiplier => _lowerMultiplier;

    /// <summary>-u_n / p_n: minus the entry right of the diagonal over the pivot (0 in the last row).</summary>
    public Span<double> UpperMultiplier => _upperMultiplier;

    /// <summary>Solves with the rows set; b and x may be the same span.</summary>
    public void Solve(ReadOnlySpan<double> rightHandSide, Span<double> solution)
    {
        // Local spans of one length let the JIT drop the bounds checks; the recurrence is the critical path.
        var count = _inversePivot.Length;
        ReadOnlySpan<double> lowerMultiplier = _lowerMultiplier.AsSpan(0, count);
        ReadOnlySpan<double> inversePivot = _inversePivot.AsSpan(0, count);
        ReadOnlySpan<double> upperMultiplier = _upperMultiplier.AsSpan(0, count);
        var right = rightHandSide[..count];
        var x = solution[..count];
        var previous = 0.0;
        for (var n = 0; n < count; n++)
        {
            previous = Math.FusedMultiplyAdd(lowerMultiplier[n], previous, right[n] * inversePivot[n]);
            x[n] = previous;
        }

        for (var n = count - 2; n >= 0; n--)
        {
            previous = Math.FusedMultiplyAdd(upperMultiplier[n], previous, x[n]);
            x[n] = previous;
        }
    }
}
