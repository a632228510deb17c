using Layers.Core.Domain;

namespace Layers.Core.Fitting;

/// <summary>One estimated input.</summary>
/// <param name="Parameter">The input: path, unit and starting value.</param>
/// <param name="Value">The estimate, in the unit of the case.</param>
/// <param name="Log10StandardError">Standard error of log10 of the estimate; +infinity when the data do not determine it.</param>
/// <param name="Lower">Lower end of the confidence interval, in the unit of the case; null when not identifiable.</param>
/// <param name="Upper">Upper end of the confidence interval; null when not identifiable.</param>
/// <param name="Identifiable">False when the data do not determine this input on its own (see the findings).</param>
public sealed record FitEstimate(FitParameter Parameter, double Value, double Log10StandardError, double? Lower, double? Upper, bool Identifiable)
{
    /// <summary>The relative standard error of the estimate, ln(10) times that of its log10 (first order).</summary>
    public double RelativeStandardError => Math.Log(10) * Log10StandardError;
}

/// <summary>
/// A combination of inputs that the data determine although its members are not each determined, e.g. the product
/// D K of a membrane fitted from its steady flux alone: value = X * Y^Exponent.
/// </summary>
/// <param name="Text">The combination, e.g. "layers[0].diffusionCoefficient × layers[0].partitionCoefficient".</param>
/// <param name="Unit">Its unit, from the units of its members.</param>
/// <param name="Value">Its estimate.</param>
/// <param name="Lower">Lower end of its confidence interval.</param>
/// <param name="Upper">Upper end of its confidence interval.</param>
public sealed record FitCombination(string Text, string Unit, double Value, double Lower, double Upper);

/// <summary>
/// Something the data tell poorly: an input, or a pair of inputs, not identifiable from these data, or a pair so
/// strongly correlated that only a combination of them is well determined.
/// </summary>
/// <param name="Paths">The inputs concerned.</param>
/// <param name="Message">What is not determined and why, in words.</param>
/// <param name="Combination">What the data do determine instead, where that can be said.</param>
/// <param name="NotIdentifiable">True when the inputs concerned are not identifiable (they get no interval); false for a note.</param>
public sealed record FitFinding(IReadOnlyList<string> Paths, string Message, FitCombination? Combination, bool NotIdentifiable);

/// <summary>One measurement beside the fitted model.</summary>
/// <param name="TimeSeconds">Time, s.</param>
/// <param name="Measured">Measured value, SI.</param>
/// <param name="Deviation">Its standard deviation, SI, or null.</param>
/// <param name="Model">The fitted model's value at that time, SI.</param>
public sealed record FitPoint(double TimeSeconds, double Measured, double? Deviation, double Model)
{
    /// <summary>Measured minus model, SI.</summary>
    public double Residual => Measured - Model;

    /// <summary>The residual over the standard deviation, or the residual itself when none is given.</summary>
    public double WeightedResidual => Residual / (Deviation ?? 1);
}

/// <summary>Everything a fit produced.</summary>
public sealed record FitResult
{
    /// <summary>The fitted case (the case with the estimates substituted), solved for the curve.</summary>
    public required SimulationCase FittedCase { get; init; }

    /// <summary>The fitted case document, to run again with <c>layers run</c>.</summary>
    public required string FittedCaseJson { get; init; }

    /// <summary>The request.</summary>
    public required FitRequest Request { get; init; }

    /// <summary>The estimates, in the order of the request.</summary>
    public required IReadOnlyList<FitEstimate> Estimates { get; init; }

    /// <summary>Correlation of the estimates (of their log10), p x p; NaN where undefined.</summary>
    public required double[,] Correlation { get; init; }

    /// <summary>What the data do not determine, and notes on strongly correlated pairs; empty when all is well.</summary>
    public required IReadOnlyList<FitFinding> Findings { get; init; }

    /// <summary>Each measurement with the model and the residual.</summary>
    public required IReadOnlyList<FitPoint> Points { get; init; }

    /// <summary>The fitted model at every output time of the run: (time s, value SI).</summary>
    public required IReadOnlyList<(double TimeSeconds, double Value)> Curve { get; init; }

    /// <summary>The sum of squared (weighted) residuals at the estimate.</summary>
    public required double SumOfSquares { get; init; }

    /// <summary>n - p.</summary>
    public required int DegreesOfFreedom { get; init; }

    /// <summary>
    /// s = sqrt(sum of squares / (n - p)): the residual standard error in SI without standard deviations, and the
    /// square root of the reduced chi-square with them (near 1 when the model and the standard deviations fit).
    /// </summary>
    public double ResidualScale => Math.Sqrt(SumOfSquares / DegreesOfFreedom);

    /// <summary>The Student-t quantile used for the intervals.</summary>
    public required double TQuantile { get; init; }

    /// <summary>s_max / s_min of the weighted Jacobian in log10 space, columns scaled to unit length; infinity when rank-deficient.</summary>
    public required double ConditionNumber { get; init; }

    /// <summary>Iterations of the minimiser.</summary>
    public required int Iterations { get; init; }

    /// <summary>Model runs in all.</summary>
    public required int ModelRuns { get; init; }

    /// <summary>Why the minimiser stopped.</summary>
    public required LeastSquaresStop Stop { get; init; }

    /// <summary>True when the minimiser found a minimum (converged, or no step lowers the sum further).</summary>
    public bool FoundMinimum => Stop != LeastSquaresStop.MaximumIterations;

    /// <summary>True when the fit found a minimum and every estimate is identifiable.</summary>
    public bool IsTrustworthy => FoundMinimum && Estimates.All(estimate => estimate.Identifiable);
}
