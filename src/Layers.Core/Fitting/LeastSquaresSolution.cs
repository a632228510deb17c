using MathNet.Numerics.LinearAlgebra;

namespace Layers.Core.Fitting;

/// <summary>Why the minimiser stopped.</summary>
public enum LeastSquaresStop
{
    /// <summary>The last step changed the parameters or the sum of squares by less than the tolerances.</summary>
    Converged,

    /// <summary>No step, however short, lowers the sum of squares further: a minimum to the model's precision.</summary>
    NoFurtherDecrease,

    /// <summary>The iteration limit was reached first.</summary>
    MaximumIterations,
}

/// <summary>Where the minimiser ended.</summary>
/// <param name="Parameters">The parameters at the minimum.</param>
/// <param name="Residuals">The (weighted) residuals there.</param>
/// <param name="Jacobian">dr/dp there, by central differences (rows: residuals, columns: parameters).</param>
/// <param name="Iterations">Jacobian evaluations during the search.</param>
/// <param name="Evaluations">Residual evaluations in all (model runs).</param>
/// <param name="Stop">Why it stopped.</param>
public sealed record LeastSquaresSolution(
    IReadOnlyList<double> Parameters,
    IReadOnlyList<double> Residuals,
    Matrix<double> Jacobian,
    int Iterations,
    int Evaluations,
    LeastSquaresStop Stop)
{
    /// <summary>Sum of squared residuals at the minimum.</summary>
    public double SumOfSquares => Residuals.Sum(r => r * r);
}
