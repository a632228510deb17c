using System.Runtime.CompilerServices;
using Layers.Core.Discretization;

namespace Layers.Core.TimeStepping;

/// <summary>
/// The matrix Cap + c A of an implicit stage, factored by the Thomas algorithm. It is symmetric, strictly
/// diagonally dominant (Cap &gt; 0) and an M-matrix, so elimination without pivoting is stable. Factoring and each
/// solve are O(n) and allocate nothing after construction.
/// </summary>
/// <remarks>
/// Row n of Cap + c A is (-c G_n-1, Cap_n + c (G_n-1 + G_n), -c G_n), bath conductances included on the diagonal of
/// the end nodes. Only c changes from step to step, so the sums of conductances and the squares G_n-1^2 are kept:
/// the pivot recurrence p_n = Cap_n + c S_n - c^2 G_n-1^2 / p_n-1 then has one fused multiply-add and one division on
/// its critical path.
/// </remarks>
internal sealed class ImplicitMatrix
{
    private readonly double[] _capacity;
    private readonly double[] _conductanceSum;
    private readonly double[] _leftConductance;
    private readonly double[] _rightConductance;
    private readonly double[] _leftConductanceSquared;

    public ImplicitMatrix(DiffusionSystem system)
    {
        var count = system.NodeCount;
        _capacity = system.Capacity;
        _conductanceSum = new double[count];
        _leftConductance = new double[count];
        _rightConductance = new double[count];
        _leftConductanceSquared = new double[count];
        for (var n = 0; n < count; n++)
        {
            var (lower, diagonal, upper) = Row(system, n, 1);
            _conductanceSum[n] = diagonal;
            _leftConductance[n] = -lower;
            _rightConductance[n] = -upper;
            _leftConductanceSquared[n] = lower * lower;
        }

        Factors = new TridiagonalFactors(count);
    }

    /// <summary>The factors of the last factorisation, for sweeps that fuse other work into the solve.</summary>
    public TridiagonalFactors Factors { get; }

    /// <summary>Storage Cap_n of every node.</summary>
    public ReadOnlySpan<double> Capacity => _capacity;

    /// <summary>S_n: the sum of node n's conductances, baths included (the diagonal of A).</summary>
    public ReadOnlySpan<double> ConductanceSum => _conductanceSum;

    /// <summary>G_n-1: the conductance to the node on the left (0 for the first node; -A_n,n-1).</summary>
    public ReadOnlySpan<double> LeftConductance => _leftConductance;

    /// <summary>G_n: the conductance to the node on the right (0 for the last node; -A_n,n+1).</summary>
    public ReadOnlySpan<double> RightConductance => _rightConductance;

    /// <summary>G_n-1^2, kept so that the pivot recurrence does not multiply on its critical path.</summary>
    public ReadOnlySpan<double> LeftConductanceSquared => _leftConductanceSquared;

    /// <summary>Factors Cap + c A for the stage coefficient c (s).</summary>
    public void Factor(double coefficientSeconds) => Factor(coefficientSeconds, default);

    /// <summary>
    /// Factors Cap + c A D, where D = diag(1 - fixed) takes out the columns of the nodes marked in
    /// <paramref name="fixedColumns"/> (empty: none), whose u is held and whose unknown is their content instead.
    /// </summary>
    public void Factor(double coefficientSeconds, ReadOnlySpan<bool> fixedColumns)
    {
        var c = coefficientSeconds;
        var cSquared = c * c;
        var count = _capacity.Length;
        var masked = !fixedColumns.IsEmpty;
        ReadOnlySpan<double> capacity = _capacity.AsSpan(0, count);
        ReadOnlySpan<double> sum = _conductanceSum.AsSpan(0, count);
        ReadOnlySpan<double> left = _leftConductance.AsSpan(0, count);
        ReadOnlySpan<double> right = _rightConductance.AsSpan(0, count);
        ReadOnlySpan<double> leftSquared = _leftConductanceSquared.AsSpan(0, count);
        var inversePivot = Factors.InversePivot[..count];
        var lowerMultiplier = Factors.LowerMultiplier[..count];
        var upperMultiplier = Factors.UpperMultiplier[..count];
        var previous = 0.0;
        for (var n = 0; n < count; n++)
        {
            // -l_n u_n-1 / p_n-1 = -c^2 G_n-1^2 / p_n-1: the product of the entries is off the critical path.
            var product = cSquared * leftSquared[n];
            var diagonal = capacity[n] + (c * sum[n]);
            var lower = c * left[n];
            var upper = c * right[n];
            if (masked)
            {
                var fixedLeft = n > 0 && fixedColumns[n - 1];
                var fixedRight = n < count - 1 && fixedColumns[n + 1];
                product = fixedLeft || fixedColumns[n] ? 0 : product;
                diagonal = fixedColumns[n] ? capacity[n] : diagonal;
                lower = fixedLeft ? 0 : lower;
                upper = fixedRight ? 0 : upper;
            }

            previous = InversePivot(product, previous, diagonal);
            inversePivot[n] = previous;
            lowerMultiplier[n] = lower * previous;
            upperMultiplier[n] = upper * previous;
        }
    }

    /// <summary>
    /// 1 / p_n = 1 / (d_n - l_n u_n-1 / p_n-1), from the product of the off-diagonal entries and 1 / p_n-1: one place
    /// for the rounding of the pivots, shared by every sweep that factors.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double InversePivot(double offDiagonalProduct, double previousInversePivot, double diagonal)
        => 1 / Math.FusedMultiplyAdd(-offDiagonalProduct, previousInversePivot, diagonal);

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
    public void Solve(ReadOnlySpan<double> rightHandSide, Span<double> solution) => Factors.Solve(rightHandSide, solution);
}
