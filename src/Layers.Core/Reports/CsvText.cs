using System.Globalization;

namespace Layers.Core.Reports;

/// <summary>RFC 4180 field quoting and invariant number formatting for the CSV outputs.</summary>
internal static class CsvText
{
    public static string Field(string text)
        => text.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? $"\"{text.Replace("\"", "\"\"", StringComparison.Ordinal)}\"" : text;

    public static string Number(double value) => value.ToString("G10", CultureInfo.InvariantCulture);

    public static string Line(IEnumerable<string> fields) => string.Join(',', fields);
}
