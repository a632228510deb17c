using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads measured cumulative amounts per area from a CSV file: a header line naming the two columns with their
/// units in square brackets, e.g. <c>time [h],cumulative amount [ug/cm2]</c>, then one line per measurement, numbers
/// with a decimal point, times ascending. The amounts are taken as already corrected for sampling.
/// </summary>
internal static class MeasuredCsv
{
    public static MeasuredPermeation? Read(string path, string written, string jsonPath, List<CaseError> errors)
    {
        string[] lines;
        try
        {
            lines = File.ReadAllLines(path);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            errors.Add(new CaseError(jsonPath, $"cannot read the measured data '{written}': {exception.Message}"));
            return null;
        }

        var rows = lines.Select((text, index) => (text: text.Trim(), number: index + 1)).Where(line => line.text.Length > 0).ToArray();
        if (rows.Length == 0)
        {
            errors.Add(new CaseError(jsonPath, $"'{written}' is empty; expected a header such as 'time [h],cumulative amount [ug/cm2]' and data lines"));
            return null;
        }

        var header = rows[0].text.Split(',');
        var time = header.Length == 2 ? ColumnUnit(header[0], Dimension.Time) : null;
        var amount = header.Length == 2 ? ColumnUnit(header[1], Dimension.MassPerArea) : null;
        if (time is null || amount is null)
        {
            errors.Add(new CaseError(
                jsonPath,
                $"'{written}' line {rows[0].number}: expected two columns with units in brackets, a time and a mass per area, e.g. 'time [h],cumulative amount [ug/cm2]'; got '{rows[0].text}'"));
            return null;
        }

        var times = new List<double>();
        var amounts = new List<double>();
        foreach (var (text, number) in rows.Skip(1))
        {
            var cells = text.Split(',');
            if (cells.Length != 2
                || !double.TryParse(cells[0].Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var t)
                || !double.TryParse(cells[1].Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var q)
                || !double.IsFinite(t) || !double.IsFinite(q))
            {
                errors.Add(new CaseError(jsonPath, $"'{written}' line {number}: expected two numbers separated by a comma, e.g. '4,12.5'; got '{text}'"));
                return null;
            }

            if (t < 0 || (times.Count > 0 && time.ToSi(t) <= times[^1]))
            {
                errors.Add(new CaseError(jsonPath, $"'{written}' line {number}: times must be >= 0 and ascending; got '{cells[0].Trim()}'"));
                return null;
            }

            times.Add(time.ToSi(t));
            amounts.Add(amount.ToSi(q));
        }

        if (times.Count(t => t > 0) < 3)
        {
            errors.Add(new CaseError(jsonPath, $"'{written}' holds {times.Count} data lines; at least three at times > 0 are needed to find a steady flux"));
            return null;
        }

        return new MeasuredPermeation(written, times, amounts);
    }

    private static UnitDefinition? ColumnUnit(string column, Dimension dimension)
    {
        var open = column.IndexOf('[', StringComparison.Ordinal);
        var close = column.IndexOf(']', StringComparison.Ordinal);
        if (open < 0 || close < open)
        {
            return null;
        }

        return UnitTable.TryFind(column[(open + 1)..close].Trim(), out var unit) && unit.Dimension == dimension ? unit : null;
    }
}
