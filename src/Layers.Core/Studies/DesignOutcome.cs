using Layers.Core.Cases;
using Layers.Core.Results;

namespace Layers.Core.Studies;

/// <summary>One value tried and the result it gave.</summary>
/// <param name="Value">The input, in its unit.</param>
/// <param name="ResultSi">The result, SI; NaN when the case does not define it at this value.</param>
public sealed record DesignPoint(double Value, double ResultSi);

/// <summary>What a design found.</summary>
public sealed record DesignOutcome : IStudyOutcome
{
    /// <summary>The question.</summary>
    public required DesignSettings Settings { get; init; }

    /// <summary>How it ended.</summary>
    public required StudyStatus Status { get; init; }

    /// <summary>For anything but <see cref="StudyStatus.Done"/>, what went wrong in plain words.</summary>
    public string? Message { get; init; }

    /// <summary>Errors of an invalid value, with their JSON paths.</summary>
    public IReadOnlyList<CaseError> Errors { get; init; } = [];

    /// <summary>Every value tried, in ascending order of value.</summary>
    public required IReadOnlyList<DesignPoint> Points { get; init; }

    /// <summary>The answer, in the input's unit.</summary>
    public double? Answer { get; init; }

    /// <summary>
    /// The answer lies within plus or minus this, in the input's unit. When <see cref="Bracketed"/> is true the
    /// results at answer - tolerance and answer + tolerance lie on either side of the target.
    /// </summary>
    public double? Tolerance { get; init; }

    /// <summary>True when the tolerance was confirmed by results on either side of the target.</summary>
    public bool Bracketed { get; init; }

    /// <summary>The result at the answer, SI.</summary>
    public double? ResultAtAnswerSi { get; init; }

    /// <summary>How many times the result crosses the target over the values tried first; the first crossing is solved.</summary>
    public int Crossings { get; init; }

    /// <summary>The run at the answer (for its caution text and food-contact figures).</summary>
    public SimulationResult? RunAtAnswer { get; init; }
}
