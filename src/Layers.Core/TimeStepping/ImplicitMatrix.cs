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
        var capacity = _system.Capacity;
        var conductance = _system.Conductance;
        var last = capacity.Length - 1;
        var previousUpperOverPivot = 0.0;
        for (var n = 0; n <= last; n++)
        {
            var toLeft = n > 0 ? conductance[n - 1] : _system.LeftBath.Conductance;
            var toRight = n < last ? conductance[n] : _system.RightBath.Conductance;
            var lower = n > 0 ? -coefficientSeconds * conductance[n - 1] : 0;
            var upper = n < last ? -coefficientSeconds * conductance[n] : 0;
            var diagonal = capacity[n] + (coefficientSeconds * (toLeft + toRight));
            var pivot = diagonal - (lower * previousUpperOverPivot);
            _lower[n] = lower;
            _inversePivot[n] = 1 / pivot;
            _upperOverPivot[n] = upper / pivot;
            previousUpperOverPivot = _upperOverPivot[n];
        }
    }

    /// <summary>Solves (Cap + c A) x = b with the last factorisation; b and x may be the same span.</summary>
    public void Solve(ReadOnlySpan<double> rightHandSide, Span<double> solution)
    {
        var last = _inversePivot.Length - 1;
        var previous = 0.0;
        for (var n = 0; n <= last; n++)
        {
            previous = (rightHandSide[n] - (_lower[n] * previous)) * _inversePivot[n];
            solution[n] = previous;
        }

        for (var n = last - 1; n >= 0; n--)
        {
            solution[n] -= _upperOverPivot[n] * solution[n + 1];
        }
    }
}
