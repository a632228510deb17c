using System.Text.Json;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Units;

namespace Layers.Core.Studies;

/// <summary>Reading the values of a study section: results, quantities with units, numbers in ranges.</summary>
internal static class StudyValues
{
    /// <summary>
    /// A result: a name (<c>"lagTime"</c>), <c>{ "name": "rightReceived", "at": "10 d" }</c> or, for a figure of one
    /// period of a schedule, <c>{ "name": "rightPeriodReceived", "period": "dose 7 of 7" }</c> (without
    /// <c>period</c>, the last period), checked against the base case.
    /// </summary>
    public static ResultMeasure? Measure(JsonNode? node, string at, SimulationCase baseCase, List<CaseError> errors)
    {
        var expected = string.Join(", ", NamedResults.ByName.Keys);
        string? name = null;
        JsonNode? time = null;
        JsonNode? period = null;
        if (node is JsonValue value && value.TryGetValue<string>(out var text))
        {
            name = text;
        }
        else if (node is JsonObject member)
        {
            Unknown(member, at, ["name", "at", "period"], errors);
            name = member["name"] is JsonValue named && named.TryGetValue<string>(out var given) ? given : null;
            time = member["at"];
            period = member["period"];
        }

        if (name is null || !NamedResults.ByName.TryGetValue(name, out var kind))
        {
            errors.Add(new CaseError(at, $"must be one of {expected}, or {{ \"name\": ..., \"at\": \"10 d\" }}, or {{ \"name\": ..., \"period\": \"dose 7 of 7\" }}; got {node?.ToJsonString() ?? "nothing"}"));
            return null;
        }

        var measure = new ResultMeasure(kind) { AtJudgedContact = kind == NamedResult.FoodConcentration && baseCase.JudgesRepeatedUse };
        if (time is not null)
        {
            if (!measure.IsAtTime)
            {
                errors.Add(new CaseError($"{at}.at", $"{name} is not read at a time; leave out 'at'"));
                return null;
            }

            if (Quantity(time, $"{at}.at", Dimension.Time, errors) is not { } seconds)
            {
                return null;
            }

            measure = measure with { AtSeconds = seconds.SiValue, AtText = ((JsonValue)time).GetValue<string>() };
        }

        if (period is not null)
        {
            if (!measure.IsInPeriod)
            {
                errors.Add(new CaseError($"{at}.period", $"{name} is not a figure of one period; leave out 'period'"));
                return null;
            }

            if (period is not JsonValue label || !label.TryGetValue<string>(out var periodLabel) || periodLabel.Length == 0)
            {
                errors.Add(new CaseError($"{at}.period", $"expected a period's label as text, e.g. \"dose 7 of 7\"; got {period.ToJsonString()}"));
                return null;
            }

            measure = measure with { Period = periodLabel };
        }

        if (measure.Problem(baseCase) is { } problem)
        {
            errors.Add(new CaseError(at, problem));
            return null;
        }

        if (measure.PeriodProblem(baseCase) is { } unknown)
        {
            errors.Add(new CaseError($"{at}.period", unknown));
            return null;
        }

        return measure;
    }

    /// <summary>A quantity of the given dimension written as text ("2 d"); null with an error otherwise.</summary>
    public static Quantity? Quantity(JsonNode? node, string at, Dimension dimension, List<CaseError> errors)
    {
        if (node is JsonValue value && value.TryGetValue<string>(out var text))
        {
            if (QuantityParser.TryParse(text, [dimension], out var quantity, out var problem))
            {
                return quantity;
            }

            errors.Add(new CaseError(at, problem!));
            return null;
        }

        errors.Add(new CaseError(at, $"expected {QuantityParser.Describe(dimension)} written with its unit, e.g. \"{QuantityParser.SampleFor(dimension)}\""));
        return null;
    }

    /// <summary>A number from <paramref name="minimum"/> to <paramref name="maximum"/>, or the default when absent.</summary>
    public static double? Number(JsonObject holder, string key, string at, double minimum, double maximum, double fallback, List<CaseError> errors)
    {
        var node = holder[key];
        if (node is null)
        {
            return fallback;
        }

        if (node is JsonValue value && value.GetValueKind() == JsonValueKind.Number && value.GetValue<double>() is var number
            && number >= minimum && number <= maximum)
        {
            return number;
        }

        errors.Add(new CaseError($"{at}.{key}", FormattableString.Invariant($"must be a number from {minimum} to {maximum}; got {node.ToJsonString()}")));
        return null;
    }

    /// <summary>One of the allowed words, or the default when absent.</summary>
    public static string? Word(JsonObject holder, string key, string at, IReadOnlyList<string> allowed, List<CaseError> errors)
    {
        var node = holder[key];
        if (node is null)
        {
            return allowed[0];
        }

        if (node is JsonValue value && value.TryGetValue<string>(out var word) && allowed.Contains(word))
        {
            return word;
        }

        errors.Add(new CaseError($"{at}.{key}", $"must be one of {string.Join(", ", allowed.Select(item => $"\"{item}\""))}; got {node.ToJsonString()}"));
        return null;
    }

    /// <summary>One of the members of <typeparamref name="T"/> written as its camel-case name; the first member when absent.</summary>
    public static T? Choice<T>(JsonObject holder, string key, string at, List<CaseError> errors)
        where T : struct, Enum
    {
        var byName = Enum.GetValues<T>().ToDictionary(value => JsonNamingPolicy.CamelCase.ConvertName(value.ToString()), value => value, StringComparer.Ordinal);
        return Word(holder, key, at, [.. byName.Keys], errors) is { } word ? byName[word] : null;
    }

    /// <summary>Adds an error for every member not in <paramref name="keys"/>.</summary>
    public static void Unknown(JsonObject holder, string at, IReadOnlyList<string> keys, List<CaseError> errors)
    {
        foreach (var (key, _) in holder)
        {
            if (!keys.Contains(key))
            {
                errors.Add(new CaseError($"{at}.{key}", $"unknown key; expected one of {string.Join(", ", keys)}"));
            }
        }
    }

    /// <summary>The study section <c>$.key</c> of the document, with its unknown keys reported; null with an error when it is not an object.</summary>
    public static JsonObject? Section(JsonObject root, string key, string shape, IReadOnlyList<string> keys, List<CaseError> errors)
    {
        ArgumentNullException.ThrowIfNull(root);
        ArgumentNullException.ThrowIfNull(errors);
        if (Object(root[key], $"$.{key}", shape, errors) is not { } section)
        {
            return null;
        }

        Unknown(section, $"$.{key}", keys, errors);
        return section;
    }

    /// <summary>The node as a JSON object; null with an error naming the expected shape otherwise.</summary>
    public static JsonObject? Object(JsonNode? node, string at, string shape, List<CaseError> errors)
    {
        if (node is JsonObject member)
        {
            return member;
        }

        errors.Add(new CaseError(at, $"expected an object {shape}"));
        return null;
    }
}
