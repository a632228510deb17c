using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;

namespace Layers.Core.Studies;

/// <summary>Reads <c>$.design</c> of a case document, every mistake with its JSON path.</summary>
public static class DesignReader
{
    private const string At = "$.design";
    private static readonly string[] Keys = ["input", "result", "target", "tolerance", "points"];
    private static readonly string[] InputKeys = ["path", "from", "to", "scale"];

    /// <summary>The ratio of the range's ends from which the scale is logarithmic unless said otherwise.</summary>
    private const double LogScaleRatio = 10;

    /// <summary>The design, or null with the errors added.</summary>
    /// <param name="root">The whole case document, which has a <c>design</c> member.</param>
    /// <param name="fileName">The case file.</param>
    /// <param name="baseCase">The case as written (valid).</param>
    /// <param name="errors">Receives the problems.</param>
    public static DesignSettings? Read(JsonObject root, string fileName, SimulationCase baseCase, List<CaseError> errors)
    {
        ArgumentNullException.ThrowIfNull(errors);
        var before = errors.Count;
        if (StudyValues.Section(root, "design", "{ \"input\": {...}, \"result\": ..., \"target\": ... }", Keys, errors) is not { } design)
        {
            return null;
        }

        var range = ReadInput(root, fileName, design, errors);
        var result = StudyValues.Measure(design["result"], $"{At}.result", baseCase, errors);
        var target = result is null ? null : StudyValues.Quantity(design["target"], $"{At}.target", result.Dimension, errors);
        if (target is { } given && !(given.SiValue > 0))
        {
            errors.Add(new CaseError($"{At}.target", $"must be > 0; got '{design["target"]!.GetValue<string>()}'"));
        }

        var tolerance = StudyValues.Number(design, "tolerance", At, 1e-9, 0.1, DesignSettings.DefaultTolerance, errors);
        var points = StudyValues.Number(design, "points", At, 3, 200, DesignSettings.DefaultPoints, errors);
        if (points is { } count && count != Math.Floor(count))
        {
            errors.Add(new CaseError($"{At}.points", "must be a whole number"));
        }

        if (errors.Count > before || range is not { } input || result is null || target is not { } goal)
        {
            return null;
        }

        return new DesignSettings
        {
            Input = input.Input,
            Lowest = Math.Min(input.From, input.To),
            Highest = Math.Max(input.From, input.To),
            LogScale = input.Log,
            Result = result,
            TargetSi = goal.SiValue,
            TargetUnit = goal.Unit,
            Tolerance = tolerance!.Value,
            Points = (int)points!.Value,
        };
    }

    private static (StudyInput Input, double From, double To, bool Log)? ReadInput(JsonObject root, string fileName, JsonObject design, List<CaseError> errors)
    {
        var at = $"{At}.input";
        if (StudyValues.Object(design["input"], at, "{ \"path\": ..., \"from\": ..., \"to\": ... }", errors) is not { } input)
        {
            return null;
        }

        var before = errors.Count;
        StudyValues.Unknown(input, at, InputKeys, errors);
        var from = SweepParameterReader.Endpoint(input["from"], $"{at}.from", errors);
        var to = SweepParameterReader.Endpoint(input["to"], $"{at}.to", errors);
        var scale = input["scale"] is null ? null : StudyValues.Choice<SearchScale>(input, "scale", at, errors);
        var varied = from is { } unitSource ? CaseVariation.ReadInput(root, input, at, unitSource.Unit, errors) : null;
        if (errors.Count > before || varied is null || from is not { } start || to is not { } end)
        {
            return null;
        }

        if (!string.Equals(start.Unit, end.Unit, StringComparison.Ordinal) || start.IsNumber != end.IsNumber)
        {
            errors.Add(new CaseError($"{at}.to", $"must be written like from ('{start.Written}'), in the same unit; got '{end.Written}'"));
            return null;
        }

        if (start.Number == end.Number)
        {
            errors.Add(new CaseError($"{at}.to", $"must differ from from ('{start.Written}'): the range is where the answer is looked for"));
            return null;
        }

        var positive = start.Number > 0 && end.Number > 0;
        if (scale == SearchScale.Log && !positive)
        {
            errors.Add(new CaseError($"{at}.scale", "a log scale needs from and to > 0"));
            return null;
        }

        var ratio = Math.Max(start.Number, end.Number) / Math.Min(start.Number, end.Number);
        var log = scale == SearchScale.Log || (scale is null && positive && ratio >= LogScaleRatio);
        CaseVariation.CheckValue(root, fileName, varied, start.Number, $"{at}.from", errors);
        CaseVariation.CheckValue(root, fileName, varied, end.Number, $"{at}.to", errors);
        return errors.Count > before ? null : (varied, start.Number, end.Number, log);
    }
}
