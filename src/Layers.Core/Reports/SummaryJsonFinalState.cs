using System.Text.Json;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>The <c>finalState</c> and <c>permeation</c> members of summary.json.</summary>
internal static class SummaryJsonFinalState
{
    public static void Write(Utf8JsonWriter json, SimulationResult result)
    {
        var final = result.FinalState;
        json.WriteStartObject("finalState");
        json.WriteString("kind", JsonNamingPolicy.CamelCase.ConvertName(final.Kind.ToString()));
        json.WriteString("description", FinalStateText.Describe(final, result.Case));
        SummaryJson.WriteNullable(json, "massLeftAfterSamplingPerAreaKgPerSquareMeter", final.MassLeftAfterSamplingPerArea);
        SummaryJson.WriteNullable(json, "lastSampleSeconds", final.LastSampleSeconds);
        json.WriteStartArray("layers");
        for (var i = 0; i < final.LayerConcentrationsKgPerCubicMeter.Count; i++)
        {
            var (left, right) = final.LayerConcentrationsKgPerCubicMeter[i];
            json.WriteStartObject();
            json.WriteString("name", result.Case.Stack.Layers[i].Name);
            json.WriteNumber("leftEdgeConcentrationKgPerCubicMeter", left);
            json.WriteNumber("rightEdgeConcentrationKgPerCubicMeter", right);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        SummaryJson.WriteNullable(json, "leftConcentrationKgPerCubicMeter", final.LeftConcentrationKgPerCubicMeter);
        SummaryJson.WriteNullable(json, "rightConcentrationKgPerCubicMeter", final.RightConcentrationKgPerCubicMeter);
        SummaryJson.WriteSeries(json, "fractionReachedAtReportTimes", result, sample => sample.FractionOfFinalState);
        WriteTimes(json, "system", final.System);
        WriteTimes(json, "leftCompartment", final.LeftCompartment);
        WriteTimes(json, "rightCompartment", final.RightCompartment);
        json.WriteNumber("searchedUntilSeconds", final.HorizonSeconds);
        json.WriteEndObject();

        json.WritePropertyName("permeation");
        if (result.Permeation is not { } permeation)
        {
            json.WriteNullValue();
            return;
        }

        json.WriteStartObject();
        json.WriteNumber("steadyFluxKgPerSquareMeterSecond", permeation.SteadyFluxKgPerSquareMeterSecond);
        json.WriteNumber("fluxAtEndKgPerSquareMeterSecond", permeation.FluxAtEndKgPerSquareMeterSecond);
        SummaryJson.WriteNullable(json, "lagTimeSeconds", permeation.LagTimeSeconds);
        SummaryJson.WriteNullable(json, "analyticLagTimeSeconds", permeation.AnalyticLagTimeSeconds);
        json.WriteEndObject();
    }

    private static void WriteTimes(Utf8JsonWriter json, string key, ThresholdTimes? times)
    {
        json.WritePropertyName(key);
        if (times is null)
        {
            json.WriteNullValue();
            return;
        }

        json.WriteStartObject();
        SummaryJson.WriteNullable(json, "timeTo50PercentSeconds", times.Half);
        SummaryJson.WriteNullable(json, "timeTo90PercentSeconds", times.NinetyPercent);
        SummaryJson.WriteNullable(json, "timeTo99PercentSeconds", times.NinetyNinePercent);
        json.WriteEndObject();
    }
}
