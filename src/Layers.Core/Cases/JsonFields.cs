using System.Globalization;
using System.Text.Json;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads the members of one JSON object, recording every problem with its JSON path instead of stopping at the
/// first: unknown keys (with the nearest known key as a suggestion), wrong JSON types, missing required keys,
/// quantities with a wrong or unknown unit.
/// </summary>
internal sealed class JsonFields
{
    private readonly JsonElement _element;
    private readonly List<CaseError> _errors;

    private JsonFields(JsonElement element, string path, List<CaseError> errors)
    {
        _element = element;
        Path = path;
        _errors = errors;
    }

    /// <summary>JSON path of this object.</summary>
    public string Path { get; }

    /// <summary>Opens an object, reporting keys not in <paramref name="allowedKeys"/>; null when it is not an object.</summary>
    public static JsonFields? Open(JsonElement element, string path, List<CaseError> errors, IReadOnlyCollection<string> allowedKeys)
    {
        if (element.ValueKind != JsonValueKind.Object)
        {
            errors.Add(new CaseError(path, $"expected an object {{ ... }}; found {Describe(element)}"));
            return null;
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var property in element.EnumerateObject())
        {
            if (!seen.Add(property.Name))
            {
                errors.Add(new CaseError($"{path}.{property.Name}", "appears more than once in this object; keep one"));
            }
            else if (!allowedKeys.Contains(property.Name))
            {
                errors.Add(new CaseError($"{path}.{property.Name}", UnknownKeyMessage(property.Name, allowedKeys)));
            }
        }

        return new JsonFields(element, path, errors);
    }

    /// <summary>The path of a member of this object.</summary>
    public string PathOf(string key) => $"{Path}.{key}";

    /// <summary>Records an error at a member of this object.</summary>
    public void Error(string key, string message) => _errors.Add(new CaseError(PathOf(key), message));

    /// <summary>True when the member is present (and not null).</summary>
    public bool Has(string key) => _element.TryGetProperty(key, out var value) && value.ValueKind != JsonValueKind.Null;

    /// <summary>The raw member, or null when absent; reports it when required.</summary>
    public JsonElement? Member(string key, bool required = false)
    {
        if (_element.TryGetProperty(key, out var value) && value.ValueKind != JsonValueKind.Null)
        {
            return value;
        }

        if (required)
        {
            Error(key, "is required");
        }

        return null;
    }

    /// <summary>A string member as the user wrote it (trimmed), for quoting in messages; empty when not a string.</summary>
    public string Written(string key) =>
        _element.TryGetProperty(key, out var value) && value.ValueKind == JsonValueKind.String
            ? value.GetString()!.Trim()
            : string.Empty;

    /// <summary>A string member.</summary>
    public string? Text(string key, bool required = false)
    {
        if (Member(key, required) is not { } value)
        {
            return null;
        }

        if (value.ValueKind != JsonValueKind.String)
        {
            Error(key, $"expected a string; found {Describe(value)}");
            return null;
        }

        return value.GetString();
    }

    /// <summary>A finite number member.</summary>
    public double? Number(string key, bool required = false)
    {
        if (Member(key, required) is not { } value)
        {
            return null;
        }

        if (value.ValueKind != JsonValueKind.Number || !value.TryGetDouble(out var number) || !double.IsFinite(number))
        {
            Error(key, $"expected a finite number; found {Describe(value)}");
            return null;
        }

        return number;
    }

    /// <summary>An integer member.</summary>
    public int? Integer(string key)
    {
        if (Member(key) is not { } value)
        {
            return null;
        }

        if (value.ValueKind != JsonValueKind.Number || !value.TryGetInt32(out var number))
        {
            Error(key, $"expected a whole number; found {Describe(value)}");
            return null;
        }

        return number;
    }

    /// <summary>A quantity with a unit of one of the expected dimensions, e.g. "50 um".</summary>
    public Quantity? Quantity(string key, IReadOnlyCollection<Dimension> expected, bool required = false)
    {
        if (Member(key, required) is not { } value)
        {
            return null;
        }

        return ParseQuantity(value, PathOf(key), expected, _errors);
    }

    /// <summary>Parses one quantity element (also used for array items).</summary>
    public static Quantity? ParseQuantity(JsonElement value, string path, IReadOnlyCollection<Dimension> expected, List<CaseError> errors)
    {
        if (value.ValueKind == JsonValueKind.Number)
        {
            var examples = UnitTable.ExamplesFor(expected.First());
            var example = examples.Count > 0 ? examples[0] : "m";
            errors.Add(new CaseError(path, $"'{value.GetRawText()}' has no unit; a unit is required, e.g. '{value.GetRawText()} {example}'"));
            return null;
        }

        if (value.ValueKind != JsonValueKind.String)
        {
            errors.Add(new CaseError(path, $"expected a quantity string such as \"50 um\"; found {Describe(value)}"));
            return null;
        }

        if (!QuantityParser.TryParse(value.GetString(), expected, out var quantity, out var problem))
        {
            errors.Add(new CaseError(path, problem ?? "not a valid quantity"));
            return null;
        }

        return quantity;
    }

    /// <summary>Describes a JSON value for messages: its kind and, for short scalars, its text.</summary>
    public static string Describe(JsonElement value) => value.ValueKind switch
    {
        JsonValueKind.String => $"the string \"{value.GetString()}\"",
        JsonValueKind.Number => $"the number {value.GetRawText()}",
        JsonValueKind.True or JsonValueKind.False => $"the boolean {value.GetRawText()}",
        JsonValueKind.Array => "an array",
        JsonValueKind.Object => "an object",
        _ => "null",
    };

    private static string UnknownKeyMessage(string key, IReadOnlyCollection<string> allowed)
    {
        var nearest = allowed
            .Select(candidate => (candidate, distance: EditDistance.Between(
                key.ToLower(CultureInfo.InvariantCulture), candidate.ToLower(CultureInfo.InvariantCulture))))
            .OrderBy(pair => pair.distance)
            .First();
        var suggestion = nearest.distance <= Math.Max(2, key.Length / 3) ? $"; did you mean \"{nearest.candidate}\"?" : ".";
        return $"unknown key \"{key}\"{suggestion} Known keys here: {string.Join(", ", allowed)}";
    }
}
