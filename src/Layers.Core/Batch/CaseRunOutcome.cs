using Layers.Core.Cases;
using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>How one run of a case ended, with what a single run prints and a batch puts in its row.</summary>
/// <param name="Status">How it ended.</param>
/// <param name="Message">
/// What went wrong, worded the same for a single run and a batch (empty on success); an invalid case's errors joined
/// by "; ", each with its file and JSON path.
/// </param>
public sealed record CaseRunOutcome(CaseRunStatus Status, string Message)
{
    private readonly string? _heading;

    /// <summary>
    /// What a single run prints after the file name when the case did not succeed, with <see cref="Errors"/> listed
    /// below it: the message, except for an invalid case file, whose errors are counted here and listed one a line.
    /// </summary>
    public string Heading
    {
        get => _heading ?? Message;
        init => _heading = value;
    }

    /// <summary>Every error of an invalid case, each with its JSON path; empty otherwise.</summary>
    public IReadOnlyList<CaseError> Errors { get; init; } = [];

    /// <summary>The solved case's result; null unless it was solved.</summary>
    public SimulationResult? Result { get; init; }

    /// <summary>The files written, by name; null unless the case succeeded.</summary>
    public IReadOnlyDictionary<string, byte[]>? Files { get; init; }

    /// <summary>The case folder written; null unless the case succeeded.</summary>
    public string? Folder { get; init; }

    /// <summary>Wall time of the solve, s (0 when not solved).</summary>
    public double SolveSeconds { get; init; }

    /// <summary>The case's specific migration limit checked against its result, when the case gives one.</summary>
    public LimitCheck? Limit => Result is { } result ? LimitCheck.Of(result) : null;

    /// <summary>The line above the errors of an invalid case file: "invalid case (2 problems):".</summary>
    public static string InvalidCaseHeading(int errorCount) =>
        $"invalid case ({errorCount} problem{(errorCount == 1 ? string.Empty : "s")}):";
}
