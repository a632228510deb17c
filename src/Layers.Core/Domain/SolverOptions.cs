namespace Layers.Core.Domain;

/// <summary>Time-stepping settings, each with its default and admissible range.</summary>
public sealed record SolverOptions
{
    /// <summary>
    /// Relative tolerance of the local error per step; admissible 1e-10 to 1e-2. The absolute tolerance is this value
    /// times <see cref="AbsoluteToleranceScale"/> times the largest |u| in the problem. No default here: the numerics
    /// setting of a case chooses it (<c>Domain.NumericsSettings</c>).
    /// </summary>
    public required double RelativeTolerance { get; init; }

    /// <summary>
    /// Absolute tolerance as a fraction of (relative tolerance x largest |u|). Default 1e-3, so that small amounts
    /// (a few ppm of the initial load crossing a barrier) are still resolved; admissible 1e-9 to 1.
    /// </summary>
    public double AbsoluteToleranceScale { get; init; } = 1e-3;

    /// <summary>
    /// Relative tolerance of the steps taken after the end of the duration, where the loop only looks for the times
    /// to 50, 90 and 99 % of the final state; the larger of this and <see cref="RelativeTolerance"/> applies.
    /// Default 1e-5, which moves those times by less than 1e-3 relative in the cases measured (docs/numerics.md).
    /// </summary>
    public double RelativeToleranceAfterEnd { get; init; } = 1e-5;

    /// <summary>Upper bound on accepted plus rejected steps before giving up. Default 1 000 000.</summary>
    public int MaximumSteps { get; init; } = 1_000_000;

    /// <summary>
    /// A step whose smallest u is below minus this fraction of the largest |u|, or where some node's amount Cap u is
    /// below minus this fraction of the reference mass, is rejected and retried smaller, so no concentration or amount
    /// turns negative beyond round-off. Default 1e-12.
    /// </summary>
    public double NegativityTolerance { get; init; } = 1e-12;

    /// <summary>Lists every setting outside its admissible range, as (setting, message) pairs.</summary>
    public IEnumerable<(string Setting, string Message)> Problems()
    {
        if (!(RelativeTolerance >= 1e-10 && RelativeTolerance <= 1e-2))
        {
            yield return ("relativeTolerance", $"must be from 1e-10 to 1e-2; got {RelativeTolerance}");
        }

        if (!(AbsoluteToleranceScale >= 1e-9 && AbsoluteToleranceScale <= 1))
        {
            yield return ("absoluteToleranceScale", $"must be from 1e-9 to 1; got {AbsoluteToleranceScale}");
        }

        if (MaximumSteps < 10)
        {
            yield return ("maximumSteps", $"must be at least 10; got {MaximumSteps}");
        }
    }
}
