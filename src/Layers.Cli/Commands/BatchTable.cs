using System.Globalization;
using Layers.Core.Batch;
using Layers.Core.Reports;
using Layers.Core.Results;

namespace Layers.Cli.Commands;

/// <summary>
/// The batch summary as a console table: the columns of summary.csv that fit a screen. The messages of cases that did
/// not succeed go to stderr, one line each, where they do not wrap into the table.
/// </summary>
internal static class BatchTable
{
    public static TextTable Of(IReadOnlyList<BatchRow> rows)
    {
        var counts = string.Join(", ", Enum.GetValues<BatchStatus>()
            .Select(status => (status, count: rows.Count(row => row.Status == status)))
            .Where(pair => pair.count > 0)
            .Select(pair => FormattableString.Invariant($"{pair.count} {BatchColumns.StatusName(pair.status)}")));
        var table = rows.Select(row => (IReadOnlyList<string>)
        [
            row.Name,
            BatchColumns.StatusName(row.Status),
            .. NamedResults.InBatchSummary.Select(result => Number(row.Results?.Pick(result))),
        ]).ToList();
        string[] headers =
        [
            "case", "status",
            .. NamedResults.InBatchSummary.Select(result => $"{NamedResults.Heading(result)} [{NamedResults.SiUnit(result).Symbol}]"),
        ];
        // Result columns that no case fills (no bath, no permeation ...) only take width from the others.
        var kept = Enumerable.Range(0, headers.Length).Where(column => column < 2 || table.Any(row => row[column].Length > 0)).ToList();
        return new TextTable(
            FormattableString.Invariant($"Batch: {rows.Count} cases, {counts}"),
            kept.Select(column => headers[column]).ToList(),
            table.Select(row => (IReadOnlyList<string>)kept.Select(column => row[column]).ToList()).ToList());
    }

    private static string Number(double? value) =>
        value is { } number && double.IsFinite(number) ? number.ToString("G4", CultureInfo.InvariantCulture) : string.Empty;
}
