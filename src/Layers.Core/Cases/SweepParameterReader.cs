using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace Layers.Core.Cases;

/// <summary>
/// Reads one entry of <c>$.sweep.parameters</c>: a path that exists in the case and either a list of
/// <c>values</c> or a range (<c>from</c>, <c>to</c>, <c>count</c>, <c>spacing</c>). Range values are written in the
/// unit of <c>from</c>, which <c>to</c> must share, with six significant digits.
/// </summary>
internal static partial class SweepParameterReader
{
    private const int MaximumCount = 10_000;
    private static readonly string[] Keys = ["path", "values", "from", "to", "count", "spacing"];

    public static SweepParameter? Read(JsonObject root, JsonNode? entry, string at, List<CaseError> errors)
    {
        if (entry is not JsonObject parameter)
        {
            errors.Add(new CaseError(at, "expected an object { \"path\": ..., \"values\": [...] } or { \"path\": ..., \"from\": ..., \"to\": ..., \"count\": ... }"));
            return null;
        }

        var before = errors.Count;
        foreach (var (key, _) in parameter)
        {
            if (!Keys.Contains(key))
            {
                errors.Add(new CaseError($"{at}.{key}", $"unknown key; expected one of {string.Join(", ", Keys)}"));
            }
        }

        var (path, steps) = VariedPath.Read(root, parameter, at, "swept", errors);
        var label = InputLabels.Of(root, path);
        var hasList = parameter.ContainsKey("values");
        var hasRange = parameter.ContainsKey("from") || parameter.ContainsKey("to") || parameter.ContainsKey("count") || parameter.ContainsKey("spacing");
        List<SweepParameter.Choice>? values = null;
        if (hasList && hasRange)
        {
            errors.Add(new CaseError(at, "give either values or from/to/count, not both"));
        }
        else if (hasList)
        {
            values = ReadList(parameter["values"], path, label, $"{at}.values", errors);
        }
        else if (hasRange)
        {
            values = ReadRange(parameter, path, label, at, errors);
        }
        else
        {
            errors.Add(new CaseError(at, "needs values, or from, to and count"));
        }

        return errors.Count == before && steps is not null && values is not null
            ? new SweepParameter(path, steps, values)
            : null;
    }

    private static List<SweepParameter.Choice>? ReadList(JsonNode? node, string path, string label, string at, List<CaseError> errors)
    {
        if (node is not JsonArray array || array.Count == 0)
        {
            errors.Add(new CaseError(at, "expected a non-empty array of quantities (\"20 um\") or numbers"));
            return null;
        }

        var choices = new List<SweepParameter.Choice>();
        for (var i = 0; i < array.Count; i++)
        {
            var item = array[i];
            if (item is JsonValue value && value.GetValueKind() is JsonValueKind.String or JsonValueKind.Number)
            {
                var written = value.GetValueKind() == JsonValueKind.String ? value.GetValue<string>() : value.ToJsonString();
                choices.Add(Choice(item.DeepClone(), path, label, written));
            }
            else
            {
                errors.Add(new CaseError(FormattableString.Invariant($"{at}[{i}]"), "expected a quantity (\"20 um\") or a number"));
            }
        }

        return choices;
    }

    private static List<SweepParameter.Choice>? ReadRange(JsonObject parameter, string path, string label, string at, List<CaseError> errors)
    {
        var from = Endpoint(parameter["from"], $"{at}.from", errors);
        var to = Endpoint(parameter["to"], $"{at}.to", errors);
        var count = parameter["count"] is JsonValue countValue && countValue.TryGetValue<int>(out var n) ? n : (int?)null;
        if (count is not (>= 2 and <= MaximumCount))
        {
            errors.Add(new CaseError($"{at}.count", FormattableString.Invariant($"must be a whole number from 2 to {MaximumCount}")));
        }

        SweepSpacing? spacing = parameter["spacing"] is null
            ? SweepSpacing.Linear
            : (parameter["spacing"] as JsonValue)?.TryGetValue<string>(out var s) == true
                ? Enum.GetValues<SweepSpacing>().Where(value => JsonNamingPolicy.CamelCase.ConvertName(value.ToString()) == s).Select(value => (SweepSpacing?)value).FirstOrDefault()
                : null;
        if (spacing is null)
        {
            errors.Add(new CaseError($"{at}.spacing", "must be \"linear\" or \"log\""));
        }

        if (from is not { } start || to is not { } end || count is not { } points || spacing is null)
        {
            return null;
        }

        if (!string.Equals(start.Unit, end.Unit, StringComparison.Ordinal) || start.IsNumber != end.IsNumber)
        {
            errors.Add(new CaseError($"{at}.to", $"must be written like from ('{start.Written}'), in the same unit; got '{end.Written}'"));
            return null;
        }

        var log = spacing == SweepSpacing.Log;
        if (log && (start.Number <= 0 || end.Number <= 0))
        {
            errors.Add(new CaseError(at, "log spacing needs from and to > 0"));
            return null;
        }

        var choices = new List<SweepParameter.Choice>();
        for (var i = 0; i < points; i++)
        {
            var fraction = (double)i / (points - 1);
            var number = log
                ? Math.Exp(Math.Log(start.Number) + fraction * (Math.Log(end.Number) - Math.Log(start.Number)))
                : start.Number + fraction * (end.Number - start.Number);
            var text = number.ToString("G6", CultureInfo.InvariantCulture);
            choices.Add(start.IsNumber
                ? Choice(JsonValue.Create(double.Parse(text, CultureInfo.InvariantCulture)), path, label, text)
                : Choice(JsonValue.Create($"{text} {start.Unit}"), path, label, $"{text} {start.Unit}"));
        }

        return choices;
    }

    /// <summary>A number, or a number with a unit such as "1e-10 cm2/s", split; null (with an error) otherwise.</summary>
    internal static (double Number, string Unit, bool IsNumber, string Written)? Endpoint(JsonNode? node, string at, List<CaseError> errors)
    {
        if (node is JsonValue value && value.GetValueKind() == JsonValueKind.Number)
        {
            return (value.GetValue<double>(), string.Empty, true, value.ToJsonString());
        }

        if (node is JsonValue text && text.TryGetValue<string>(out var written) && Split(written) is { } split)
        {
            return (split.Number, split.Unit, false, written);
        }

        errors.Add(new CaseError(at, "is required: a number, or a number with a unit such as \"1e-10 cm2/s\""));
        return null;
    }

    private static SweepParameter.Choice Choice(JsonNode node, string path, string label, string written) =>
        new(node, SweepValues.Of(path, written, label));

    /// <summary>The number and the unit text of "1e-10 cm2/s"; null when the text does not start with a number.</summary>
    internal static (double Number, string Unit)? Split(string text)
    {
        var match = NumberAndUnit().Match(text);
        return match.Success && double.TryParse(match.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var number)
            ? (number, match.Groups[2].Value.Trim())
            : null;
    }

    [GeneratedRegex(@"^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$")]
    private static partial Regex NumberAndUnit();
}
