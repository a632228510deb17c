using System.Runtime.CompilerServices;
using Layers.Core.Discretization;

namespace Layers.Core.TimeStepping;

/// <summary>
/// The matrix Cap + c A of an implicit stage, factored by the Thomas algorithm. It is symmetric, strictly
/// diagonally dominant (Cap &gt; 0) and an M-matrix, so elimination without pivoting is stable. Factoring and each
/// solve are O(n) and allocate nothing after construction.
/// </summary>
/// <remarks>
/// Row n of Cap + c A is (-c G_n-1, Cap_n + c (G_n-1 + G_n + G_bath), -c G_n), G_bath being the conductance to a bath
/// (end nodes only). The pivots are formed without a subtraction: with E_n the excess of pivot n over what it passes
/// on to the next row, p_n = E_n + c G_n and E_n = Cap_n + c G_bath + c G_n-1 E_n-1 / p_n-1 (the plain recurrence
/// p_n = d_n - c^2 G_n-1^2 / p_n-1 rewritten; every term is positive). The plain recurrence subtracts numbers of size
/// c G from one another to leave one of size Cap: once a step is 1e16 times a cell's diffusion time h^2/D, Cap drowns
/// in the round-off of c G, the pivots of the fast cells come out wrong by orders of magnitude, and the step gains or
/// loses mass. Subtraction-free, every pivot is exact to a few units of round-off whatever the step, as in the
/// elimination of Grassmann, Taksar and Heyman, Oper. Res. 33 (1985) 1107-1116, and the accurate factorisation of
/// diagonally dominant M-matrices from their off-diagonal entries and row sums (Alfa, Xue and Ye, Math. Comp. 71 (2002)
/// 217-236; from memory).
/// </remarks>
internal sealed class ImplicitMatrix
{
    private readonly double[] _capacity;
    private readonly double[] _bathConductance;
    private readonly double[] _leftConductance;
    private readonly double[] _rightConductance;

    public ImplicitMatrix(DiffusionSystem system)
    {
        var count = system.NodeCount;
        _capacity = system.Capacity;
        _bathConductance = new double[count];
        _leftConductance = new double[count];
        _rightConductance = new double[count];
        for (var n = 0; n < count; n++)
        {
            _leftConductance[n] = n > 0 ? system.Conductance[n - 1] : 0;
            _rightConductance[n] = n < count - 1 ? system.Conductance[n] : 0;
        }

        _bathConductance[0] += system.LeftBath.Conductance;
        _bathConductance[count - 1] += system.RightBath.Conductance;
        Factors = new TridiagonalFactors(count);
    }

    /// <summary>The factors of the last factorisation, for sweeps that fuse other work into the solve.</summary>
    public TridiagonalFactors Factors { get; }

    /// <summary>Storage Cap_n of every node.</summary>
    public ReadOnlySpan<double> Capacity => _capacity;

    /// <summary>G_bath of every node: the conductance to a bath (0 but at the end nodes that have one).</summary>
    public ReadOnlySpan<double> BathConductance => _bathConductance;

    /// <summary>G_n-1: the conductance to the node on the left (0 for the first node; -A_n,n-1).</summary>
    public ReadOnlySpan<double> LeftConductance => _leftConductance;

    /// <summary>G_n: the conductance to the node on the right (0 for the last node; -A_n,n+1).</summary>
    public ReadOnlySpan<double> RightConductance => _rightConductance;

    /// <summary>Factors Cap + c A for the stage coefficient c (s).</summary>
    public void Factor(double coefficientSeconds) => Factor(coefficientSeconds, default);

    /// <summary>
    /// Factors Cap + c A D, where D = diag(1 - fixed) takes out the columns of the nodes marked in
    /// <paramref name="fixedColumns"/> (empty: none), whose u is held and whose unknown is their content instead.
    /// </summary>
    /// <remarks>
    /// Cap + c A D is diagonally dominant by columns, so the excess is that of the columns: a column taken out holds
    /// only its storage (E = p = Cap); a free one passes c G_n down and receives c G_n-1 E_n-1 / p_n-1 from above.
    /// </remarks>
    public void Factor(double coefficientSeconds, ReadOnlySpan<bool> fixedColumns)
    {
        var c = coefficientSeconds;
        var count = _capacity.Length;
        var masked = !fixedColumns.IsEmpty;
        ReadOnlySpan<double> capacity = _capacity.AsSpan(0, count);
        ReadOnlySpan<double> bath = _bathConductance.AsSpan(0, count);
        ReadOnlySpan<double> left = _leftConductance.AsSpan(0, count);
        ReadOnlySpan<double> right = _rightConductance.AsSpan(0, count);
        var inversePivot = Factors.InversePivot[..count];
        var lowerMultiplier = Factors.LowerMultiplier[..count];
        var upperMultiplier = Factors.UpperMultiplier[..count];
        var kept = 0.0;
        for (var n = 0; n < count; n++)
        {
            var lower = c * left[n];
            var upper = c * right[n];
            double pivot;
            if (masked && fixedColumns[n])
            {
                pivot = 1 / capacity[n];
                kept = 1;
            }
            else
            {
                (pivot, kept) = Pivot(capacity[n] + (c * bath[n]), lower, kept, upper);
            }

            if (masked)
            {
                lower = n > 0 && fixedColumns[n - 1] ? 0 : lower;
                upper = n < count - 1 && fixedColumns[n + 1] ? 0 : upper;
            }

            inversePivot[n] = pivot;
            lowerMultiplier[n] = lower * pivot;
            upperMultiplier[n] = upper * pivot;
        }
    }

    /// <summary>
    /// 1 / p_n and E_n / p_n from the row's own excess (storage and bath), its coupling c G_n-1 to the row before, that
    /// row's E_n-1 / p_n-1, and its coupling c G_n to the row after: one place for the rounding of the pivots, shared by
    /// every sweep that factors. No subtraction, so no cancellation however large c is.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static (double InversePivot, double Kept) Pivot(double ownExcess, double coupledBefore, double keptBefore, double coupledAfter)
    {
        var excess = Math.FusedMultiplyAdd(coupledBefore, keptBefore, ownExcess);
        var inverse = 1 / (excess + coupledAfter);
        return (inverse, excess * inverse);
    }

    /// <summary>Row n of c A: the entries left of and right of the diagonal, and the diagonal (without storage).</summary>
    public static (double Lower, double Diagonal, double Upper) Row(DiffusionSystem system, int n, double coefficientSeconds)
    {
        var conductance = system.Conductance;
        var last = system.NodeCount - 1;
        var toLeft = system.ConductanceToLeft(n);
        var toRight = system.ConductanceToRight(n);
        var lower = n > 0 ? -coefficientSeconds * conductance[n - 1] : 0;
        var upper = n < last ? -coefficientSeconds * conductance[n] : 0;
        return (lower, coefficientSeconds * (toLeft + toRight), upper);
    }

    /// <summary>Solves (Cap + c A) x = b with the last factorisation; b and x may be the same span.</summary>
    public void Solve(ReadOnlySpan<double> rightHandSide, Span<double> solution) => Factors.Solve(rightHandSide, solution);
}
