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
    private readonly TridiagonalFactors _factors;

    public ImplicitMatrix(DiffusionSystem system)
    {
        _system = system;
        _factors = new TridiagonalFactors(system.NodeCount);
    }

    /// <summary>Factors Cap + c A for the stage coefficient c (s).</summary>
    public void Factor(double coefficientSeconds)
    {
        var capacity = _system.Capacity;
        for (var n = 0; n < capacity.Length; n++)
        {
            var (lower, coupling, upper) = Row(_system, n, coefficientSeconds);
            _factors.SetRow(n, lower, capacity[n] + coupling, upper);
        }
    }

    /// <summary>Row n of c A: the entries left of and right of the diagonal, and the diagonal (without storage).</summary>
    public static (double Lower, double Diagonal, double Upper) Row(DiffusionSystem system, int n, double coefficientSeconds)
    {
        var conductance = system.Conductance;
        var last = system.NodeCount - 1;
        var toLeft = n > 0 ? conductance[n - 1] : system.LeftBath.Conductance;
        var toRight = n < last ? conductance[n] : system.RightBath.Conductance;
        var lower = n > 0 ? -coefficientSeconds * conductance[n - 1] : 0;
        var upper = n < last ? -coefficientSeconds * conductance[n] : 0;
        return (lower, coefficientSeconds * (toLeft + toRight), upper);
    }

    /// <summary>Solves (Cap + c A) x = b with the last factorisation; b and x may be the same span.</summary>
    public void Solve(ReadOnlySpan<double> rightHandSide, Span<double> solution) => _factors.Solve(rightHandSide, solution);
}
