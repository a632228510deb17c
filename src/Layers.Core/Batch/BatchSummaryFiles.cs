using System.Text;
using Layers.Core.Reports;

namespace Layers.Core.Batch;

/// <summary>
/// The summary files of a batch, by name: summary.csv and summary.json (deterministic: no clock readings, rows by
/// case name, so the same inputs give the same bytes whatever the number of jobs), summary.md (the same table for
/// people, with solve times) and timing.csv (solve times only). Described in docs/outputs.md, "Batch summary".
/// </summary>
public static class BatchSummaryFiles
{
    /// <summary>Name of the CSV summary.</summary>
    public const string Csv = "summary.csv";

    /// <summary>Name of the JSON summary, which <c>layers merge</c> reads.</summary>
    public const string Json = "summary.json";

    /// <summary>Name of the Markdown summary.</summary>
    public const string Markdown = "summary.md";

    /// <summary>Name of the solve-time file.</summary>
    public const string Timing = "timing.csv";

    /// <summary>The four files for the rows.</summary>
    public static IReadOnlyDictionary<string, byte[]> Build(IEnumerable<BatchRow> rows)
    {
        var ordered = BatchRow.Ordered(rows);
        return new Dictionary<string, byte[]>
        {
            [Csv] = Encoding.UTF8.GetBytes(WriteCsv(ordered)),
            [Json] = Encoding.UTF8.GetBytes(BatchSummaryJson.Write(ordered)),
            [Markdown] = Encoding.UTF8.GetBytes(BatchSummaryMarkdown.Write(ordered)),
            [Timing] = Encoding.UTF8.GetBytes(WriteTiming(ordered)),
        };
    }

    /// <summary>Writes the files into <paramref name="folder"/>, each atomically.</summary>
    public static void WriteTo(string folder, IEnumerable<BatchRow> rows)
    {
        foreach (var (name, content) in Build(rows))
        {
            AtomicFile.Write(Path.Combine(folder, name), content);
        }
    }

    /// <summary>summary.csv: a header with units, then one row per case.</summary>
    public static string WriteCsv(IReadOnlyList<BatchRow> rows)
    {
        var columns = BatchColumns.For(rows);
        var text = new StringBuilder();
        text.Append(CsvText.Line(columns.Select(column => CsvText.Field(column.Name)))).Append('\n');
        foreach (var row in rows)
        {
            text.Append(CsvText.Line(columns.Select(column => column.HoldsNumbers ? column.Cell(row) : CsvText.Field(column.Cell(row))))).Append('\n');
        }

        return text.ToString();
    }

    private static string WriteTiming(IReadOnlyList<BatchRow> rows)
    {
        var text = new StringBuilder("case,solveSeconds\n");
        foreach (var row in rows)
        {
            text.Append(CsvText.Field(row.Name)).Append(',').Append(BatchColumns.Seconds(row.SolveSeconds)).Append('\n');
        }

        return text.ToString();
    }
}
