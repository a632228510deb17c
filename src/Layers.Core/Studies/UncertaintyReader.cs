using System.Text.Json;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Units;

namespace Layers.Core.Studies;

/// <summary>Reads <c>$.uncertainty</c> of a case document, every mistake with its JSON path.</summary>
public static class UncertaintyReader
{
    private const string At = "$.uncertainty";
    private static readonly string[] Keys = ["inputs", "samples", "seed", "sampling", "percentiles", "results", "limit"];
    private static readonly string[] LimitKeys = ["result", "value"];

    /// <summary>The keys of a distribution's two parameters, in the order they are read.</summary>
    private static string[] Parameters(DistributionKind kind) => kind switch
    {
        DistributionKind.LogNormal => ["median", "factor"],
        DistributionKind.Uniform => ["min", "max"],
        DistributionKind.LogUniform => ["min", "max"],
        DistributionKind.Normal => ["mean", "standardDeviation"],
    };

    /// <summary>The study, or null with the errors added.</summary>
    /// <param name="root">The whole case document, which has an <c>uncertainty</c> member.</param>
    /// <param name="fileName">The case file.</param>
    /// <param name="baseCase">The case as written (valid).</param>
    /// <param name="errors">Receives the problems.</param>
    public static UncertaintySettings? Read(JsonObject root, string fileName, SimulationCase baseCase, List<CaseError> errors)
    {
        ArgumentNullException.ThrowIfNull(baseCase);
        ArgumentNullException.ThrowIfNull(errors);
        var before = errors.Count;
        if (StudyValues.Section(root, "uncertainty", "{ \"inputs\": [...], \"samples\": 200 }", Keys, errors) is not { } study)
        {
            return null;
        }

        var inputs = ReadInputs(root, fileName, study, errors);
        var samples = StudyValues.Number(study, "samples", At, 2, UncertaintySettings.MaximumSamples, UncertaintySettings.DefaultSamples, errors);
        var seed = StudyValues.Number(study, "seed", At, 0, int.MaxValue, UncertaintySettings.DefaultSeed, errors);
        foreach (var (key, value) in new[] { ("samples", samples), ("seed", seed) })
        {
            if (value is { } number && number != Math.Floor(number))
            {
                errors.Add(new CaseError($"{At}.{key}", "must be a whole number"));
            }
        }

        var sampling = StudyValues.Choice<SamplingMethod>(study, "sampling", At, errors);
        var percentiles = ReadPercentiles(study, errors);
        var results = ReadResults(study, baseCase, errors);
        var limit = ReadLimit(study, baseCase, errors);
        if (errors.Count > before)
        {
            return null;
        }

        return new UncertaintySettings
        {
            Inputs = inputs,
            Samples = (int)samples!.Value,
            Seed = (int)seed!.Value,
            Sampling = sampling!.Value,
            Percentiles = percentiles,
            Results = results,
            Limit = limit,
        };
    }

    private static List<UncertainInput> ReadInputs(JsonObject root, string fileName, JsonObject study, List<CaseError> errors)
    {
        var inputs = new List<UncertainInput>();
        if (study["inputs"] is not JsonArray list || list.Count == 0)
        {
            errors.Add(new CaseError($"{At}.inputs", "expected a non-empty array of inputs { \"path\": ..., \"distribution\": ..., ... }"));
            return inputs;
        }

        for (var i = 0; i < list.Count; i++)
        {
            var at = FormattableString.Invariant($"{At}.inputs[{i}]");
            if (ReadInput(root, fileName, list[i], at, errors) is { } input)
            {
                if (inputs.Any(earlier => earlier.Input.Path == input.Input.Path))
                {
                    errors.Add(new CaseError($"{at}.path", $"'{input.Input.Path}' is already an uncertain input"));
                }

                inputs.Add(input);
            }
        }

        return inputs;
    }

    private static UncertainInput? ReadInput(JsonObject root, string fileName, JsonNode? node, string at, List<CaseError> errors)
    {
        if (StudyValues.Object(node, at, "{ \"path\": ..., \"distribution\": \"logNormal\", \"median\": ..., \"factor\": ... }", errors) is not { } entry)
        {
            return null;
        }

        var before = errors.Count;
        var kind = StudyValues.Choice<DistributionKind>(entry, "distribution", at, errors);
        if (entry["distribution"] is null)
        {
            var names = Enum.GetValues<DistributionKind>().Select(value => JsonNamingPolicy.CamelCase.ConvertName(value.ToString()));
            errors.Add(new CaseError($"{at}.distribution", $"is required: one of {string.Join(", ", names)}"));
            return null;
        }

        if (kind is not { } name)
        {
            return null;
        }

        var keys = Parameters(name);
        StudyValues.Unknown(entry, at, ["path", "distribution", .. keys], errors);
        var first = SweepParameterReader.Endpoint(entry[keys[0]], $"{at}.{keys[0]}", errors);
        var input = first is { } unitSource ? CaseVariation.ReadInput(root, entry, at, unitSource.Unit, errors) : null;
        var second = name == DistributionKind.LogNormal ? Factor(entry, at, errors) : SweepParameterReader.Endpoint(entry[keys[1]], $"{at}.{keys[1]}", errors);
        if (errors.Count > before || input is null || first is not { } a || second is not { } b)
        {
            return null;
        }

        if (name != DistributionKind.LogNormal && (!string.Equals(a.Unit, b.Unit, StringComparison.Ordinal) || a.IsNumber != b.IsNumber))
        {
            errors.Add(new CaseError($"{at}.{keys[1]}", $"must be written like {keys[0]} ('{a.Written}'), in the same unit; got '{b.Written}'"));
            return null;
        }

        var distribution = Build(name, a.Number, b.Number, at, keys, errors);
        if (distribution is null)
        {
            return null;
        }

        foreach (var probability in new[] { 0.5, 0.001, 0.999 })
        {
            CaseVariation.CheckValue(root, fileName, input, distribution.Quantile(probability), $"{at}.{keys[0]}", errors);
            if (errors.Count > before)
            {
                return null;
            }
        }

        return new UncertainInput(input, distribution);
    }

