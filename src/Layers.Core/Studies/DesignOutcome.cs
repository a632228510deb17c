using Layers.Core.Cases;
using Layers.Core.Results;

namespace Layers.Core.Studies;

/// <summary>How a design ended.</summary>
public enum DesignStatus
{
    /// <summary>A value in the range gives the target; <see cref="DesignOutcome.Answer"/> holds it.</summary>
    Found,

    /// <summary>No value in the range gives the target; the message names the results found.</summary>
    NotReached,

    /// <summary>A value tried gave an invalid case (the message quotes the reader).</summary>
    Invalid,

    /// <summary>The solver stopped early for a value tried.</summary>
    SolverFailed,

    /// <summary>Interrupted.</summary>
    Cancelled,
}

/// <summary>One value tried and the result it gave.</summary>
/// <param name="Value">The input, in its unit.</param>
/// <param name="ResultSi">The result, SI; NaN when the case does not define it at this value.</param>
public sealed record DesignPoint(double Value, double ResultSi);

/// <summary>What a design found.</summary>
public sealed record DesignOutcome
{
    /// <summary>The question.</summary>
    public required DesignSettings Settings { get; init; }

    /// <summary>How it ended.</summary>
    public required DesignStatus Status { get; init; }

    /// <summary>For anything but <see cref="DesignStatus.Found"/>, what went wrong in plain words.</summary>
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
