using System.Globalization;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using Layers.Core.Results;

namespace Layers.Core.Cases;

/// <summary>
/// Expands a case that declares <c>"sweep"</c> into one document per combination of the swept values (the
/// Cartesian product, first parameter varying slowest). Each value is substituted into the document at its JSON
/// path before the case is read, so every rule of the case format checks every sub-case.
/// The keys are described in docs/case-format.md, section "Sweeps".
/// </summary>
public static partial class SweepExpander
{
    /// <summary>The most sub-cases one sweep may produce; a larger product is almost always a typing mistake.</summary>
    public const int MaximumVariants = 100_000;

    private static readonly string[] SweepKeys = ["parameters", "result"];

    // A sweep plots a result that every sub-case's row of the batch summary holds, or a figure of one period of a
    // schedule, which the row of a sweep's sub-case holds as well.
    private static readonly Dictionary<string, NamedResult> ResultNames =
        NamedResults.InBatchSummary.Concat(NamedResults.All.Where(NamedResults.IsReadInPeriod))
            .ToDictionary(NamedResults.Name, result => result, StringComparer.Ordinal);

    private static readonly string[] ResultKeys = ["name", "period"];

    /// <summary>The names <c>$.sweep.result</c> accepts: those of the results a batch summary lists, and the figures of one period.</summary>
    public static IReadOnlyCollection<string> ResultNamesAccepted => ResultNames.Keys;

    /// <summary>True when <paramref name="json"/> is a JSON object with a top-level <c>sweep</c> member.</summary>
    public static bool Declares(string json)
    {
        try
        {
            using var document = JsonDocument.Parse(json);
            return document.RootElement.ValueKind == JsonValueKind.Object && document.RootElement.TryGetProperty("sweep", out _);
        }
        catch (JsonException)
        {
            return false;
        }
    }

    /// <summary>The sub-cases of a sweep document, or the errors in its <c>sweep</c> member.</summary>
    /// <param name="json">The whole case document, which declares <c>sweep</c>.</param>
    /// <param name="fileName">The file, whose name without extension starts every sub-case name.</param>
    public static SweepExpansion Expand(string json, string fileName)
    {
        var errors = new List<CaseError>();
        using (var document = JsonDocument.Parse(json))
        {
            if (DuplicateKeys.First(document.RootElement) is { } repeated)
            {
                return Failed(new CaseError(repeated, "appears more than once in this object; keep one"));
            }
        }

        var root = (JsonObject)JsonNode.Parse(json)!;
        var sweep = root["sweep"] as JsonObject;
        if (sweep is null)
        {
            return Failed(new CaseError("$.sweep", "expected an object { \"parameters\": [...], \"result\": ... }"));
        }

        foreach (var (key, _) in sweep)
        {
            if (!SweepKeys.Contains(key))
            {
                errors.Add(new CaseError($"$.sweep.{key}", $"unknown key; expected one of {string.Join(", ", SweepKeys)}"));
            }
        }

        var (result, period) = ReadResult(sweep, errors);
        var parameters = ReadParameters(root, sweep, errors);
        if (errors.Count > 0)
        {
            return new SweepExpansion([], result, errors);
        }

        var total = parameters.Aggregate(1L, (product, parameter) => product * parameter.Values.Count);
        if (total > MaximumVariants)
        {
            return Failed(new CaseError("$.sweep.parameters", FormattableString.Invariant(
                $"the sweep would make {total} sub-cases; at most {MaximumVariants} are allowed")));
        }

        root.Remove("sweep");
        var stem = Path.GetFileNameWithoutExtension(fileName);
        var title = root["title"] is JsonValue given && given.TryGetValue<string>(out var text) ? text : stem;
        var variants = new List<SweepVariant>();
        var width = Math.Max(2, total.ToString(CultureInfo.InvariantCulture).Length);
        foreach (var combination in Combinations(parameters))
        {
            var copy = root.DeepClone().AsObject();
            foreach (var (parameter, value) in parameters.Zip(combination))
            {
                JsonPathSteps.Replace(copy, parameter.Steps, value.Node.DeepClone());
            }

            var values = combination.Select(value => value.Value).ToList();
            var variant = new SweepVariant(
                $"{stem}.{(variants.Count + 1).ToString(CultureInfo.InvariantCulture).PadLeft(width, '0')}_{Slug(values)}",
                string.Empty,
                values);
            copy["title"] = $"{title} ({variant.Describe()})";
            variants.Add(variant with { Json = copy.ToJsonString(new JsonSerializerOptions { WriteIndented = true }) });
        }

        if (result is { } named && NamedResults.IsReadInPeriod(named) && PeriodProblem(variants[0].Json, fileName, named, period) is { } problem)
        {
            return Failed(problem);
        }

        return new SweepExpansion(variants, result, []) { ResultPeriod = period };
    }

    private static SweepExpansion Failed(CaseError error) => new([], null, [error]);

