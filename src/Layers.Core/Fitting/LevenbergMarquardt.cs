using MathNet.Numerics.LinearAlgebra;

namespace Layers.Core.Fitting;

/// <summary>
/// Levenberg-Marquardt minimisation of a sum of squared residuals, sum_i r_i(p)^2, with Marquardt's scaling by the
/// diagonal of J^T J and the Jacobian by central differences (Levenberg, Q. Appl. Math. 2 (1944) 164; Marquardt,
/// J. SIAM 11 (1963) 431; Nocedal and Wright, Numerical Optimization, 2nd ed., ch. 10). Each step solves
/// (J^T J + lambda diag(J^T J)) delta = -J^T r; a step that lowers the sum is taken and lambda shrinks tenfold,
/// otherwise lambda grows tenfold and the step is tried again.
/// </summary>
/// <remarks>
/// The residual function may return null where the model cannot be evaluated (a substituted value breaks a rule of
/// the case, or the solver stops): such a trial counts as a failed step. The columns of the Jacobian are computed
/// in parallel, since each needs two independent model evaluations.
/// </remarks>
public static class LevenbergMarquardt
{
    private const double InitialDamping = 1e-3;
    private const double MaximumDamping = 1e12;

    /// <summary>Minimises from <paramref name="start"/>.</summary>
    /// <param name="residuals">r(p), weighted already; null where the model cannot be evaluated.</param>
    /// <param name="start">Starting parameters.</param>
    /// <param name="options">Tolerances and limits.</param>
    /// <param name="cancellation">Stops between model evaluations.</param>
    /// <returns>The solution, or null when the model cannot be evaluated at the start.</returns>
    public static LeastSquaresSolution? Minimize(
        Func<double[], double[]?> residuals,
        IReadOnlyList<double> start,
        LeastSquaresOptions options,
        CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(residuals);
        ArgumentNullException.ThrowIfNull(options);
        var evaluations = 0;
        double[]? Evaluate(double[] point)
        {
            cancellation.ThrowIfCancellationRequested();
            Interlocked.Increment(ref evaluations);
            var result = residuals(point);
            return result is not null && result.All(double.IsFinite) ? result : null;
        }

        var parameters = start.ToArray();
        if (Evaluate(parameters) is not { } current)
        {
            return null;
        }

        var cost = SumOfSquares(current);
        var damping = InitialDamping;
        var iterations = 0;
        var reason = LeastSquaresStop.MaximumIterations;
        while (iterations < options.MaximumIterations)
        {
            iterations++;
            var jacobian = Jacobian(Evaluate, parameters, current, options.DifferenceStep);
            var normal = jacobian.TransposeThisAndMultiply(jacobian);
            var gradient = jacobian.TransposeThisAndMultiply(Vector<double>.Build.DenseOfArray(current));
            var scale = Scaling(normal);
            var accepted = false;
            double[] step = [];
            var previousCost = cost;
            while (!accepted && damping <= MaximumDamping)
            {
                step = Step(normal, gradient, scale, damping, options.MaximumStep);
                var trial = parameters.Zip(step, (p, d) => p + d).ToArray();
                if (step.All(double.IsFinite) && Evaluate(trial) is { } trialResiduals && SumOfSquares(trialResiduals) < cost)
                {
                    parameters = trial;
                    current = trialResiduals;
                    cost = SumOfSquares(trialResiduals);
                    damping = Math.Max(damping / 10, 1e-12);
                    accepted = true;
                }
                else
                {
                    damping *= 10;
                }
            }

            if (!accepted)
            {
                reason = LeastSquaresStop.NoFurtherDecrease;
                break;
            }

            var smallStep = step.Zip(parameters).All(pair => Math.Abs(pair.First) <= options.StepTolerance * (Math.Abs(pair.Second) + options.StepTolerance));
            if (smallStep || previousCost - cost <= options.CostTolerance * previousCost)
            {
                reason = LeastSquaresStop.Converged;
                break;
            }
        }

        var final = Jacobian(Evaluate, parameters, current, options.DifferenceStep);
        return new LeastSquaresSolution(parameters, current, final, iterations, evaluations, reason);
    }

    /// <summary>
    /// dr/dp by central differences, h = step * max(|p|, 1); a one-sided difference where one side cannot be
    /// evaluated, and a zero column where neither can.
    /// </summary>
    internal static Matrix<double> Jacobian(Func<double[], double[]?> evaluate, double[] parameters, double[] atParameters, double step)
    {
        var columns = new double[parameters.Length][];
        try
        {
            Parallel.For(0, parameters.Length, j => columns[j] = Column(evaluate, parameters, atParameters, step, j));
        }
        catch (AggregateException exception) when (exception.InnerExceptions.Any(inner => inner is OperationCanceledException))
        {
            // Cancellation reaches the caller as itself, not wrapped by the parallel loop.
            throw new OperationCanceledException("the fit was cancelled", exception);
        }

        return Matrix<double>.Build.DenseOfColumnArrays(columns);
    }

    private static double[] Column(Func<double[], double[]?> evaluate, double[] parameters, double[] atParameters, double step, int j)
    {
        var h = step * Math.Max(Math.Abs(parameters[j]), 1);
        var plus = (double[])parameters.Clone();
        var minus = (double[])parameters.Clone();
        plus[j] += h;
        minus[j] -= h;
        var up = evaluate(plus);
        var down = evaluate(minus);
        return (up, down) switch
        {
            ({ } u, { } d) => u.Zip(d, (a, b) => (a - b) / (2 * h)).ToArray(),
            ({ } u, null) => u.Zip(atParameters, (a, b) => (a - b) / h).ToArray(),
            (null, { } d) => atParameters.Zip(d, (a, b) => (a - b) / h).ToArray(),
            _ => new double[atParameters.Length],
        };
    }

    private static double SumOfSquares(double[] residuals) => residuals.Sum(r => r * r);

    /// <summary>Marquardt's scaling: the diagonal of J^T J, kept away from zero for a parameter with no effect.</summary>
    private static double[] Scaling(Matrix<double> normal)
    {
        var diagonal = normal.Diagonal().ToArray();
        var largest = diagonal.DefaultIfEmpty(0).Max();
        var floor = largest > 0 ? largest * 1e-12 : 1;
        return diagonal.Select(d => Math.Max(d, floor)).ToArray();
    }

    private static double[] Step(Matrix<double> normal, Vector<double> gradient, double[] scale, double damping, double? maximumStep)
    {
        var damped = normal.Clone();
        for (var j = 0; j < scale.Length; j++)
        {
            damped[j, j] += damping * scale[j];
        }

        var step = damped.Solve(-gradient).ToArray();
        var largest = step.Select(Math.Abs).DefaultIfEmpty(0).Max();
        if (maximumStep is { } limit && largest > limit)
        {
            step = step.Select(d => d * limit / largest).ToArray();
        }

        return step;
    }
}
