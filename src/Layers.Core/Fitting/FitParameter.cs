using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Studies;

namespace Layers.Core.Fitting;

/// <summary>
/// One input to estimate: a positive value written in the case (a quantity such as "2e-8 cm2/s" or a plain number
/// such as a partition coefficient), found by its JSON path and replaced there, as a sweep replaces its values
/// (<see cref="SweepExpander"/>), so that every rule of the case format checks every trial value. The fit works
/// with log10 of the value: coefficients of diffusion span decades, stay positive, and their errors are relative.
/// </summary>
/// <param name="Path">The JSON path, e.g. <c>$.layers[0].diffusionCoefficient</c>.</param>
/// <param name="Unit">The unit the case writes the value in; empty for a plain number.</param>
/// <param name="StartValue">The value written in the case, in <paramref name="Unit"/>: the starting point of the fit.</param>
public sealed record FitParameter(string Path, string Unit, double StartValue)
{
    /// <summary>The value in words for tables and legends, e.g. "membrane diffusion coefficient" (<see cref="InputLabels"/>).</summary>
    public string Label { get; init; } = InputLabels.Of(null, Path);

    /// <summary>The parsed path.</summary>
    internal IReadOnlyList<object> Steps { get; init; } = [];

    /// <summary>The value written with its unit, e.g. "3.1e-08 cm2/s", for display.</summary>
    public string Written(double value) => Input.Show(value);

    /// <summary>The same value as a study input, written into the case the way every study writes its values.</summary>
    internal StudyInput Input => new(Path, Unit) { Steps = Steps, Label = Label };

    /// <summary>Finds the value at <paramref name="path"/> in the case; null with a message when it cannot be estimated.</summary>
    internal static FitParameter? Read(JsonObject root, string path, out string? problem)
    {
        problem = null;
        var steps = JsonPathSteps.Parse(path);
        if (steps is null)
        {
            problem = $"'{path}' is not a path of the form $.layers[0].diffusionCoefficient";
            return null;
        }

        var target = JsonPathSteps.Find(root, steps) as JsonValue;
        (double Number, string Unit)? value = target?.GetValueKind() switch
        {
            JsonValueKind.Number => (target.GetValue<double>(), string.Empty),
            JsonValueKind.String => SweepParameterReader.Split(target.GetValue<string>()),
            _ => null,
        };
        if (value is not { } found)
        {
            problem = target is null
                ? $"'{path}' is not in the case; an estimated value must be written in the case, where it is the starting value"
                : $"'{path}' is not a quantity or a number";
            return null;
        }

        if (!(found.Number > 0))
        {
            problem = $"'{path}' is {target!.ToJsonString()}; only values > 0 can be estimated (the fit works with their logarithm)";
            return null;
        }

        return new FitParameter(path, found.Unit, found.Number) { Steps = steps, Label = InputLabels.Of(root, steps) };
    }
}