    /// <summary>
    /// <c>$.sweep.result</c>: a result's name, or <c>{ "name", "period" }</c> for a figure of one period of a schedule
    /// (without <c>period</c>, the last).
    /// </summary>
    private static (NamedResult? Result, string? Period) ReadResult(JsonObject sweep, List<CaseError> errors)
    {
        var expected = string.Join(", ", ResultNames.Keys);
        switch (sweep["result"])
        {
            case null:
                errors.Add(new CaseError("$.sweep.result", $"is required; one of {expected}"));
                return (null, null);
            case JsonValue value when value.TryGetValue<string>(out var name) && ResultNames.TryGetValue(name, out var result):
                return (result, null);
            case JsonObject entry:
                foreach (var (key, _) in entry.Where(pair => !ResultKeys.Contains(pair.Key)))
                {
                    errors.Add(new CaseError($"$.sweep.result.{key}", $"unknown key; expected one of {string.Join(", ", ResultKeys)}"));
                }

                if (entry["name"] is not JsonValue named || !named.TryGetValue<string>(out var periodName)
                    || !ResultNames.TryGetValue(periodName, out var periodResult) || !NamedResults.IsReadInPeriod(periodResult))
                {
                    var periodNames = string.Join(", ", ResultNames.Where(pair => NamedResults.IsReadInPeriod(pair.Value)).Select(pair => pair.Key));
                    errors.Add(new CaseError("$.sweep.result.name", $"must be a figure of one period, one of {periodNames}; got {entry["name"]?.ToJsonString() ?? "nothing"}"));
                    return (null, null);
                }

                if (entry["period"] is { } given && (given is not JsonValue label || !label.TryGetValue<string>(out _)))
                {
                    errors.Add(new CaseError("$.sweep.result.period", $"expected the label of a period, e.g. \"dose 7 of 7\"; got {given.ToJsonString()}"));
                    return (null, null);
                }

                return (periodResult, entry["period"]?.GetValue<string>());
            default:
                errors.Add(new CaseError("$.sweep.result", $"must be one of {expected}; got {sweep["result"]!.ToJsonString()}"));
                return (null, null);
        }
    }

    /// <summary>
    /// Why a figure of one period cannot be read from the sweep's cases, judged on the first sub-case: no schedule, or no
    /// period of the label given; null when it can.
    /// </summary>
    private static CaseError? PeriodProblem(string json, string fileName, NamedResult result, string? period)
    {
        if (CaseReader.ReadText(json, fileName).Case is not { } first)
        {
            return null;
        }

        if (first.Schedule is not { } schedule)
        {
            return new CaseError("$.sweep.result", $"{NamedResults.Name(result)} needs $.schedule");
        }

        return period is null || schedule.Periods.Any(candidate => candidate.Label == period)
            ? null
            : new CaseError("$.sweep.result.period", $"no period is labelled '{period}' in the first sub-case; the last is '{schedule.Periods[^1].Label}'");
    }

    private static List<SweepParameter> ReadParameters(JsonObject root, JsonObject sweep, List<CaseError> errors)
    {
        var parameters = new List<SweepParameter>();
        if (sweep["parameters"] is not JsonArray list || list.Count == 0)
        {
            errors.Add(new CaseError("$.sweep.parameters", "expected a non-empty array of parameters"));
            return parameters;
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < list.Count; i++)
        {
            var at = FormattableString.Invariant($"$.sweep.parameters[{i}]");
            if (SweepParameterReader.Read(root, list[i], at, errors) is { } parameter)
            {
                if (!seen.Add(parameter.Path))
                {
                    errors.Add(new CaseError($"{at}.path", $"'{parameter.Path}' is already swept by an earlier parameter"));
                }

                parameters.Add(parameter);
            }
        }

        return parameters;
    }

    private static IEnumerable<IReadOnlyList<SweepParameter.Choice>> Combinations(IReadOnlyList<SweepParameter> parameters)
    {
        IEnumerable<IReadOnlyList<SweepParameter.Choice>> combinations = [[]];
        foreach (var parameter in parameters)
        {
            var current = combinations;
            combinations = current.SelectMany(prefix => parameter.Values.Select(value => (IReadOnlyList<SweepParameter.Choice>)[.. prefix, value]));
        }

        return combinations;
    }

    /// <summary>
    /// A short, filesystem-safe text of the values: letters, digits, '.', '+' and '-' kept, spaces dropped, anything
    /// else (such as the '/' of a unit) replaced by '_', so the name is the same on every operating system.
    /// </summary>
    private static string Slug(IEnumerable<SweepValue> values)
    {
        var slug = new StringBuilder();
        foreach (var value in values)
        {
            if (slug.Length > 0)
            {
                slug.Append('_');
            }

            // The file name keeps the key of the path ("thickness"), not the words for people: names stay stable.
            var label = value.Path[(value.Path.LastIndexOf('.') + 1)..];
            slug.Append(SafeName().Replace(label, "_")).Append('-').Append(SafeName().Replace(value.Written.Replace(" ", string.Empty, StringComparison.Ordinal), "_"));
        }

        return slug.Length > 80 ? slug.ToString(0, 80) : slug.ToString();
    }

    [GeneratedRegex("[^A-Za-z0-9.+-]")]
    private static partial Regex SafeName();
}
