namespace Layers.Core.TimeStepping;

/// <summary>
/// The Thomas factorisation of a tridiagonal matrix, set row by row, and its solve. Without pivoting, so the matrix
/// must be diagonally dominant by rows or by columns. O(n) work, no allocation after construction.
/// </summary>
internal sealed class TridiagonalFactors
{
    private readonly double[] _lower;
    private readonly double[] _upperOverPivot;
    private readonly double[] _inversePivot;

    public TridiagonalFactors(int size)
    {
        _lower = new double[size];
        _upperOverPivot = new double[size];
        _inversePivot = new double[size];
    }

    /// <summary>Eliminates row n (rows in ascending order): its entries left of, on and right of the diagonal.</summary>
    public void SetRow(int n, double lower, double diagonal, double upper)
    {
        var pivot = diagonal - (n > 0 ? lower * _upperOverPivot[n - 1] : 0);
        _lower[n] = lower;
        _inversePivot[n] = 1 / pivot;
        _upperOverPivot[n] = upper / pivot;
    }

    /// <summary>Solves with the rows set; b and x may be the same span.</summary>
    public void Solve(ReadOnlySpan<double> rightHandSide, Span<double> solution)
    {
        // Local spans of one length let the JIT drop the bounds checks; the recurrence is the critical path.
        var count = _inversePivot.Length;
        ReadOnlySpan<double> lower = _lower.AsSpan(0, count);
        ReadOnlySpan<double> inversePivot = _inversePivot.AsSpan(0, count);
        ReadOnlySpan<double> upperOverPivot = _upperOverPivot.AsSpan(0, count);
        var right = rightHandSide[..count];
        var x = solution[..count];
        var previous = 0.0;
        for (var n = 0; n < count; n++)
        {
            previous = (right[n] - (lower[n] * previous)) * inversePivot[n];
            x[n] = previous;
        }

        for (var n = count - 2; n >= 0; n--)
        {
            previous = x[n] - (upperOverPivot[n] * previous);
            x[n] = previous;
        }
    }
}
