using Layers.Core.Results;

namespace Layers.Core.Cases;

/// <summary>The outcome of expanding a sweep: its sub-cases, or the errors in its <c>sweep</c> member.</summary>
/// <param name="Variants">The sub-cases in expansion order (first parameter varying slowest); empty on errors.</param>
/// <param name="Result">The key result to plot against the first parameter, when given correctly.</param>
/// <param name="Errors">Problems in <c>$.sweep</c>, each with its JSON path.</param>
public sealed record SweepExpansion(IReadOnlyList<SweepVariant> Variants, NamedResult? Result, IReadOnlyList<CaseError> Errors)
{
    /// <summary>
    /// For a figure of one period of a schedule (<see cref="NamedResults.IsReadInPeriod"/>), the label of the period it
    /// is read in, e.g. "dose 7 of 7"; null for the last period, and for the other results.
    /// </summary>
    public string? ResultPeriod { get; init; }

    /// <summary>True when the sweep could be expanded.</summary>
    public bool IsValid => Errors.Count == 0;
}
