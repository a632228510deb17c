using Layers.Core.Batch;
using Layers.Core.Reports;

namespace Layers.Cli.Commands;

/// <summary>
/// The batch summary as a console table: the table for people of summary.md without its detail columns, and without
/// the status column when every case succeeded (the title says so). Case names and statuses never wrap; when every case is a sub-case of one sweep, the sweep's name is said once in the header
/// rather than on every row. The messages of cases that did not succeed go to stderr, one line each, where they do
/// not wrap into the table.
/// </summary>
internal static class BatchTable
{
    public static TextTable Of(IReadOnlyList<BatchRow> rows)
    {
        var table = BatchPeopleTable.Of(rows, details: false) with { WholeColumns = 2 };
        if (rows.All(row => row.Status == BatchStatus.Succeeded))
        {
            // The title says every case succeeded; the column would only take width from the results.
            table = table with
            {
                Headers = [table.Headers[0], .. table.Headers.Skip(2)],
                Rows = [.. table.Rows.Select(row => (IReadOnlyList<string>)[row[0], .. row.Skip(2)])],
                WholeColumns = 1,
            };
        }

        var prefix = SweepPrefix(rows);
        return prefix.Length == 0
            ? table
            : table with
            {
                Headers = [$"case ({prefix}*)", .. table.Headers.Skip(1)],
                Rows = [.. table.Rows.Select(row => (IReadOnlyList<string>)[row[0][prefix.Length..], .. row.Skip(1)])],
            };
    }

    /// <summary>
    /// Why the batch ends with its exit code, when not 0: the cases that did not succeed (code 2) and those over their
    /// limit (code 1); null for a batch that exits 0.
    /// </summary>
    public static string? ExitCodeLine(IReadOnlyList<BatchRow> rows)
    {
        var problems = rows.Count(row => row.Status is BatchStatus.Invalid or BatchStatus.Failed or BatchStatus.Cancelled);
        var exceeded = rows.Count(row => row.Limit?.Exceeded == true);
        var over = FormattableString.Invariant($"{exceeded} {Cases(exceeded)} exceeded the specific migration limit");
        return problems > 0
            ? FormattableString.Invariant($"exit code {ExitCodes.InvalidInput}: {problems} {Cases(problems)} did not succeed (why: on stderr, and in summary.md)") + (exceeded > 0 ? $"; {over}" : string.Empty)
            : exceeded > 0 ? FormattableString.Invariant($"exit code {ExitCodes.LimitExceeded}: {over} (verdict column)")
            : null;
    }

    /// <summary>"sweep." when two or more rows are all sub-cases of one sweep file "sweep.json" (named "sweep.NN_..."); else empty.</summary>
    internal static string SweepPrefix(IReadOnlyList<BatchRow> rows)
    {
        if (rows.Count < 2 || rows.Any(row => row.Parameters.Count == 0) || rows.Select(row => row.File).Distinct(StringComparer.Ordinal).Count() > 1)
        {
            return string.Empty;
        }

        var prefix = Path.GetFileNameWithoutExtension(rows[0].File) + ".";
        return rows.All(row => row.Name.StartsWith(prefix, StringComparison.Ordinal) && row.Name.Length > prefix.Length) ? prefix : string.Empty;
    }

    private static string Cases(int count) => count == 1 ? "case" : "cases";
}
