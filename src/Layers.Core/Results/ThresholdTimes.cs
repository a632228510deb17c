namespace Layers.Core.Results;

/// <summary>
/// Times at which a fraction first reaches 50, 90 and 99 %, s; null when not reached within the time integrated
/// (the duration, extended up to the horizon while some threshold was still ahead).
/// </summary>
/// <param name="Half">Time to 50 %.</param>
/// <param name="NinetyPercent">Time to 90 %.</param>
/// <param name="NinetyNinePercent">Time to 99 %.</param>
public sealed record ThresholdTimes(double? Half, double? NinetyPercent, double? NinetyNinePercent)
{
    /// <summary>The thresholds, in the order of the properties.</summary>
    public static IReadOnlyList<double> Levels { get; } = [0.5, 0.9, 0.99];

    /// <summary>The times as a list in the order of <see cref="Levels"/>.</summary>
    public IReadOnlyList<double?> AsList() => [Half, NinetyPercent, NinetyNinePercent];
}
