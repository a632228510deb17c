using System.Text.Json;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>The <c>diffusionCell</c> part of summary.json (SI units; keys in docs/outputs.md).</summary>
internal static class SummaryJsonDiffusionCell
{
    public static void Write(Utf8JsonWriter json, SimulationResult result)
    {
        if (result.DiffusionCell is not { } cell)
        {
            json.WriteNull("diffusionCell");
            return;
        }

        json.WriteStartObject("diffusionCell");
        json.WriteStartArray("sampling");
        foreach (var sampled in cell.Sampling)
        {
            json.WriteStartObject();
            json.WriteString("side", sampled.Side == Domain.Side.Left ? "left" : "right");
            json.WriteString("name", sampled.Name);
            json.WriteNumber("withdrawnMassPerAreaKgPerSquareMeter", sampled.WithdrawnPerArea);
            json.WriteStartArray("samples");
            foreach (var point in sampled.Points)
            {
                json.WriteStartObject();
                json.WriteNumber("timeSeconds", point.TimeSeconds);
                json.WriteNumber("concentrationKgPerCubicMeter", point.ConcentrationKgPerCubicMeter);
                json.WriteNumber("correctedCumulativeMassPerAreaKgPerSquareMeter", point.CorrectedCumulativePerArea);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("sinkChecks");
        foreach (var sink in cell.SinkChecks)
        {
            json.WriteStartObject();
            json.WriteString("name", sink.Name);
            json.WriteNumber("solubilityKgPerCubicMeter", sink.SolubilityKgPerCubicMeter);
            json.WriteNumber("fractionOfSolubility", sink.Fraction);
            json.WriteNumber("highestConcentrationKgPerCubicMeter", sink.HighestConcentrationKgPerCubicMeter);
            SummaryJson.WriteNullable(json, "firstExceededSeconds", sink.FirstExceededSeconds);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteNumber("leftRemovedByFirstOrderMassPerAreaKgPerSquareMeter", cell.RemovedByFirstOrderPerArea[0]);
        json.WriteNumber("rightRemovedByFirstOrderMassPerAreaKgPerSquareMeter", cell.RemovedByFirstOrderPerArea[1]);
        WriteMetrics(json, "simulated", cell.Simulated);
        WriteMetrics(json, "measured", cell.Measured);
        WriteDelivery(json, cell.Delivery);
        json.WriteEndObject();
    }

    private static void WriteMetrics(Utf8JsonWriter json, string key, PermeationMetrics? metrics)
    {
        if (metrics is null)
        {
            json.WriteNull(key);
            return;
        }

        // Where the run reaches no steady line, the fitted slope and intercept are no steady flux or lag time: null,
        // with the reason beside them.
        json.WriteStartObject(key);
        json.WriteBoolean("steadyLineReached", metrics.IsSteady);
        json.WriteString("noSteadyLineReason", metrics.NoSteadyLineReason);
        SummaryJson.WriteNullable(json, "steadyFluxKgPerSquareMeterSecond", metrics.IsSteady ? metrics.SteadyFluxKgPerSquareMeterSecond : null);
        SummaryJson.WriteNullable(json, "lagTimeSeconds", metrics.IsSteady ? metrics.LagTimeSeconds : null);
        SummaryJson.WriteNullable(json, "permeabilityCoefficientMetersPerSecond", metrics.IsSteady ? metrics.PermeabilityCoefficientMetersPerSecond : null);
        SummaryJson.WriteNullable(json, "donorConcentrationKgPerCubicMeter", metrics.DonorConcentrationKgPerCubicMeter);
        json.WriteNumber("pointsUsed", metrics.PointsUsed);
        json.WriteNumber("steadyPartFromSeconds", metrics.FromSeconds);
        json.WriteNumber("steadyPartToSeconds", metrics.ToSeconds);
        json.WriteNumber("rSquared", metrics.RSquared);
        json.WriteNumber("cumulativeAtEndMassPerAreaKgPerSquareMeter", metrics.CumulativeAtEndPerArea);
        json.WriteEndObject();
    }

    private static void WriteDelivery(Utf8JsonWriter json, DeliverySummary? delivery)
    {
        if (delivery is null)
        {
            json.WriteNull("delivery");
            return;
        }

        json.WriteStartObject("delivery");
        json.WriteStartArray("perDayMassPerAreaKgPerSquareMeter");
        delivery.PerDayPerArea.ToList().ForEach(json.WriteNumberValue);
        json.WriteEndArray();
        json.WriteStartArray("perDayMassKg");
        foreach (var amount in delivery.PerDayPerArea)
        {
            SummaryJson.WriteNullable(json, amount * delivery.AreaSquareMeters);
        }

        json.WriteEndArray();
        SummaryJson.WriteNullable(json, "deliveryAreaSquareMeters", delivery.AreaSquareMeters);
        SummaryJson.WriteNullable(json, "targetFluxKgPerSquareMeterSecond", delivery.TargetFluxKgPerSquareMeterSecond);
        SummaryJson.WriteNullable(json, "targetReachedSeconds", delivery.TargetReachedSeconds);
        SummaryJson.WriteNullable(json, "targetHeldUntilSeconds", delivery.TargetHeldUntilSeconds);
        json.WriteEndObject();
    }
}
