using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads the diffusion-cell keys of a compartment: <c>sampling</c> (volume and times), <c>solubility</c> and
/// <c>sinkFraction</c> for the sink check, <c>removalHalfLife</c> for first-order removal.
/// </summary>
internal static class CellOptions
{
    private static readonly string[] SamplingKeys = ["volume", "times"];

    /// <summary>The options, or null after reporting errors.</summary>
    public static (ReceptorSampling? Sampling, double? Solubility, double SinkFraction, double RemovalRate)? Read(
        JsonFields fields, ReadContext context, double compartmentVolume)
    {
        var errors = context.Errors.Count;
        var sampling = ReadSampling(fields, context, compartmentVolume);
        var solubility = ReadContext.Positive(fields, "solubility", Dimension.MassConcentration, required: false);
        var fraction = fields.Number("sinkFraction");
        if (fraction is { } value && !(value > 0 && value <= 1))
        {
            fields.Error("sinkFraction", $"must be > 0 and <= 1 (a fraction of the solubility); got {value.ToString(CultureInfo.InvariantCulture)}");
        }
        else if (fraction is not null && !fields.Has("solubility"))
        {
            fields.Error("sinkFraction", "needs \"solubility\" beside it (the fraction is of the solubility)");
        }

        var halfLife = ReadContext.Positive(fields, "removalHalfLife", Dimension.Time, required: false);
        if (context.Errors.Count > errors)
        {
            return null;
        }

        return (sampling, solubility, fraction ?? CompartmentFace.DefaultSinkFraction, halfLife is { } t ? Math.Log(2) / t : 0);
    }

    private static ReceptorSampling? ReadSampling(JsonFields fields, ReadContext context, double compartmentVolume)
    {
        if (fields.Member("sampling") is not { } element
            || JsonFields.Open(element, fields.PathOf("sampling"), context.Errors, SamplingKeys) is not { } sampling)
        {
            return null;
        }

        var volume = ReadContext.Positive(sampling, "volume", Dimension.Volume, required: true);
        if (volume is { } v && v >= compartmentVolume)
        {
            sampling.Error("volume", $"must be less than the compartment's volume; got '{sampling.Written("volume")}'");
        }

        if (sampling.Member("times", required: true) is null)
        {
            return null;
        }

        var times = TimesReader.List(sampling, "times", context.DurationSeconds, context.DurationText, ascending: true, context);
        return volume is { } withdrawn && times is not null ? new ReceptorSampling(withdrawn, times) : null;
    }
}
