using Layers.Core.Discretization;

namespace Layers.Core.TimeStepping;

/// <summary>
/// The stage equation of a stack with dispersed layers, Cap w + c A u(w) = b with u = min(w, u_sat): storage is the
/// whole content w, fluxes are driven by the dissolved u only. Solved by the primal-dual active-set iteration
/// (semismooth Newton for the min function): guess which nodes are saturated, solve the linear system in which a
/// saturated node's u is fixed at u_sat and its content is free, re-classify the nodes by the new content, repeat until
/// the classification stops changing. Each iteration is one tridiagonal solve; the front moves a few cells per step at
/// most, so it ends in one to three iterations. The last system solved is exact for the final classification, so the
/// update is in conserved form and the mass balance closes to round-off.
/// </summary>
/// <remarks>
/// Hintermueller, Ito and Kunisch, SIAM J. Optim. 13 (2003) 865-888 (the active-set method as a semismooth Newton
/// method; finite convergence for M-matrices). The matrix Cap + c A D, with D = diag(1 - saturated), is column
/// diagonally dominant because A is symmetric with non-negative row sums, so Thomas elimination without pivoting is
/// stable.
/// </remarks>
internal sealed class CappedStageSolver : IStageSolver
{
    private const int MaximumIterations = 40;

    /// <summary>Relative slack before a node is re-classified, so that round-off at u_sat cannot make it flip back and forth.</summary>
    private const double Slack = 1e-12;

    private readonly DiffusionSystem _system;
    private readonly double[] _saturation;
    private readonly bool[] _saturated;
    private readonly ImplicitMatrix _matrix;
    private readonly double[] _work;
    private double _coefficient;

    public CappedStageSolver(DiffusionSystem system)
    {
        _system = system;
        _saturation = system.Saturation ?? throw new ArgumentException("The system has no saturation values.", nameof(system));
        var n = system.NodeCount;
        _saturated = new bool[n];
        _matrix = new ImplicitMatrix(system);
        _work = new double[n];
    }

    public void Prepare(double coefficientSeconds) => _coefficient = coefficientSeconds;

    public bool Solve(ReadOnlySpan<double> rightHandSide, Span<double> content, Span<double> dissolved)
    {
        for (var i = 0; i < _saturated.Length; i++)
        {
            _saturated[i] = content[i] > _saturation[i];
        }

        for (var iteration = 0; iteration < MaximumIterations; iteration++)
        {
            FactorAndSolve(rightHandSide, content);
            if (!Reclassify(content))
            {
                for (var i = 0; i < _saturated.Length; i++)
                {
                    dissolved[i] = _saturated[i] ? _saturation[i] : content[i];
                }

                return true;
            }
        }

        return false;
    }

    public void Filter(Span<double> values) => _matrix.Solve(values, values);

    public void Dissolve(ReadOnlySpan<double> content, Span<double> dissolved)
    {
        for (var i = 0; i < content.Length; i++)
        {
            dissolved[i] = Math.Min(content[i], _saturation[i]);
        }
    }

    /// <summary>True when some node changed class.</summary>
    private bool Reclassify(ReadOnlySpan<double> content)
    {
        var changed = false;
        for (var i = 0; i < _saturated.Length; i++)
        {
            var cap = _saturation[i];
            if (_saturated[i] ? content[i] < cap * (1 - Slack) : content[i] > cap * (1 + Slack))
            {
                _saturated[i] = !_saturated[i];
                changed = true;
            }
        }

        return changed;
    }

    /// <summary>
    /// Factors Cap + c A D and solves it for b - c A (u_sat on the saturated nodes): the unknown of a free node is its u
    /// (= w), of a saturated node its content w, whose own column then holds only the storage.
    /// </summary>
    private void FactorAndSolve(ReadOnlySpan<double> rightHandSide, Span<double> content)
    {
        var last = _saturated.Length - 1;
        for (var n = 0; n <= last; n++)
        {
            var (lower, diagonal, upper) = ImplicitMatrix.Row(_system, n, _coefficient);
            var fixedPart = 0.0;
            if (_saturated[n])
            {
                fixedPart += diagonal * _saturation[n];
            }

            if (n > 0 && _saturated[n - 1])
            {
                fixedPart += lower * _saturation[n - 1];
            }

            if (n < last && _saturated[n + 1])
            {
                fixedPart += upper * _saturation[n + 1];
            }

            _work[n] = rightHandSide[n] - fixedPart;
        }

        _matrix.Factor(_coefficient, _saturated);
        _matrix.Solve(_work, content);
    }
}
