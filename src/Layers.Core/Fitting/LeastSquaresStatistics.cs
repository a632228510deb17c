using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;

namespace Layers.Core.Fitting;

/// <summary>
/// The linearised uncertainty of a least-squares estimate: covariance s^2 (J^T J)^-1 with
/// s^2 = sum r_i^2 / (n - p), standard errors, correlations and Student-t confidence intervals (Bates and Watts,
/// Nonlinear Regression Analysis and Its Applications, 1988, ch. 2, from memory; the NIST StRD nonlinear
/// regression data sets certify standard errors computed this way). The inverse is taken through the singular value
/// decomposition of J (columns scaled to unit length), so that directions in parameter space the data do not determine (singular values
/// below <see cref="RankTolerance"/> of the largest) are found and named rather than inverted into nonsense.
/// </summary>
/// <param name="Observations">n.</param>
/// <param name="DegreesOfFreedom">n - p.</param>
/// <param name="ResidualVariance">s^2 = sum r_i^2 / (n - p).</param>
/// <param name="Covariance">s^2 V S^-2 V^T over the determined directions.</param>
/// <param name="StandardErrors">Square roots of the diagonal; +infinity for a parameter along an undetermined direction.</param>
/// <param name="Correlation">Correlation of the estimates; +-1 between parameters that share an undetermined direction.</param>
/// <param name="TQuantile">The two-sided Student-t quantile for the confidence level with n - p degrees of freedom.</param>
/// <param name="ConditionNumber">
/// s_max / s_min of J with its columns scaled to unit length (the square root of the condition number of the scaled
/// J^T J); infinity when rank-deficient.
/// </param>
/// <param name="UndeterminedDirections">Unit vectors in parameter space along which the data give no information.</param>
public sealed record LeastSquaresStatistics(
    int Observations,
    int DegreesOfFreedom,
    double ResidualVariance,
    Matrix<double> Covariance,
    IReadOnlyList<double> StandardErrors,
    Matrix<double> Correlation,
    double TQuantile,
    double ConditionNumber,
    IReadOnlyList<IReadOnlyList<double>> UndeterminedDirections)
{
    /// <summary>Singular values of J below this fraction of the largest count as zero (cond(J^T J) above 1e10).</summary>
    public const double RankTolerance = 1e-5;

    /// <summary>The statistics of a solution; needs more observations than parameters.</summary>
    /// <param name="jacobian">dr/dp at the estimate.</param>
    /// <param name="residuals">r at the estimate.</param>
    /// <param name="confidence">Two-sided confidence level of the intervals, e.g. 0.95.</param>
    public static LeastSquaresStatistics Of(Matrix<double> jacobian, IReadOnlyList<double> residuals, double confidence)
    {
        ArgumentNullException.ThrowIfNull(jacobian);
        ArgumentNullException.ThrowIfNull(residuals);
        var n = residuals.Count;
        var p = jacobian.ColumnCount;
        if (n <= p)
        {
            throw new ArgumentException($"{n} observations cannot give the uncertainty of {p} parameters; more observations than parameters are needed", nameof(residuals));
        }

        var dof = n - p;
        var variance = residuals.Sum(r => r * r) / dof;
        // Columns scaled to unit length first, so that the rank test does not depend on the units of the parameters.
        var norms = Enumerable.Range(0, p).Select(j => jacobian.Column(j).L2Norm()).Select(norm => norm > 0 ? norm : 1).ToArray();
        var unscale = Matrix<double>.Build.DenseOfDiagonalArray(norms.Select(norm => 1 / norm).ToArray());
        var svd = (jacobian * unscale).Svd(computeVectors: true);
        var singular = svd.S.ToArray();
        var v = svd.VT.Transpose();
        var largest = singular.DefaultIfEmpty(0).Max();
        var covariance = Matrix<double>.Build.Dense(p, p);
        var undetermined = new List<IReadOnlyList<double>>();
        for (var k = 0; k < p; k++)
        {
            var value = k < singular.Length ? singular[k] : 0;
            var direction = unscale * v.Column(k);
            if (largest > 0 && value > RankTolerance * largest)
            {
                covariance += direction.OuterProduct(direction) * (variance / (value * value));
            }
            else
            {
                undetermined.Add(direction.Normalize(2).ToArray());
            }
        }

        var errors = new double[p];
        var correlation = Matrix<double>.Build.Dense(p, p);
        for (var i = 0; i < p; i++)
        {
            errors[i] = undetermined.Any(d => Math.Abs(d[i]) > 1e-3) ? double.PositiveInfinity : Math.Sqrt(covariance[i, i]);
        }

        for (var i = 0; i < p; i++)
        {
            for (var j = 0; j < p; j++)
            {
                var shared = undetermined.FirstOrDefault(d => Math.Abs(d[i]) > 1e-3 && Math.Abs(d[j]) > 1e-3);
                correlation[i, j] = i == j ? 1
                    : shared is not null ? Math.Sign(shared[i] * shared[j])
                    : double.IsFinite(errors[i]) && double.IsFinite(errors[j]) && errors[i] > 0 && errors[j] > 0 ? covariance[i, j] / (errors[i] * errors[j])
                    : double.NaN;
            }
        }

        var smallest = singular.Length < p ? 0 : singular.Min();
        return new LeastSquaresStatistics(
            n,
            dof,
            variance,
            covariance,
            errors,
            correlation,
            StudentT.InvCDF(0, 1, dof, 0.5 + (confidence / 2)),
            smallest > 0 ? largest / smallest : double.PositiveInfinity,
            undetermined);
    }
}
