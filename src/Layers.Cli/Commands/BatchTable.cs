using System.Globalization;
using Layers.Core.Batch;
using Layers.Core.Reports;

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
            Number(row.Results?.LeftReceivedKgPerSquareMeter),
            Number(row.Results?.RightReceivedKgPerSquareMeter),
            Number(row.Results?.SteadyFluxKgPerSquareMeterSecond),
            Number(row.Results?.LagTimeSeconds),
            Number(row.Results?.TimeTo90PercentSeconds),
        ]).ToList();
        return new TextTable(
            FormattableString.Invariant($"Batch: {rows.Count} cases, {counts}"),
            ["case", "status", "left received [kg/m2]", "right received [kg/m2]", "steady flux [kg/(m2 s)]", "lag time [s]", "90 % time [s]"],
            table);
    }

    private static string Number(double? value) =>
        value is { } number && double.IsFinite(number) ? number.ToString("G4", CultureInfo.InvariantCulture) : string.Empty;
}
