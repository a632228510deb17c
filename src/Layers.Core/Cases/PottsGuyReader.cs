using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Permeation;

namespace Layers.Core.Cases;

/// <summary>
/// Reads a layer whose D and K are estimated with the Potts-Guy equation:
/// <c>"pottsGuy": { "logKow": 2.5, "molarMassGramsPerMole": 300 }</c> in place of <c>diffusionCoefficient</c> and
/// <c>partitionCoefficient</c>. K is relative to water, so the case's reference medium must be aqueous and the
/// partition basis the volume basis.
/// </summary>
internal static class PottsGuyReader
{
    private static readonly string[] Keys = ["logKow", "molarMassGramsPerMole"];

    public static Layer? Read(JsonFields fields, ReadContext context, string? name, double? thickness)
    {
        foreach (var key in new[] { "diffusionCoefficient", "partitionCoefficient" })
        {
            if (fields.Has(key))
            {
                fields.Error(key, "give either diffusionCoefficient and partitionCoefficient, or pottsGuy to estimate them, not both");
            }
        }

        if (context.Basis != PartitionBasis.Volume)
        {
            fields.Error("pottsGuy", "needs partitionBasis \"volume\" (the estimated K is relative to water on the volume basis)");
        }

        var density = ReadContext.Positive(fields, "density", Units.Dimension.MassConcentration, required: false);
        var concentration = context.Concentration(fields, "initialConcentration", density);
        if (JsonFields.Open(fields.Member("pottsGuy")!.Value, fields.PathOf("pottsGuy"), context.Errors, Keys) is not { } estimate)
        {
            return null;
        }

        var logKow = estimate.Number("logKow", required: true);
        var molarMass = estimate.Number("molarMassGramsPerMole", required: true);
        if (logKow is { } log && (log < -3 || log > 8))
        {
            estimate.Error("logKow", $"must be from -3 to 8 (the range of the data behind the equation is narrower); got {log.ToString(CultureInfo.InvariantCulture)}");
        }

        if (molarMass is { } mass && !(mass > 0 && mass <= 2000))
        {
            estimate.Error("molarMassGramsPerMole", $"must be > 0 and <= 2000; got {mass.ToString(CultureInfo.InvariantCulture)}");
        }

        if (name is null || thickness is null || logKow is null || molarMass is null || concentration is null
            || context.Basis != PartitionBasis.Volume || logKow is < -3 or > 8 || molarMass is not (> 0 and <= 2000)
            || fields.Has("diffusionCoefficient") || fields.Has("partitionCoefficient"))
        {
            return null;
        }

        var values = PottsGuy.Estimate(logKow.Value, molarMass.Value, thickness.Value);
        return new Layer(name, thickness.Value, values.DiffusivitySquareMetersPerSecond, values.PartitionCoefficient, concentration.Value, density)
        {
            Estimate = values,
        };
    }
}
