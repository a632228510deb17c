namespace Layers.Core.Verification;

/// <summary>The outcome of one verification benchmark: a computed value against its analytic reference.</summary>
/// <param name="Name">Short name of the benchmark.</param>
/// <param name="Source">The published source of the analytic value (book, chapter, equation).</param>
/// <param name="Quantity">What is compared, with its unit.</param>
/// <param name="Analytic">The analytic value.</param>
/// <param name="Computed">The value the solver computed: by the finite volumes at <see cref="VerificationSuite.BenchmarkNumerics"/>, or by the exact method where the name ends with <see cref="VerificationSuite.ExactSuffix"/>.</param>
/// <param name="Tolerance">Largest accepted relative error.</param>
/// <param name="Curve">Computed and analytic values over time, for an overlay plot, when the benchmark has one.</param>
public sealed record BenchmarkResult(
    string Name,
    string Source,
    string Quantity,
    double Analytic,
    double Computed,
    double Tolerance,
    BenchmarkCurve? Curve = null)
{
    /// <summary>|computed - analytic| / |analytic|.</summary>
    public double RelativeError => Math.Abs(Computed - Analytic) / Math.Abs(Analytic);

    /// <summary>True when the relative error is within the tolerance.</summary>
    public bool Passed => RelativeError <= Tolerance;
}

/// <summary>A computed and an analytic curve on the same abscissae.</summary>
/// <param name="XLabel">Abscissa title with unit.</param>
/// <param name="YLabel">Ordinate title with unit.</param>
/// <param name="X">Abscissae.</param>
/// <param name="Computed">Solver values.</param>
/// <param name="Analytic">Reference values.</param>
public sealed record BenchmarkCurve(string XLabel, string YLabel, IReadOnlyList<double> X, IReadOnlyList<double> Computed, IReadOnlyList<double> Analytic);
