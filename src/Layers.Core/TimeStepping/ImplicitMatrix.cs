using Layers.Core.Discretization;

namespace Layers.Core.TimeStepping;

/// <summary>
/// The matrix Cap + c A of an implicit stage, factored by the Thomas algorithm. It is symmetric, strictly
/// diagonally dominant (Cap &gt; 0) and an M-matrix, so elimination without pivoting is stable. Factoring and each
/// solve are O(n) and allocate nothing after construction.
/// </summary>
internal sealed class ImplicitMatrix
{
    private readonly DiffusionSystem _system;
    private readonly double[] _lower;
    private readonly double[] _upperOverPivot;
    private readonly double[] _inversePivot;

    public ImplicitMatrix(DiffusionSystem system)
    {
        _system = system;
        var n = system.NodeCount;
        _lower = new double[n];
        _upperOverPivot = new double[n];
        _inversePivot = new double[n];
    }

    /// <summary>Factors Cap + c A for the stage coefficient c (s).</summary>
    public void Factor(double coefficientSeconds)
    {
        // Local spans let the JIT drop bounds checks; the recurrence through the pivot is the critical path.
        ReadOnlySpan<double> capacity = _system.Capacity;
        ReadOnlySpan<double> conductance = _system.Conductance;
        var lowerOut = _lower.AsSpan(0, capacity.Length);
        var inversePivot = _inversePivot.AsSpan(0, capacity.Length);
        var upperOverPivot = _upperOverPivot.AsSpan(0, capacity.Length);
        var last = capacity.Length - 1;
        var toLeft = _system.LeftBath.Conductance;
        var previousUpperOverPivot = 0.0;
        var lower = 0.0;
        for (var n = 0; n <= last; n++)
        {
            var toRight = n < last ? conductance[n] : _system.RightBath.Conductance;
            var upper = n < last ? -coefficientSeconds * toRight : 0;
            var pivot = capacity[n] + (coefficientSeconds * (toLeft + toRight)) - (lower * previousUpperOverPivot);
            var inverse = 1 / pivot;
            lowerOut[n] = lower;
            inversePivot[n] = inverse;
            previousUpperOverPivot = upper * inverse;
            upperOverPivot[n] = previousUpperOverPivot;
            toLeft = toRight;
            lower = upper;
        }
    }

    /// <summary>Solves (Cap + c A) x = b with the last factorisation; b and x may be the same span.</summary>
    public void Solve(ReadOnlySpan<double> rightHandSide, Span<double> solution)
    {
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
