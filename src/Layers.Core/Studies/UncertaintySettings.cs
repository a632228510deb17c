using Layers.Core.Units;

namespace Layers.Core.Studies;

/// <summary>One uncertain input: where it is written in the case and how it spreads, in the unit it is written in.</summary>
/// <param name="Input">The input.</param>
/// <param name="Distribution">Its distribution.</param>
public sealed record UncertainInput(StudyInput Input, Distribution Distribution)
{
    /// <summary>"path: distribution (parameters with units)".</summary>
    public string Describe() => $"{Input.Label}: {Distribution.Describe(Units.UnitSpelling.ForPeople(Input.Unit))}";
}

/// <summary>A limit whose chance of being exceeded is reported.</summary>
/// <param name="Result">The result compared with the limit.</param>
/// <param name="ValueSi">The limit, SI.</param>
/// <param name="Unit">The unit it was written in, for display.</param>
/// <param name="Origin">Where it comes from: "$.uncertainty.limit" or the specific migration limit of the case.</param>
public sealed record StudyLimit(ResultMeasure Result, double ValueSi, UnitDefinition Unit, string Origin);

/// <summary>
/// An uncertainty study, read from <c>$.uncertainty</c>: the inputs given as distributions, how many samples to
/// draw and how, and what to report. Keys and rules: docs/case-format.md, section "Uncertainty".
/// </summary>
public sealed record UncertaintySettings
{
    /// <summary>Default number of samples.</summary>
    public const int DefaultSamples = 200;

    /// <summary>Most samples a study may ask for.</summary>
    public const int MaximumSamples = 100_000;

    /// <summary>Default seed.</summary>
    public const int DefaultSeed = 1;

    /// <summary>The uncertain inputs, in the order given.</summary>
    public required IReadOnlyList<UncertainInput> Inputs { get; init; }

    /// <summary>Number of samples (runs).</summary>
    public int Samples { get; init; } = DefaultSamples;

    /// <summary>Seed of the random numbers; the same seed gives the same samples on any machine and any number of jobs.</summary>
    public int Seed { get; init; } = DefaultSeed;

    /// <summary>Plain random or Latin hypercube sampling.</summary>
    public SamplingMethod Sampling { get; init; } = SamplingMethod.Random;

    /// <summary>The percentiles reported, ascending, each in (0, 100).</summary>
    public IReadOnlyList<double> Percentiles { get; init; } = [5, 50, 95];

    /// <summary>Further single results whose percentiles are reported (a lag time, an amount at a time).</summary>
    public IReadOnlyList<ResultMeasure> Results { get; init; } = [];

    /// <summary>The limit whose chance of being exceeded is reported, or null.</summary>
    public StudyLimit? Limit { get; init; }
}
