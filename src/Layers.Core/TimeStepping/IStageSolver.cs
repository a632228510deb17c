namespace Layers.Core.TimeStepping;

/// <summary>
/// Solves the implicit stage equation of TR-BDF2, Cap w + c A u(w) = b, for the content w of every node and its
/// dissolved part u. Both stages of a step share c = gamma h / 2.
/// </summary>
internal interface IStageSolver
{
    /// <summary>Prepares for the stages of a step with coefficient c (s).</summary>
    void Prepare(double coefficientSeconds);

    /// <summary>
    /// Solves one stage. <paramref name="content"/> holds a first guess on entry and the solution on return;
    /// <paramref name="dissolved"/> receives u. False when the solve did not converge (the step is then retried smaller).
    /// </summary>
    bool Solve(ReadOnlySpan<double> rightHandSide, Span<double> content, Span<double> dissolved);

    /// <summary>Applies the inverse of the last stage's Jacobian in place (the filter of the error estimate).</summary>
    void Filter(Span<double> values);

    /// <summary>Writes the dissolved u of a content w.</summary>
    void Dissolve(ReadOnlySpan<double> content, Span<double> dissolved);
}
