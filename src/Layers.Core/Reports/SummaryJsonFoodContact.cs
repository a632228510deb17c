using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>The <c>foodContact</c> member of summary.json (null for a case without food-contact settings).</summary>
internal static class SummaryJsonFoodContact
{
    public static void Write(Utf8JsonWriter json, SimulationResult result)
    {
        if (result.FoodContact is not { } food)
        {
            json.WriteNull("foodContact");
            return;
        }

        json.WriteStartObject("foodContact");
        json.WriteStartObject("food");
        json.WriteString("name", food.FoodName);
        json.WriteString("side", food.FoodSide == Side.Left ? "left" : "right");
        json.WriteNumber("densityKgPerCubicMeter", food.FoodDensityKgPerCubicMeter);
        json.WriteBoolean("densityAssumed", food.FoodDensityAssumed);
        json.WriteNumber("areaPerMassSquareMetersPerKilogram", food.AreaPerFoodMassSquareMetersPerKilogram);
        json.WriteEndObject();
        WriteSources(json, result, food);
        WriteStages(json, food);
        json.WriteNumber("finalConcentrationKgPerKg", food.FinalConcentration);
        json.WriteNumber("finalMigrationKgPerSquareMeter", food.FinalMigrationPerArea);
        SummaryJson.WriteNullable(json, "specificMigrationLimitKgPerKg", food.SpecificMigrationLimit);
        if (food.MeetsLimit is { } meets)
        {
            json.WriteBoolean("meetsLimit", meets);
        }
        else
        {
            json.WriteNull("meetsLimit");
        }

        SummaryJson.WriteNullable(json, "limitMarginKgPerKg", food.LimitMargin);
        SummaryJson.WriteNullable(json, "limitReachedSeconds", food.LimitReachedSeconds);
        json.WriteNumber("detectionLimitKgPerKg", food.DetectionLimit);
        SummaryJson.WriteNullable(json, "detectionReachedSeconds", food.DetectionReachedSeconds);
        json.WriteStartArray("barrierLagTimes");
        foreach (var lag in food.BarrierLags)
        {
            json.WriteStartObject();
            json.WriteString("layer", lag.Layer);
            json.WriteString("stage", lag.Stage);
            json.WriteNumber("lagSeconds", lag.Seconds);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        WriteTest(json, food);
        WriteLoading(json, food);
        json.WriteString("partitionConvention", food.PartitionConvention);
        SummaryJson.WriteNullable(json, "partitionConventionK", food.PartitionConvention is { } name ? PartitionConvention.Values[name] : null);
        json.WriteStartArray("assumptions");
        foreach (var assumption in FoodContactResult.Assumptions)
        {
            json.WriteStringValue(assumption);
        }

        json.WriteEndArray();
        json.WriteString("caution", FoodContactTables.Caution);
        json.WriteEndObject();
    }

    private static void WriteSources(Utf8JsonWriter json, SimulationResult result, FoodContactResult food)
    {
        var sources = result.Case.Stack.Layers.Select(layer => layer.Diffusivity);
        json.WriteStartArray("diffusionSources");
        foreach (var ((layer, origin), source) in food.DiffusivityOrigins.Zip(sources))
        {
            json.WriteStartObject();
            json.WriteString("layer", layer);
            json.WriteString("kind", source.KindName);
            json.WriteString("description", origin);
            if (source is EstimatedDiffusivity estimated)
            {
                json.WriteBoolean("constantsVerified", estimated.Polymer.Verified);
            }
            else
            {
                json.WriteNull("constantsVerified");
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WriteStages(Utf8JsonWriter json, FoodContactResult food)
    {
        json.WriteStartArray("stages");
        foreach (var stage in food.Stages)
        {
            json.WriteStartObject();
            json.WriteString("name", stage.Name);
            json.WriteNumber("startSeconds", stage.StartSeconds);
            json.WriteNumber("endSeconds", stage.EndSeconds);
            json.WriteNumber("temperatureKelvin", stage.TemperatureKelvin);
            json.WriteNumber("foodConcentrationAtEndKgPerKg", stage.FoodConcentrationAtEnd);
            json.WriteStartArray("layers");
            foreach (var (layer, value, origin) in stage.Diffusivities)
            {
                json.WriteStartObject();
                json.WriteString("name", layer);
                json.WriteNumber("diffusionCoefficientSquareMetersPerSecond", value);
                json.WriteString("origin", origin);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteStartArray("partitionCoefficients");
            foreach (var (medium, k) in stage.Partitions)
            {
                json.WriteStartObject();
                json.WriteString("name", medium);
                json.WriteNumber("value", k);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WriteTest(Utf8JsonWriter json, FoodContactResult food)
    {
        if (food.Test is not { } test)
        {
            json.WriteNull("test");
            return;
        }

        json.WriteStartObject("test");
        json.WriteNumber("durationSeconds", test.Condition.DurationSeconds);
        json.WriteNumber("temperatureKelvin", test.Condition.TemperatureKelvin);
        json.WriteNumber("foodConcentrationKgPerKg", test.FoodConcentration);
        json.WriteBoolean("coversHistoryByModel", test.CoversByModel(food.FinalConcentration));
        json.WriteNumber("activationEnergyJoulesPerMole", test.ActivationEnergy);
        json.WriteNumber("regulatoryEquivalentSeconds", test.RegulatoryEquivalentSeconds);
        json.WriteBoolean("coversHistoryByRule", test.CoversByRule);
        json.WriteEndObject();
    }

    private static void WriteLoading(Utf8JsonWriter json, FoodContactResult food)
    {
        if (food.MaximumLoading is not { } loading)
        {
            json.WriteNull("maximumLoading");
            return;
        }

        static double? Finite(double value) => double.IsFinite(value) ? value : null;
        json.WriteStartObject("maximumLoading");
        json.WriteNumber("offsetKgPerKg", loading.OffsetConcentration);
        json.WriteNumber("slopeKgPerKg", loading.SlopeConcentration);
        SummaryJson.WriteNullable(json, "factor", Finite(loading.Factor));
        json.WriteStartArray("layers");
        foreach (var (layer, perVolume, fraction) in loading.Layers)
        {
            json.WriteStartObject();
            json.WriteString("name", layer);
            SummaryJson.WriteNullable(json, "initialConcentrationKgPerCubicMeter", Finite(perVolume));
            SummaryJson.WriteNullable(json, "initialMassFraction", fraction is { } f ? Finite(f) : null);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }
}
