using System.Text;
using Layers.Core.Reports;

namespace Layers.Core.Batch;

/// <summary>summary.md: counts (with the limits exceeded), the table for people with a solve-time column, and the caution.</summary>
internal static class BatchSummaryMarkdown
{
    public static string Write(IReadOnlyList<BatchRow> rows)
    {
        var table = BatchPeopleTable.Of(rows, details: true);
        var text = new StringBuilder("# Batch summary\n\n");
        text.Append(BatchPeopleTable.Counts(rows)).Append(".\n\n");
        text.Append("Results in the units named in the column headers (summary.csv and summary.json also hold them in SI units); ")
            .Append("solve times are wall-clock seconds and vary from run to run ")
            .Append("(summary.csv and summary.json leave them out so that they stay identical between runs).\n\n");
        text.Append("| ").Append(string.Join(" | ", table.Headers.Select(MarkdownText.Cell))).Append(" |\n");
        text.Append('|').Append(string.Concat(table.Headers.Select(_ => " --- |"))).Append('\n');
        foreach (var row in table.Rows)
        {
            text.Append("| ").Append(string.Join(" | ", row.Select(MarkdownText.Cell))).Append(" |\n");
        }

        text.Append('\n').Append(CautionText.Paragraph).Append('\n');
        return text.ToString();
    }
}
