using System.Globalization;

namespace Layers.Core.Reports;

/// <summary>
/// The one writer of CSV cells for every CSV output: RFC 4180 quoting, invariant number formatting, and text cells
/// made safe to open in a spreadsheet.
/// </summary>
public static class CsvText
{
    // The first characters that make a spreadsheet read a cell as a formula (OWASP, CSV Injection): = + - @, and tab
    // and carriage return. An apostrophe is the spreadsheet's own mark for "text": it is prefixed too, so that a name
    // that itself starts with one still shows as written and the prefix can be removed again without ambiguity.
    private static readonly char[] FormulaStarts = ['=', '+', '-', '@', '\t', '\r', '\''];

    /// <summary>
    /// A text cell (a name, a file, a message, a header): prefixed with an apostrophe when it starts with a character
    /// that would make a spreadsheet evaluate it as a formula, then quoted when it holds a comma, quote or line break.
    /// Numbers are written with <see cref="Number"/> and never pass through here, so a negative value stays a number.
    /// </summary>
    public static string Field(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var safe = text.Length > 0 && Array.IndexOf(FormulaStarts, text[0]) >= 0 ? "'" + text : text;
        return safe.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? $"\"{safe.Replace("\"", "\"\"", StringComparison.Ordinal)}\"" : safe;
    }

    /// <summary>The text of a cell written by <see cref="Field"/> and already unquoted: the apostrophe prefix removed.</summary>
    public static string ReadText(string cell)
    {
        ArgumentNullException.ThrowIfNull(cell);
        return cell.Length > 1 && cell[0] == '\'' && Array.IndexOf(FormulaStarts, cell[1]) >= 0 ? cell[1..] : cell;
    }

    /// <summary>A number cell: invariant culture, up to ten significant digits.</summary>
    public static string Number(double value) => value.ToString("G10", CultureInfo.InvariantCulture);

    /// <summary>The cells joined into one line (without its line break).</summary>
    public static string Line(IEnumerable<string> fields) => string.Join(',', fields);
}