    private static (double Number, string Unit, bool IsNumber, string Written)? Factor(JsonObject entry, string at, List<CaseError> errors)
    {
        if (entry["factor"] is JsonValue value && value.GetValueKind() == JsonValueKind.Number && value.GetValue<double>() is var factor && factor > 1)
        {
            return (factor, string.Empty, true, value.ToJsonString());
        }

        errors.Add(new CaseError($"{at}.factor", $"is required: a plain number > 1, the geometric standard deviation (2 puts about 68 % of values within median/2 to median*2); got {entry["factor"]?.ToJsonString() ?? "nothing"}"));
        return null;
    }

    private static Distribution? Build(DistributionKind kind, double a, double b, string at, string[] keys, List<CaseError> errors)
    {
        string? problem = kind switch
        {
            DistributionKind.LogNormal => a > 0 ? null : $"{keys[0]} must be > 0",
            DistributionKind.Uniform => b > a ? null : $"{keys[1]} must be above {keys[0]}",
            DistributionKind.LogUniform => a > 0 && b > a ? null : $"{keys[0]} must be > 0 and {keys[1]} above it",
            DistributionKind.Normal => b > 0 ? null : $"{keys[1]} must be > 0",
        };
        if (problem is not null)
        {
            errors.Add(new CaseError(at, problem));
            return null;
        }

        return kind switch
        {
            DistributionKind.LogNormal => new LogNormalDistribution(a, b),
            DistributionKind.Uniform => new UniformDistribution(a, b),
            DistributionKind.LogUniform => new LogUniformDistribution(a, b),
            DistributionKind.Normal => new NormalDistribution(a, b),
        };
    }

    private static List<double> ReadPercentiles(JsonObject study, List<CaseError> errors)
    {
        if (study["percentiles"] is null)
        {
            return [5, 50, 95];
        }

        var values = (study["percentiles"] as JsonArray)?
            .Select(node => node is JsonValue value && value.GetValueKind() == JsonValueKind.Number ? value.GetValue<double>() : double.NaN)
            .ToList();
        if (values is null || values.Count == 0 || values.Any(value => !(value > 0 && value < 100))
            || values.Zip(values.Skip(1)).Any(pair => pair.Second <= pair.First))
        {
            errors.Add(new CaseError($"{At}.percentiles", $"expected ascending numbers between 0 and 100, e.g. [5, 50, 95]; got {study["percentiles"]!.ToJsonString()}"));
            return [];
        }

        return values;
    }

    private static List<ResultMeasure> ReadResults(JsonObject study, SimulationCase baseCase, List<CaseError> errors)
    {
        if (study["results"] is null)
        {
            return [];
        }

        if (study["results"] is not JsonArray list)
        {
            errors.Add(new CaseError($"{At}.results", "expected an array of results, e.g. [\"lagTime\", { \"name\": \"rightReceived\", \"at\": \"1 d\" }]"));
            return [];
        }

        return list
            .Select((node, i) => StudyValues.Measure(node, FormattableString.Invariant($"{At}.results[{i}]"), baseCase, errors))
            .OfType<ResultMeasure>()
            .ToList();
    }

    /// <summary>
    /// The limit given, or by default the specific migration limit of a food-contact case, against the food at the end
    /// (of the judged contact, for an article tested in repeated contacts, as the run's own verdict reads it).
    /// </summary>
    private static StudyLimit? ReadLimit(JsonObject study, SimulationCase baseCase, List<CaseError> errors)
    {
        var at = $"{At}.limit";
        if (study["limit"] is null)
        {
            return baseCase.FoodContact?.SpecificMigrationLimit is { } limit
                ? new StudyLimit(
                    new ResultMeasure(NamedResult.FoodConcentration) { AtJudgedContact = baseCase.JudgesRepeatedUse },
                    limit,
                    UnitTable.Get("mg/kg"),
                    "$.foodContact.specificMigrationLimit")
                : null;
        }

        if (StudyValues.Object(study["limit"], at, "{ \"result\": ..., \"value\": ... }", errors) is not { } entry)
        {
            return null;
        }

        StudyValues.Unknown(entry, at, LimitKeys, errors);
        var result = StudyValues.Measure(entry["result"], $"{at}.result", baseCase, errors);
        var value = result is null ? null : StudyValues.Quantity(entry["value"], $"{at}.value", result.Dimension, errors);
        return result is not null && value is { } given ? new StudyLimit(result, given.SiValue, given.Unit, at) : null;
    }
}
