using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>Reads the <c>layers</c> array.</summary>
internal static class LayerReader
{
    private static readonly string[] Keys =
        ["name", "thickness", "diffusionCoefficient", "partitionCoefficient", "initialConcentration", "solubility", "density", "pottsGuy", "diffusionCoefficientOrigin"];

    public static List<Layer> Read(JsonFields root, ReadContext context)
    {
        var layers = new List<Layer>();
        if (root.Member("layers", required: true) is not { } array)
        {
            return layers;
        }

        if (array.ValueKind != JsonValueKind.Array || array.GetArrayLength() == 0)
        {
            root.Error("layers", $"expected a non-empty array of layers; found {JsonFields.Describe(array)}");
            return layers;
        }

        if (array.GetArrayLength() > CaseLimits.MaxLayers)
        {
            // Refused before any layer is read, so that a runaway file costs no more than its parse.
            root.Error("layers", $"at most {CaseLimits.MaxLayers} layers are allowed; got {array.GetArrayLength()}");
            return layers;
        }

        // Names differing only in letter case or surrounding spaces would be confusing in reports and CSV headers.
        var names = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{root.Path}.layers[{index++}]";
            if (JsonFields.Open(element, path, context.Errors, Keys) is not { } fields)
            {
                continue;
            }

            var name = fields.Text("name", required: true);
            if (name is not null && name.Trim().Length == 0)
            {
                fields.Error("name", "must not be empty");
            }
            else if (name is not null && !names.TryAdd(name.Trim(), index - 1))
            {
                fields.Error("name", $"'{name}' is already used by {root.Path}.layers[{names[name.Trim()]}]");
            }

            if (ReadLayer(fields, context, name) is not { } layer)
            {
                continue;
            }

            var solubility = Solubility(fields, context, layer.DensityKgPerCubicMeter);
            if (solubility is not null && root.Has("foodContact"))
            {
                // The food-contact assessment scales results with the initial concentration, which a cap would break.
                fields.Error("solubility", "cannot be combined with $.foodContact (its figures assume diffusion that is linear in the concentration)");
            }
            else if (solubility is not double.NaN)
            {
                layers.Add(layer with { SolubilityKgPerCubicMeter = solubility });
            }
        }

        return layers;
    }

    private static Layer? ReadLayer(JsonFields fields, ReadContext context, string? name)
    {
        var thickness = ReadContext.Positive(fields, "thickness", Dimension.Length, required: true);
        if (fields.Has("pottsGuy"))
        {
            return PottsGuyReader.Read(fields, context, name, thickness);
        }

        // A layer whose D is estimated from its polymer gives none itself: its source is the estimate.
        var estimated = name is not null && context.EstimatedDiffusivities.ContainsKey(name);
        if (estimated && fields.Has("diffusionCoefficient"))
        {
            fields.Error("diffusionCoefficient", $"must be left out: $.foodContact.layerDiffusion.{name} estimates it");
        }

        var diffusivity = estimated ? null : ReadContext.Positive(fields, "diffusionCoefficient", Dimension.Diffusivity, required: true);
        var density = ReadContext.Positive(fields, "density", Dimension.MassConcentration, required: false);
        var k = context.PartitionCoefficient(fields, density);
        var fractionsBefore = context.MassFractionsRead;
        var concentration = context.Concentration(fields, "initialConcentration", density);
        context.SawLayerMassFraction |= context.MassFractionsRead > fractionsBefore;
        if (name is null || thickness is null || (diffusivity is null && !estimated) || k is null || concentration is null)
        {
            return null;
        }

        var origin = fields.Text("diffusionCoefficientOrigin") ?? DiffusivityOrigins.Given;
        if (!DiffusivityOrigins.All.Contains(origin))
        {
            fields.Error("diffusionCoefficientOrigin", $"expected one of {string.Join(", ", DiffusivityOrigins.All.Select(word => $"\"{word}\""))}; got \"{origin}\"");
            return null;
        }

        if (estimated && fields.Has("diffusionCoefficientOrigin"))
        {
            fields.Error("diffusionCoefficientOrigin", $"must be left out: $.foodContact.layerDiffusion.{name} estimates D");
            return null;
        }

        var source = Source(context, name, diffusivity, origin);
        return source is null ? null : new Layer(name, thickness.Value, source, k.Value, concentration.Value, density);
    }

    /// <summary>
    /// Where the layer's D comes from: the estimate of foodContact.layerDiffusion (null when that entry has a mistake,
    /// already recorded), its Arrhenius law with the layer's D at the reference temperature, or the layer's D as given.
    /// </summary>
    private static DiffusivitySource? Source(ReadContext context, string name, double? diffusivity, string origin)
    {
        if (context.EstimatedDiffusivities.TryGetValue(name, out var estimate))
        {
            return estimate;
        }

        return context.ArrheniusLaws.TryGetValue(name, out var law)
            ? new ArrheniusDiffusivity(diffusivity!.Value, law.ReferenceKelvin, law.ActivationEnergyJoulesPerMole) { Origin = origin }
            : new GivenDiffusivity(diffusivity!.Value) { Origin = origin };
    }

    /// <summary>The optional solubility: null when absent, NaN when given but unusable (the error is recorded).</summary>
    private static double? Solubility(JsonFields fields, ReadContext context, double? density)
    {
        if (!fields.Has("solubility"))
        {
            return null;
        }

        return context.Concentration(fields, "solubility", density, strictlyPositive: true) ?? double.NaN;
    }
}
