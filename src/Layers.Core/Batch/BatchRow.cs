using Layers.Core.Cases;

namespace Layers.Core.Batch;

/// <summary>One row of a batch summary: one case (or sub-case of a sweep) and how it ended.</summary>
/// <param name="Name">Case name, also the name of its results folder.</param>
/// <param name="File">The case file as given.</param>
/// <param name="Parameters">The swept values of a sub-case; empty for a plain case.</param>
/// <param name="Status">How it ended.</param>
/// <param name="Message">Why it is not <see cref="BatchStatus.Succeeded"/>; empty when it is.</param>
/// <param name="Results">Key results, when solved.</param>
public sealed record BatchRow(
    string Name,
    string File,
    IReadOnlyList<SweepValue> Parameters,
    BatchStatus Status,
    string Message,
    BatchKeyResults? Results)
{
    /// <summary>
    /// The inputs that differ between the plain case files of the batch (<see cref="VariedInputs"/>), as this case
    /// writes them; empty for a sweep's sub-case (its <see cref="Parameters"/> say what varies) and for a lone case.
    /// </summary>
    public IReadOnlyList<SweepValue> Inputs { get; init; } = [];

    /// <summary>The verdict against a limit given in the case; always null until the case format has a limit key.</summary>
    public LimitCheck? Limit { get; init; }

    /// <summary>The figure of one period a sweep plots, read from this sub-case's run; null for other rows.</summary>
    public PeriodFigureValue? PeriodFigure { get; init; }

    /// <summary>Wall time of the solve, s: shown in summary.md and timing.csv, never in summary.csv or summary.json.</summary>
    public double? SolveSeconds { get; init; }

    /// <summary>Rows in the order every summary uses: by case name, then file (ordinal), whatever the thread timing.</summary>
    public static IReadOnlyList<BatchRow> Ordered(IEnumerable<BatchRow> rows) =>
        rows.OrderBy(row => row.Name, StringComparer.Ordinal).ThenBy(row => row.File, StringComparer.Ordinal).ToList();
}
