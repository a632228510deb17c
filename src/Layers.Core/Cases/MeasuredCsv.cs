using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads measurements against time from a CSV file: a header line naming the columns with their units in square
/// brackets, e.g. <c>time [h],cumulative amount [ug/cm2]</c>, then one line per measurement, numbers with a decimal
/// point, times ascending. A third column, when the reader allows it, holds the standard deviation of each value in
/// a unit of the same kind, e.g. <c>time [h],concentration [mg/L],sd [mg/L]</c>.
/// </summary>
internal static class MeasuredCsv
{
    /// <summary>What a measured file must look like.</summary>
    /// <param name="ValueDimensions">The kinds of value accepted in the second column.</param>
    /// <param name="ValueExample">An example header for messages, e.g. "time [h],cumulative amount [ug/cm2]".</param>
    /// <param name="ValueWhat">What the value column holds, for messages, e.g. "a mass per area".</param>
    /// <param name="AllowsDeviation">True when a third column of standard deviations may follow.</param>
    public sealed record Layout(IReadOnlyList<Dimension> ValueDimensions, string ValueExample, string ValueWhat, bool AllowsDeviation);

    /// <summary>The measurements, in SI, with the units and column names read from the header.</summary>
    public sealed record Table(
        UnitDefinition TimeUnit,
        UnitDefinition ValueUnit,
        string ValueName,
        IReadOnlyList<double> TimesSeconds,
        IReadOnlyList<double> Values,
        IReadOnlyList<double>? Deviations);

    private static readonly Layout Permeation = new([Dimension.MassPerArea], "time [h],cumulative amount [ug/cm2]", "a mass per area", AllowsDeviation: false);

    /// <summary>
    /// Reads the measured cumulative amounts of a permeation test (two columns, at least three times &gt; 0), taken as
    /// already corrected for sampling, from the file <paramref name="written"/> names relative to the case file.
    /// </summary>
    public static MeasuredPermeation? Read(string caseFile, string written, CaseFileAccess access, string jsonPath, List<CaseError> errors)
    {
        var text = CaseFilePath.ReadText(caseFile, written, access, out var problem);
        var table = text is null ? null : Parse(text, written, Permeation, out problem);
        if (table is not null && table.TimesSeconds.Count(t => t > 0) < 3)
        {
            problem = $"'{written}' holds {table.TimesSeconds.Count} data lines; at least three at times > 0 are needed to find a steady flux";
        }

        if (problem is not null)
        {
            errors.Add(new CaseError(jsonPath, problem));
            return null;
        }

        return new MeasuredPermeation(written, table!.TimesSeconds, table.Values);
    }

    /// <summary>
    /// Parses the text of a measured file; on failure returns null and says why, naming the file and the line and
    /// quoting no more of the file than the one cell at fault (the file may not be what the user meant to give).
    /// </summary>
    public static Table? Parse(string content, string written, Layout layout, out string? problem)
    {
        ArgumentNullException.ThrowIfNull(content);
        problem = null;
        var lines = content.Split('\n');
        var rows = lines.Select((text, index) => (text: text.Trim(), number: index + 1)).Where(line => line.text.Length > 0).ToArray();
        if (rows.Length == 0)
        {
            problem = $"'{written}' is empty; expected a header such as '{layout.ValueExample}' and data lines";
            return null;
        }

        var header = rows[0].text.Split(',');
        var columns = header.Length;
        var time = ColumnUnit(header[0], [Dimension.Time]);
        var value = columns >= 2 ? ColumnUnit(header[1], layout.ValueDimensions) : null;
        var deviation = columns == 3 && value is not null ? ColumnUnit(header[2], [value.Dimension]) : null;
        var shapeOk = columns == 2 || (columns == 3 && layout.AllowsDeviation && deviation is not null);
        if (time is null || value is null || !shapeOk)
        {
            var count = layout.AllowsDeviation ? "two or three columns" : "two columns";
            var third = layout.AllowsDeviation ? ", and optionally a standard deviation in a unit of the same kind" : string.Empty;
            var wrong = time is null ? header[0] : value is null && columns >= 2 ? header[1] : columns > 2 ? header[2] : header[0];
            problem = $"'{written}' line {rows[0].number}: expected {count} with units in brackets, a time and {layout.ValueWhat}{third}, e.g. '{layout.ValueExample}'; got {Token(wrong)} in {Columns(columns)}";
            return null;
        }

        var times = new List<double>();
        var values = new List<double>();
        var deviations = deviation is null ? null : new List<double>();
        foreach (var (text, number) in rows.Skip(1))
        {
            var cells = text.Split(',');
            var numbers = cells.Length == columns ? cells.Select(Number).ToArray() : [];
            if (numbers.Length != columns || numbers.Any(n => n is null))
            {
                var expected = columns == 2 ? "two numbers separated by a comma, e.g. '4,12.5'" : "three numbers separated by commas, e.g. '4,12.5,0.8'";
                var got = cells.Length != columns ? Columns(cells.Length) : Token(cells[Array.FindIndex(numbers, n => n is null)]) + " where a number belongs";
                problem = $"'{written}' line {number}: expected {expected}; got {got}";
                return null;
            }

            var t = numbers[0]!.Value;
            if (t < 0 || (times.Count > 0 && time.ToSi(t) <= times[^1]))
            {
                problem = $"'{written}' line {number}: times must be >= 0 and ascending; got {Token(cells[0])}";
                return null;
            }

            if (deviations is not null && !(numbers[2] > 0))
            {
                problem = $"'{written}' line {number}: the standard deviation must be > 0; got {Token(cells[2])}";
                return null;
            }

            times.Add(time.ToSi(t));
            values.Add(value.ToSi(numbers[1]!.Value));
            deviations?.Add(deviation!.ToSi(numbers[2]!.Value) - deviation.OffsetToSi);
        }

        var name = header[1][..header[1].IndexOf('[', StringComparison.Ordinal)].Trim();
        return new Table(time, value, name, times, values, deviations);
    }

    // A cell is quoted in a message only up to this length: enough to show a typing mistake, too short to carry a
    // line of someone else's file into the output.
    private const int QuotedCharacters = 24;

    private static string Token(string cell)
    {
        var trimmed = cell.Trim();
        var shown = new string(trimmed.Take(QuotedCharacters).Select(c => char.IsControl(c) ? '?' : c).ToArray());
        return $"'{shown}{(trimmed.Length > QuotedCharacters ? "..." : string.Empty)}'";
    }

    private static string Columns(int count) => count == 1 ? "1 column" : $"{count} columns";

    private static double? Number(string cell)
        => double.TryParse(cell.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var number) && double.IsFinite(number) ? number : null;

    private static UnitDefinition? ColumnUnit(string column, IReadOnlyList<Dimension> dimensions)
    {
        var open = column.IndexOf('[', StringComparison.Ordinal);
        var close = column.IndexOf(']', StringComparison.Ordinal);
        if (open < 0 || close < open)
        {
            return null;
        }

        return UnitTable.TryFind(column[(open + 1)..close].Trim(), out var unit) && dimensions.Contains(unit.Dimension) ? unit : null;
    }
}
