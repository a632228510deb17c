using System.Text.Json;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.Studies;

namespace Layers.Core.Fitting;

/// <summary>
/// The model side of a fit: the case with trial values substituted at the estimated paths, solved with the
/// measured times added to its output times, so that the model is read at exactly those times (the time loop lands
/// on every output time) and never interpolated.
/// </summary>
internal sealed class FitModel(JsonObject root, string casePath, IReadOnlyList<FitParameter> parameters, MeasuredSeries data, Side face)
{
    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true };

    /// <summary>
    /// The case document with 10^<paramref name="logValues"/> substituted, and every layer whose D was estimated
    /// marked <c>"diffusionCoefficientOrigin": "fitted"</c>, so that its reports say where D came from.
    /// </summary>
    public string Json(IReadOnlyList<double> logValues)
    {
        var copy = CaseVariation.Apply(root, Substitutions(logValues));
        foreach (var parameter in parameters)
        {
            var steps = parameter.Input.Steps;
            if (steps.Count == 3 && steps[0] is "layers" && steps[^1] is "diffusionCoefficient"
                && JsonPathSteps.Find(copy, steps.Take(2).ToArray()) is JsonObject layer)
            {
                layer["diffusionCoefficientOrigin"] = DiffusivityOrigins.Fitted;
            }
        }

        return copy.ToJsonString(Indented);
    }

    /// <summary>The case at these values, with the measured times as extra output times; or its errors.</summary>
    public CaseReadResult Read(IReadOnlyList<double> logValues)
        => CaseVariation.Read(root, casePath, Substitutions(logValues), data.TimesSeconds);

    /// <summary>The samples of a run at these values, or null when the case is invalid there or the solver stops.</summary>
    public IReadOnlyList<StateSample>? Samples(IReadOnlyList<double> logValues, CancellationToken cancellation)
    {
        if (Read(logValues).Case is not { } simulation)
        {
            return null;
        }

        var (samples, statistics) = Simulator.RunTimeSeries(simulation, cancellation);
        cancellation.ThrowIfCancellationRequested();
        return statistics.StopReason == TimeStepping.StopReason.Completed ? samples : null;
    }

    private IEnumerable<(StudyInput Input, double Number)> Substitutions(IReadOnlyList<double> logValues)
        => parameters.Select((parameter, index) => (parameter.Input, Math.Pow(10, logValues[index])));

    /// <summary>The model values at the measured times, or null when the model cannot be solved at these values.</summary>
    public double[]? Values(IReadOnlyList<double> logValues, CancellationToken cancellation)
        => Samples(logValues, cancellation) is { } samples ? At(samples) : null;

    /// <summary>
    /// The density of the compartment the data were measured in, kg/m3, for data written as mass fractions; null
    /// otherwise. The one conversion between the model's kg/m3 and the data's kg/kg is made in <see cref="Of"/>.
    /// </summary>
    public double? MediumDensityKgPerCubicMeter { get; init; }

    /// <summary>The measured quantity in one sample, SI (in the data's own dimension).</summary>
    public double Of(StateSample sample)
    {
        var medium = face == Side.Left ? sample.Left : sample.Right;
        return data.Quantity switch
        {
            MeasuredQuantity.Concentration => medium!.ConcentrationKgPerCubicMeter,
            MeasuredQuantity.MassFraction => medium!.ConcentrationKgPerCubicMeter / MediumDensityKgPerCubicMeter!.Value,
            MeasuredQuantity.AmountPerArea => medium!.TransferredIntoMediumPerArea,
        };
    }

    /// <summary>The measured quantity at the measured times, from the samples of a run.</summary>
    public double[] At(IReadOnlyList<StateSample> samples)
    {
        var values = new double[data.TimesSeconds.Count];
        var next = 0;
        for (var i = 0; i < values.Length; i++)
        {
            var time = data.TimesSeconds[i];
            while (next < samples.Count - 1 && samples[next].TimeSeconds < time * (1 - 1e-9))
            {
                next++;
            }

            values[i] = Of(samples[next]);
        }

        return values;
    }
}
