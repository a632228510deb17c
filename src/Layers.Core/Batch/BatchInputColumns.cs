using Layers.Core.Cases;
using Layers.Core.Units;

namespace Layers.Core.Batch;

/// <summary>
/// One column per input the batch varies: the swept parameters of its sweeps and the inputs that differ between its
/// plain case files (<see cref="VariedInputs"/>). A column is named by the input's label and the unit of its first
/// value, "sealant thickness [um]"; values written in another unit of the same dimension are converted to it, values
/// that are not numbers are shown as written. Columns come in the order the rows first name them.
/// </summary>
public static class BatchInputColumns
{
    /// <summary>The input columns of the rows (ordered as the summaries order them).</summary>
    /// <param name="rows">The rows.</param>
    /// <param name="number">How a number is written in the table.</param>
    public static IReadOnlyList<BatchColumn> Of(IReadOnlyList<BatchRow> rows, Func<double, string> number)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var columns = new List<BatchColumn>();
        foreach (var label in rows.SelectMany(Values).Select(value => value.Label).Distinct(StringComparer.Ordinal).ToList())
        {
            var labelled = rows.SelectMany(Values).Where(value => value.Label == label).ToList();
            var unit = labelled.FirstOrDefault(value => double.IsFinite(value.Number))?.Unit ?? string.Empty;
            var name = unit.Length > 0 ? $"{label} [{unit}]" : label;
            var numeric = labelled.All(value => value.Written.Length == 0 || InUnit(value, unit) is not null);
            columns.Add(new BatchColumn(name, numeric, row => Values(row).FirstOrDefault(value => value.Label == label) is { } value
                ? (InUnit(value, unit) is { } converted ? number(converted) : value.Written)
                : string.Empty));
        }

        return columns;
    }

    private static IEnumerable<SweepValue> Values(BatchRow row) => row.Parameters.Concat(row.Inputs);

    /// <summary>The value's number in <paramref name="unit"/>, or null when it is no number or not convertible to it.</summary>
    private static double? InUnit(SweepValue value, string unit)
    {
        if (!double.IsFinite(value.Number))
        {
            return null;
        }

        if (value.Unit == unit)
        {
            return value.Number;
        }

        return UnitTable.TryFind(value.Unit, out var from) && UnitTable.TryFind(unit, out var to) && from.Dimension == to.Dimension
            ? to.FromSi(from.ToSi(value.Number))
            : null;
    }
}
