namespace Layers.Core.Fitting;

/// <summary>Settings of the Levenberg-Marquardt minimiser, each with its default and admissible range.</summary>
public sealed record LeastSquaresOptions
{
    /// <summary>
    /// The fit has converged when no parameter changes by more than this times (|value| + this) in an accepted
    /// step. Default 1e-6; admissible 1e-15 to 1e-2.
    /// </summary>
    public double StepTolerance { get; init; } = 1e-6;

    /// <summary>
    /// The fit has converged when an accepted step lowers the sum of squares by less than this fraction.
    /// Default 1e-10; admissible 0 to 1e-2.
    /// </summary>
    public double CostTolerance { get; init; } = 1e-10;

    /// <summary>Most Jacobian evaluations (iterations). Default 60; admissible 1 to 10 000.</summary>
    public int MaximumIterations { get; init; } = 60;

    /// <summary>
    /// Largest change of any parameter in one step, or null for no limit. A model fitted in log10 space uses 1, so
    /// that a step never changes a coefficient by more than a factor of ten and the model stays where it can be
    /// solved.
    /// </summary>
    public double? MaximumStep { get; init; }

    /// <summary>Relative step of the central differences for the Jacobian (times max(|value|, 1)). Default 1e-3.</summary>
    public double DifferenceStep { get; init; } = 1e-3;
}
