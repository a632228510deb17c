using System.Text;
using Layers.Core.Reports;

namespace Layers.Core.Batch;

/// <summary>summary.md: counts, the summary table with a solve-time column, and the caution.</summary>
internal static class BatchSummaryMarkdown
{
    public static string Write(IReadOnlyList<BatchRow> rows)
    {
        var text = new StringBuilder("# Batch summary\n\n");
        var counts = Enum.GetValues<BatchStatus>()
            .Select(status => (status, count: rows.Count(row => row.Status == status)))
            .Where(pair => pair.count > 0)
            .Select(pair => FormattableString.Invariant($"{pair.count} {BatchColumns.StatusName(pair.status)}"));
        text.Append(FormattableString.Invariant($"{rows.Count} cases: ")).Append(string.Join(", ", counts)).Append(".\n\n");
        text.Append("Results in SI units, named in the column headers; solve times are wall-clock seconds and vary from run to run ")
            .Append("(summary.csv and summary.json leave them out so that they stay identical between runs).\n\n");
        var headers = BatchColumns.Names.Append("solveSeconds").ToList();
        text.Append("| ").Append(string.Join(" | ", headers)).Append(" |\n");
        text.Append('|').Append(string.Concat(headers.Select(_ => " --- |"))).Append('\n');
        foreach (var row in rows)
        {
            var cells = BatchColumns.Cells(row).Append(BatchColumns.Seconds(row.SolveSeconds)).Select(MarkdownText.Cell);
            text.Append("| ").Append(string.Join(" | ", cells)).Append(" |\n");
        }

        text.Append('\n').Append(CautionText.Paragraph).Append('\n');
        return text.ToString();
    }
}
