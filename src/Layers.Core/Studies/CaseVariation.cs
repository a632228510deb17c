using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;

namespace Layers.Core.Studies;

/// <summary>
/// The one way the studies (design, uncertainty, and any later one) change a case: values are written into a copy
/// of the case document at their JSON paths, the study sections are removed, and the copy is read by
/// <see cref="CaseReader"/> like any case file. A value that breaks a rule of the format therefore gets the usual
/// message at the usual path. Reading is cheap next to solving, so every variant is read in full.
/// </summary>
public static class CaseVariation
{
    /// <summary>Top-level members that declare studies; a variant is a plain case without them.</summary>
    public static IReadOnlyList<string> StudyKeys { get; } = ["sweep", "design", "uncertainty"];

    /// <summary>The case document as a JSON object, or null when the text is not a JSON object.</summary>
    public static JsonObject? Parse(string json)
    {
        try
        {
            return JsonNode.Parse(json) as JsonObject;
        }
        catch (System.Text.Json.JsonException)
        {
            return null;
        }
    }

    /// <summary>Reads the case with the given values written in.</summary>
    /// <param name="document">The whole case document (not changed).</param>
    /// <param name="fileName">The case file, for messages and the default title.</param>
    /// <param name="values">Each input with the number to write, in the input's unit.</param>
    /// <param name="extraOutputSeconds">
    /// Times at which the variant must have an output (a result read "at" a time); those after its duration are left
    /// out, so a study that changes the duration still reads.
    /// </param>
    public static CaseReadResult Read(
        JsonObject document, string fileName, IEnumerable<(StudyInput Input, double Number)> values, IEnumerable<double>? extraOutputSeconds = null)
    {
        var read = CaseReader.ReadText(Apply(document, values).ToJsonString(), fileName);
        return read.Case is { } simulation && extraOutputSeconds is not null
            ? read with { Case = WithOutputs(simulation, extraOutputSeconds) }
            : read;
    }

    /// <summary>A copy of the case document without its study sections and with the given values written in.</summary>
    /// <param name="document">The whole case document (not changed).</param>
    /// <param name="values">Each input with the number to write, in the input's unit.</param>
    public static JsonObject Apply(JsonObject document, IEnumerable<(StudyInput Input, double Number)> values)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(values);
        var copy = document.DeepClone().AsObject();
        foreach (var key in StudyKeys)
        {
            copy.Remove(key);
        }

        foreach (var (input, number) in values)
        {
            JsonPathSteps.Replace(copy, input.Steps, input.Node(number));
        }

        return copy;
    }

    /// <summary>The case with more output times (those within its duration).</summary>
    public static SimulationCase WithOutputs(SimulationCase simulation, IEnumerable<double> seconds) => simulation with
    {
        ExtraOutputTimesSeconds = simulation.ExtraOutputTimesSeconds
            .Concat(seconds.Where(time => time > 0 && time <= simulation.DurationSeconds))
            .Order()
            .ToArray(),
    };

    /// <summary>Reads the input of a study: its path (which must name a value written in the case) and its unit.</summary>
    /// <param name="root">The whole case document.</param>
    /// <param name="holder">The object with the <c>path</c> member.</param>
    /// <param name="at">JSON path of <paramref name="holder"/>.</param>
    /// <param name="unit">The unit the values are written in (empty for plain numbers).</param>
    /// <param name="errors">Receives the problems.</param>
    internal static StudyInput? ReadInput(JsonObject root, JsonObject holder, string at, string unit, List<CaseError> errors)
    {
        var (path, steps) = VariedPath.Read(root, holder, at, "varied", errors);
        return steps is null ? null : new StudyInput(path, unit) { Steps = steps, Label = InputLabels.Of(root, steps) };
    }

    /// <summary>
    /// Checks that a value can stand at the input's path by reading the case with it written in; the reader's
    /// complaint is reported at <paramref name="at"/>.
    /// </summary>
    internal static void CheckValue(JsonObject root, string fileName, StudyInput input, double number, string at, List<CaseError> errors)
    {
        var read = Read(root, fileName, [(input, number)]);
        foreach (var error in read.Errors.Take(1))
        {
            errors.Add(new CaseError(at, error.JsonPath == input.Path
                ? $"{input.Write(number)} at {input.Path}: {error.Message}"
                : $"with {input.Write(number)} at {input.Path}: {error.JsonPath}: {error.Message}"));
        }
    }
}
