using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>Reads <c>left</c> and <c>right</c>: a closed face, a bath or a compartment.</summary>
internal static class FaceReader
{
    private static readonly string[] Kinds = ["closed", "bath", "compartment"];
    private static readonly string[] ClosedKeys = ["kind"];
    private static readonly string[] BathKeys = ["kind", "name", "concentration", "partitionCoefficient", "filmCoefficient", "density"];

    private static readonly string[] CompartmentKeys =
    [
        "kind", "name", "volume", "mass", "area", "density", "partitionCoefficient", "initialConcentration", "filmCoefficient",
        "sampling", "solubility", "sinkFraction", "removalHalfLife",
    ];


    public static FaceCondition? Read(JsonFields root, string key, ReadContext context)
    {
        if (root.Member(key, required: true) is not { } element)
        {
            return null;
        }

        var path = root.PathOf(key);
        var kind = element.ValueKind == System.Text.Json.JsonValueKind.Object && element.TryGetProperty("kind", out var kindElement)
            ? kindElement.ToString()
            : null;
        var side = key;
        switch (kind)
        {
            case "closed":
                return JsonFields.Open(element, path, context.Errors, ClosedKeys) is null ? null : new ClosedFace();
            case "bath":
                return JsonFields.Open(element, path, context.Errors, BathKeys) is { } bath ? ReadBath(bath, context, side) : null;
            case "compartment":
                return JsonFields.Open(element, path, context.Errors, CompartmentKeys) is { } compartment
                    ? ReadCompartment(compartment, context, side)
                    : null;
            case null:
                context.Errors.Add(new CaseError(
                    element.ValueKind == System.Text.Json.JsonValueKind.Object ? $"{path}.kind" : path,
                    element.ValueKind == System.Text.Json.JsonValueKind.Object
                        ? $"is required: one of {string.Join(", ", Kinds)}"
                        : $"expected an object with \"kind\"; found {JsonFields.Describe(element)}"));
                return null;
            default:
                context.Errors.Add(new CaseError($"{path}.kind", $"must be one of {string.Join(", ", Kinds)}; got '{kind}'"));
                return null;
        }
    }

    private static BathFace? ReadBath(JsonFields fields, ReadContext context, string side)
    {
        var name = fields.Text("name") ?? $"{side} bath";
        var density = ReadContext.Positive(fields, "density", Dimension.MassConcentration, required: false);
        var k = context.PartitionCoefficient(fields, density);
        var concentration = context.Concentration(fields, "concentration", density);
        var film = ReadContext.Positive(fields, "filmCoefficient", Dimension.Velocity, required: false);
        if (k is null || concentration is null || (fields.Has("filmCoefficient") && film is null))
        {
            return null;
        }

        return new BathFace(name, concentration.Value, k.Value, film);
    }

    private static CompartmentFace? ReadCompartment(JsonFields fields, ReadContext context, string side)
    {
        var name = fields.Text("name") ?? $"{side} compartment";
        var density = ReadContext.Positive(fields, "density", Dimension.MassConcentration, required: false);
        var volume = Volume(fields, context, density);
        var area = ReadContext.Positive(fields, "area", Dimension.Area, required: true);
        var k = context.PartitionCoefficient(fields, density);
        var concentration = context.Concentration(fields, "initialConcentration", density);
        var film = ReadContext.Positive(fields, "filmCoefficient", Dimension.Velocity, required: false);
        if (volume is null || area is null || k is null || concentration is null || (fields.Has("filmCoefficient") && film is null))
        {
            return null;
        }

        var cell = CellOptions.Read(fields, context, volume.Value);
        if (cell is null)
        {
            return null;
        }

        return new CompartmentFace(name, volume.Value, area.Value, k.Value, concentration.Value, film, density)
        {
            Sampling = cell.Value.Sampling,
            SolubilityKgPerCubicMeter = cell.Value.Solubility,
            SinkFraction = cell.Value.SinkFraction,
            RemovalRatePerSecond = cell.Value.RemovalRate,
        };
    }

    /// <summary>The compartment's volume, given directly or as a mass with a density.</summary>
    private static double? Volume(JsonFields fields, ReadContext context, double? density)
    {
        var hasVolume = fields.Has("volume");
        var hasMass = fields.Has("mass");
        if (hasVolume == hasMass)
        {
            context.Errors.Add(new CaseError(
                fields.Path,
                hasVolume ? "give either volume or mass, not both" : "give volume, or mass with density"));
            return null;
        }

        if (hasVolume)
        {
            return ReadContext.Positive(fields, "volume", Dimension.Volume, required: true);
        }

        context.SawCompartmentByMass = true;
        var mass = ReadContext.Positive(fields, "mass", Dimension.Mass, required: true);
        if (mass is not null && density is null)
        {
            fields.Error("density", "is required with mass, to turn the mass into a volume");
            return null;
        }

        return mass / density;
    }
}
