namespace Layers.Core.TimeStepping;

/// <summary>
/// The step-size rule, pure and separately tested. Given the step just tried and its normalised error
/// (1 = exactly at tolerance), it accepts when the error is at most 1 and proposes the next step
/// dt * clamp(Safety * error^(-1/3), MinimumFactor, MaximumFactor): the exponent 1/3 matches a second-order
/// method, whose local error scales as dt^3. A non-finite error is a rejection with the strongest cut. After a
/// rejection the step never grows.
/// </summary>
public sealed record StepSizeController
{
    /// <summary>Safety factor on the optimal step. Default 0.9.</summary>
    public double Safety { get; init; } = 0.9;

    /// <summary>Largest growth of the step from one step to the next. Default 4.</summary>
    public double MaximumFactor { get; init; } = 4;

    /// <summary>Strongest cut of the step after a rejection. Default 0.2.</summary>
    public double MinimumFactor { get; init; } = 0.2;

    /// <summary>Decides on a trial step.</summary>
    /// <param name="stepSeconds">The step just tried.</param>
    /// <param name="normalisedError">Its error divided by the tolerance.</param>
    /// <returns>Whether to accept it and the step to try next.</returns>
    public (bool Accept, double NextStepSeconds) Decide(double stepSeconds, double normalisedError)
    {
        if (!double.IsFinite(normalisedError))
        {
            return (false, stepSeconds * MinimumFactor);
        }

        var factor = normalisedError <= 0
            ? MaximumFactor
            : Math.Clamp(Safety * Math.Pow(normalisedError, -1.0 / 3.0), MinimumFactor, MaximumFactor);
        var accept = normalisedError <= 1;
        if (!accept)
        {
            factor = Math.Min(factor, Safety);
        }

        return (accept, stepSeconds * factor);
    }
}
