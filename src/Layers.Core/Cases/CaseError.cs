namespace Layers.Core.Cases;

/// <summary>One problem found in a case file.</summary>
/// <param name="JsonPath">Where: a JSON path such as <c>$.layers[2].thickness</c>.</param>
/// <param name="Message">What was found and what was expected.</param>
/// <param name="Line">1-based line, when known (JSON syntax errors).</param>
/// <param name="Column">1-based column, when known.</param>
public sealed record CaseError(string JsonPath, string Message, long? Line = null, long? Column = null)
{
    /// <summary>Formats the error for a person, naming the file: <c>case.json: $.layers[0].thickness: ...</c>.</summary>
    public string Format(string fileName)
    {
        var position = Line is { } line ? FormattableString.Invariant($" (line {line}, column {Column})") : string.Empty;
        return $"{fileName}: {JsonPath}{position}: {Message}";
    }
}
