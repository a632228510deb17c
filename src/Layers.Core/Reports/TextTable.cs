namespace Layers.Core.Reports;

/// <summary>A table of already formatted cells, rendered by the console and by the HTML report alike.</summary>
/// <param name="Title">Caption.</param>
/// <param name="Headers">Column headers, with units.</param>
/// <param name="Rows">Rows of cells, as many cells as headers.</param>
public sealed record TextTable(string Title, IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows)
{
    /// <summary>How many leading columns must never wrap (names that read wrong when cut mid-word); the others give way.</summary>
    public int WholeColumns { get; init; }
}
