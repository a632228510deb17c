using System.Globalization;
using Layers.Core.Reports;
using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>
/// The columns of summary.csv and summary.md, in order, with their units in the names: one place, so that the CSV,
/// the Markdown table and docs/outputs.md agree.
/// </summary>
public static class BatchColumns
{
    /// <summary>Column names of summary.csv.</summary>
    public static IReadOnlyList<string> Names { get; } =
    [
        "case", "file", "parameters", "status", "finalState", .. NamedResults.InBatchSummary.Select(result => NamedResults.SummaryKey(result)!),
        "worstMassBalanceError", "worstEstimatedError", "figuresAboveAccuracy", "limit", "limitVerdict", "message",
    ];

    /// <summary>
    /// True for the columns that hold numbers (written by <see cref="CsvText.Number"/>); the others hold text, which
    /// <see cref="CsvText.Field"/> makes safe to open in a spreadsheet.
    /// </summary>
    public static bool HoldsNumbers(int column) => NumberColumns.Contains(Names[column]);

    private static HashSet<string> NumberColumns { get; } =
        new([.. NamedResults.InBatchSummary.Select(result => NamedResults.SummaryKey(result)!), "worstMassBalanceError", "worstEstimatedError", "figuresAboveAccuracy"], StringComparer.Ordinal);

    /// <summary>The cells of a row, in the order of <see cref="Names"/>; numbers in invariant culture, G10.</summary>
    public static IReadOnlyList<string> Cells(BatchRow row)
    {
        var results = row.Results;
        return
        [
            row.Name, row.File, Parameters(row), StatusName(row.Status), results?.FinalState ?? string.Empty,
            .. NamedResults.InBatchSummary.Select(result => Number(results?.Pick(result))),
            Number(results?.WorstMassBalanceError),
            Number(results?.WorstEstimatedError),
            Number(results?.FiguresAboveAccuracy),
            row.Limit is { } limit ? $"{limit.Quantity} <= {CsvText.Number(limit.LimitSi)}" : string.Empty,
            row.Limit is { } check ? (check.Exceeded ? "exceeded" : "within") : string.Empty,
            row.Message,
        ];
    }

    /// <summary>"path = value; ..." of the swept values.</summary>
    public static string Parameters(BatchRow row) => string.Join("; ", row.Parameters.Select(value => $"{value.Path} = {value.Written}"));

    /// <summary>The status as written in the summaries: succeeded, invalid, failed, cancelled.</summary>
    public static string StatusName(BatchStatus status) => status.ToString().ToLowerInvariant();

    /// <summary>Reads a status name back.</summary>
    public static BatchStatus? ParseStatus(string text) =>
        Enum.GetValues<BatchStatus>().Where(status => StatusName(status) == text).Select(status => (BatchStatus?)status).FirstOrDefault();

    private static string Number(double? value) => value is { } number && double.IsFinite(number) ? CsvText.Number(number) : string.Empty;

    /// <summary>Seconds for a timing column.</summary>
    internal static string Seconds(double? value) => value?.ToString("F3", CultureInfo.InvariantCulture) ?? string.Empty;
}
