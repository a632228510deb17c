using System.Globalization;
using Layers.Core.Reports;
using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>
/// The columns of summary.csv, in order, with their units in the names: one place, so that the CSV, summary.json and
/// docs/outputs.md agree. The fixed columns are the same for every batch and are addressed by name; the only columns
/// that depend on the batch are those of the inputs it varies (<see cref="BatchInputColumns"/>), which are its
/// question, right after <c>parameters</c>.
/// </summary>
public static class BatchColumns
{
    /// <summary>
    /// The key results in the fixed trade units of <see cref="BatchTradeUnits"/>, for people reading summary.csv; the
    /// SI columns they come from stay beside them for machines (summary.json holds only the SI values).
    /// </summary>
    public static IReadOnlyList<BatchColumn> TradeUnitColumns { get; } =
    [
        NumberColumn("foodConcentrationMgPerKg", row => BatchTradeUnits.In(BatchTradeUnits.FoodConcentration, row.Results?.FoodConcentrationKgPerKg)),
        NumberColumn("specificMigrationLimitMgPerKg", row => BatchTradeUnits.In(BatchTradeUnits.FoodConcentration, row.Limit?.LimitSi)),
        NumberColumn("foodMigrationMgPerSquareDecimeter", row => BatchTradeUnits.In(BatchTradeUnits.FoodMigration, row.Results?.FoodMigrationKgPerSquareMeter)),
        NumberColumn("leftReceivedUgPerSquareCentimeter", row => BatchTradeUnits.In(BatchTradeUnits.Received, row.Results?.LeftReceivedKgPerSquareMeter)),
        NumberColumn("rightReceivedUgPerSquareCentimeter", row => BatchTradeUnits.In(BatchTradeUnits.Received, row.Results?.RightReceivedKgPerSquareMeter)),
        NumberColumn("steadyFluxUgPerSquareCentimeterHour", row => BatchTradeUnits.In(BatchTradeUnits.Flux, row.Results?.SteadyFluxKgPerSquareMeterSecond)),
        NumberColumn("lagTimeHours", row => BatchTradeUnits.In(BatchTradeUnits.Time, row.Results?.LagTimeSeconds)),
    ];

    /// <summary>The fixed columns before the input columns.</summary>
    private static IReadOnlyList<BatchColumn> Leading { get; } =
    [
        Text("case", row => row.Name),
        Text("file", row => row.File),
        Text("parameters", Parameters),
    ];

    /// <summary>The fixed columns after the input columns: verdict and key results in trade units, then SI.</summary>
    private static IReadOnlyList<BatchColumn> Trailing { get; } =
    [
        Text("status", row => StatusName(row.Status)),
        Text("limitVerdict", row => Verdict(row.Limit)),
        .. TradeUnitColumns,
        Text("finalState", row => row.Results?.FinalState ?? string.Empty),
        .. NamedResults.InBatchSummary.Select(result => NumberColumn(NamedResults.SummaryKey(result), row => row.Results?.Pick(result))),
        NumberColumn("foodMigrationKgPerSquareMeter", row => row.Results?.FoodMigrationKgPerSquareMeter),
        NumberColumn("worstMassBalanceError", row => row.Results?.WorstMassBalanceError),
        NumberColumn("worstEstimatedError", row => row.Results?.WorstEstimatedError),
        NumberColumn("figuresAboveAccuracy", row => row.Results?.FiguresAboveAccuracy),
        Text("limit", row => row.Limit is { } limit ? $"{limit.Quantity} <= {CsvText.Number(limit.LimitSi)}" : string.Empty),
        Text("message", row => row.Message),
    ];

    /// <summary>The names of the fixed columns, in order, input columns left out (they go after <c>parameters</c>).</summary>
    public static IReadOnlyList<string> FixedNames { get; } = [.. Leading.Concat(Trailing).Select(column => column.Name)];

    /// <summary>The columns of summary.csv for these rows: the fixed ones with the rows' input columns after <c>parameters</c>.</summary>
    public static IReadOnlyList<BatchColumn> For(IReadOnlyList<BatchRow> rows) =>
        [.. Leading, .. BatchInputColumns.Of(rows, CsvText.Number), .. Trailing];

    /// <summary>"path = value; ..." of the swept values.</summary>
    public static string Parameters(BatchRow row) => string.Join("; ", row.Parameters.Select(value => $"{value.Path} = {value.Written}"));

    /// <summary>The verdict of a limit check: within or exceeded; empty without a limit.</summary>
    public static string Verdict(LimitCheck? limit) => limit is null ? string.Empty : limit.Exceeded ? "exceeded" : "within";

    /// <summary>The status as written in the summaries: succeeded, invalid, failed, cancelled.</summary>
    public static string StatusName(BatchStatus status) => status.ToString().ToLowerInvariant();

    /// <summary>Reads a status name back.</summary>
    public static BatchStatus? ParseStatus(string text) =>
        Enum.GetValues<BatchStatus>().Where(status => StatusName(status) == text).Select(status => (BatchStatus?)status).FirstOrDefault();

    /// <summary>
    /// The count of cases over their limit as the console and summary.md word it, ", 20 exceeded the specific
    /// migration limit"; empty when no case has a limit.
    /// </summary>
    public static string ExceededCount(IReadOnlyList<BatchRow> rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var limited = rows.Count(row => row.Limit is not null);
        var exceeded = rows.Count(row => row.Limit?.Exceeded == true);
        return limited == 0 ? string.Empty : FormattableString.Invariant($", {exceeded} exceeded the specific migration limit");
    }

    private static string Number(double? value) => value is { } number && double.IsFinite(number) ? CsvText.Number(number) : string.Empty;

    private static BatchColumn Text(string name, Func<BatchRow, string> cell) => new(name, false, cell);

    private static BatchColumn NumberColumn(string name, Func<BatchRow, double?> value) => new(name, true, row => Number(value(row)));

    /// <summary>Seconds for a timing column.</summary>
    internal static string Seconds(double? value) => value?.ToString("F3", CultureInfo.InvariantCulture) ?? string.Empty;
}
