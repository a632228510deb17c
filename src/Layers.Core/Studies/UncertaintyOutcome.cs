using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Studies;

/// <summary>Percentiles of one result over the samples.</summary>
/// <param name="Result">The result.</param>
/// <param name="Values">One value per sample, SI (NaN where the sample has no such result, +infinity for a time never reached).</param>
/// <param name="Percentiles">One per percentile of the study, SI.</param>
public sealed record ResultSpread(ResultMeasure Result, IReadOnlyList<double> Values, IReadOnlyList<double> Percentiles)
{
    /// <summary>Samples without this result.</summary>
    public int Undefined => Values.Count(double.IsNaN);
}

/// <summary>Percentiles of a time-dependent result at each time of the study's time grid.</summary>
/// <param name="Result">The result.</param>
/// <param name="Percentiles">Per time of <see cref="UncertaintyOutcome.TimesSeconds"/>, one value per percentile, SI.</param>
public sealed record SeriesSpread(NamedResult Result, IReadOnlyList<IReadOnlyList<double>> Percentiles)
{
    /// <summary>The result's case-file name, e.g. <c>rightReceived</c>.</summary>
    public string Name => NamedResults.Name(Result);

    /// <summary>The result in words, for console lines and plots.</summary>
    public string Label => NamedResults.Quantity(Result);

    /// <summary>Its SI unit.</summary>
    public string SiUnit => NamedResults.SiUnit(Result).Symbol;
}

/// <summary>The chance that a result is above a limit.</summary>
/// <param name="Limit">The limit.</param>
/// <param name="Above">Samples above it.</param>
/// <param name="Counted">Samples with the result.</param>
/// <param name="Low">Lower end of the 95 % Wilson score interval of the probability.</param>
/// <param name="High">Upper end of that interval.</param>
public sealed record Exceedance(StudyLimit Limit, int Above, int Counted, double Low, double High)
{
    /// <summary>Above / Counted.</summary>
    public double Probability => Counted == 0 ? double.NaN : (double)Above / Counted;
}

/// <summary>What an uncertainty study found.</summary>
public sealed record UncertaintyOutcome : IStudyOutcome
{
    /// <summary>The study.</summary>
    public required UncertaintySettings Settings { get; init; }

    /// <summary>The case as written.</summary>
    public required SimulationCase BaseCase { get; init; }

    /// <summary>How it ended.</summary>
    public required StudyStatus Status { get; init; }

    /// <summary>For anything but <see cref="StudyStatus.Done"/>, what went wrong.</summary>
    public string? Message { get; init; }

    /// <summary>The errors of the first invalid sample.</summary>
    public IReadOnlyList<CaseError> Errors { get; init; } = [];

    /// <summary>The value of each input (in its unit) for each sample: [sample][input].</summary>
    public IReadOnlyList<IReadOnlyList<double>> InputValues { get; init; } = [];

    /// <summary>The times at which the series are given: the output times of the case as written, s.</summary>
    public IReadOnlyList<double> TimesSeconds { get; init; } = [];

    /// <summary>The amounts and concentrations in the face media against time.</summary>
    public IReadOnlyList<SeriesSpread> Series { get; init; } = [];

    /// <summary>The single results asked for.</summary>
    public IReadOnlyList<ResultSpread> Results { get; init; } = [];

    /// <summary>The chance of exceeding the limit, or null without one.</summary>
    public Exceedance? Exceedance { get; init; }

    /// <summary>The result compared with the limit, per sample (SI), or empty without a limit.</summary>
    public IReadOnlyList<double> LimitValues { get; init; } = [];
}
