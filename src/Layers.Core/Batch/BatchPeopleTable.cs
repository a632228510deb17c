using System.Globalization;
using Layers.Core.Reports;

namespace Layers.Core.Batch;

/// <summary>
/// The batch summary as people read it, on the console and in summary.md: the case, the inputs the batch varies,
/// the verdict against the limit with the value and the limit, and the key result of each kind of case in the fixed
/// trade units of <see cref="BatchTradeUnits"/>, four significant digits. A food-contact case shows what reached the
/// food as its migration (mg/dm2) rather than as an amount received. The console shows what a screen holds (the
/// amount received by the right medium, where permeation tests collect); summary.md adds the left medium, the time to
/// 90 %, the file, the accuracy and the messages. Columns that no case fills are left out (a food batch has no steady
/// flux); summary.csv keeps every column.
/// </summary>
public static class BatchPeopleTable
{
    /// <summary>The table; <paramref name="details"/> adds the columns of summary.md (file, final state, accuracy, message).</summary>
    public static TextTable Of(IReadOnlyList<BatchRow> rows, bool details)
    {
        ArgumentNullException.ThrowIfNull(rows);
        List<BatchColumn> columns =
        [
            new("case", false, row => row.Name),
            .. details ? [new BatchColumn("file", false, row => row.File)] : Array.Empty<BatchColumn>(),
            new("status", false, row => BatchColumns.StatusName(row.Status)),
            .. BatchInputColumns.Of(rows, Number),
            new("verdict", false, row => BatchColumns.Verdict(row.Limit)),
            Value($"in food [{BatchTradeUnits.FoodConcentration.Symbol}]", row => BatchTradeUnits.In(BatchTradeUnits.FoodConcentration, row.Results?.FoodConcentrationKgPerKg)),
            Value($"limit [{BatchTradeUnits.FoodConcentration.Symbol}]", row => BatchTradeUnits.In(BatchTradeUnits.FoodConcentration, row.Limit?.LimitSi)),
            Value($"migration [{BatchTradeUnits.FoodMigration.Symbol}]", row => BatchTradeUnits.In(BatchTradeUnits.FoodMigration, row.Results?.FoodMigrationKgPerSquareMeter)),
            .. details ? [Value($"left received [{BatchTradeUnits.Received.Symbol}]", row => NotFood(row, row.Results?.LeftReceivedKgPerSquareMeter, BatchTradeUnits.Received))] : Array.Empty<BatchColumn>(),
            Value($"right received [{BatchTradeUnits.Received.Symbol}]", row => NotFood(row, row.Results?.RightReceivedKgPerSquareMeter, BatchTradeUnits.Received)),
            Value($"steady flux [{BatchTradeUnits.Flux.Symbol}]", row => BatchTradeUnits.In(BatchTradeUnits.Flux, row.Results?.SteadyFluxKgPerSquareMeterSecond)),
            Value($"lag time [{BatchTradeUnits.Time.Symbol}]", row => BatchTradeUnits.In(BatchTradeUnits.Time, row.Results?.LagTimeSeconds)),
        ];
        if (details)
        {
            columns.AddRange(
            [
                Value($"90 % time [{BatchTradeUnits.Time.Symbol}]", row => BatchTradeUnits.In(BatchTradeUnits.Time, row.Results?.TimeTo90PercentSeconds)),
                new("final state", false, row => row.Results?.FinalState ?? string.Empty),
                Value("worst mass balance error", row => row.Results?.WorstMassBalanceError),
                Value("worst estimated error", row => row.Results?.WorstEstimatedError),
                Value("figures above accuracy", row => row.Results?.FiguresAboveAccuracy),
                new("message", false, row => row.Message),
                new("solve [s]", false, row => BatchColumns.Seconds(row.SolveSeconds)),
            ]);
        }

        var cells = rows.Select(row => columns.Select(column => column.Cell(row)).ToList()).ToList();
        // Case and status always; any other column only when some case fills it.
        var kept = Enumerable.Range(0, columns.Count)
            .Where(column => columns[column].Name is "case" or "status" || cells.Any(row => row[column].Length > 0))
            .ToList();
        return new TextTable(
            Title(rows),
            [.. kept.Select(column => columns[column].Name)],
            [.. cells.Select(row => (IReadOnlyList<string>)[.. kept.Select(column => row[column])])]);
    }

    /// <summary>"Batch: 50 cases, 50 succeeded, 20 exceeded the specific migration limit": the console's title.</summary>
    public static string Title(IReadOnlyList<BatchRow> rows) => $"Batch: {Counts(rows)}";

    /// <summary>"50 cases, 50 succeeded, 20 exceeded the specific migration limit": the cases by status and, when some case has a limit, how many exceeded it.</summary>
    public static string Counts(IReadOnlyList<BatchRow> rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var counts = string.Join(", ", Enum.GetValues<BatchStatus>()
            .Select(status => (status, count: rows.Count(row => row.Status == status)))
            .Where(pair => pair.count > 0)
            .Select(pair => FormattableString.Invariant($"{pair.count} {BatchColumns.StatusName(pair.status)}")));
        return FormattableString.Invariant($"{rows.Count} cases, {counts}{BatchColumns.ExceededCount(rows)}");
    }

    private static double? NotFood(BatchRow row, double? siValue, Units.UnitDefinition unit) =>
        row.Results?.FoodConcentrationKgPerKg is null ? BatchTradeUnits.In(unit, siValue) : null;

    private static BatchColumn Value(string name, Func<BatchRow, double?> value) =>
        new(name, true, row => value(row) is { } number && double.IsFinite(number) ? Number(number) : string.Empty);

    private static string Number(double value) => value.ToString("G4", CultureInfo.InvariantCulture);
}
