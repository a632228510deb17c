using Layers.Core.Cases;
using Layers.Core.Results;
using Layers.Core.Studies;

namespace Layers.Core.Batch;

/// <summary>One case to run: a case file, or one sub-case of a sweep, with its document already in memory.</summary>
/// <param name="Name">Case name: the file name without .json, or the sub-case name of a sweep.</param>
/// <param name="File">The case file as given (or as found in a folder).</param>
/// <param name="Json">The document to read; null when <paramref name="Errors"/> already say why it cannot be run.</param>
/// <param name="Errors">Problems found before reading: an unreadable file, a broken sweep, a name used twice.</param>
/// <param name="Parameters">The swept values of a sub-case; empty for a plain case.</param>
public sealed record BatchItem(
    string Name,
    string File,
    string? Json,
    IReadOnlyList<CaseError> Errors,
    IReadOnlyList<SweepValue> Parameters)
{
    /// <summary>The inputs that differ between the plain case files of the batch (<see cref="VariedInputs"/>); empty for a sub-case.</summary>
    public IReadOnlyList<SweepValue> Inputs { get; init; } = [];

    /// <summary>
    /// For a sub-case of a sweep that plots a figure of one period of a schedule, that figure (its row holds it, as a
    /// batch summary has no column per period); null otherwise.
    /// </summary>
    public ResultMeasure? PeriodFigure { get; init; }
}

/// <summary>The sub-cases of one sweep file, for its plot.</summary>
/// <param name="Name">The sweep file's name without .json: the name of its plot folder.</param>
/// <param name="File">The sweep file.</param>
/// <param name="Result">The key result to plot against the first parameter.</param>
/// <param name="CaseNames">The names of its sub-cases, in expansion order.</param>
public sealed record SweepGroup(string Name, string File, NamedResult Result, IReadOnlyList<string> CaseNames)
{
    /// <summary>For a figure of one period, the label of the period; null for the last period, and for other results.</summary>
    public string? ResultPeriod { get; init; }
}

/// <summary>Everything a batch will run, ordered by name.</summary>
/// <param name="Items">The cases, ordered by name then file.</param>
/// <param name="Sweeps">The sweeps among them.</param>
public sealed record BatchCollection(IReadOnlyList<BatchItem> Items, IReadOnlyList<SweepGroup> Sweeps)
{
    /// <summary>The part of the batch that one shard runs, sweeps reduced to the sweeps it runs whole.</summary>
    public BatchCollection Shard(ShardSpec shard)
    {
        if (shard.Count == 1)
        {
            return this;
        }

        var items = Items.Where((_, position) => shard.Contains(position)).ToList();
        var names = items.Select(item => item.Name).ToHashSet(StringComparer.Ordinal);
        return new BatchCollection(items, Sweeps.Where(sweep => sweep.CaseNames.All(names.Contains)).ToList());
    }
}
