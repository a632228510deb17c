using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>The <c>schedule</c> part of summary.json (SI units; keys in docs/outputs.md).</summary>
internal static class SummaryJsonSchedule
{
    public static void Write(Utf8JsonWriter json, SimulationResult result)
    {
        if (result.Schedule is not { } schedule)
        {
            json.WriteNull("schedule");
            return;
        }

        json.WriteStartObject("schedule");
        json.WriteStartArray("periods");
        foreach (var outcome in schedule.Periods)
        {
            var period = outcome.Period;
            json.WriteStartObject();
            json.WriteString("name", period.Name);
            json.WriteNumber("repetition", period.Repetition);
            json.WriteNumber("repetitions", period.RepetitionCount);
            json.WriteNumber("startSeconds", period.StartSeconds);
            json.WriteNumber("endSeconds", period.EndSeconds);
            json.WriteStartArray("media");
            foreach (var medium in outcome.Media)
            {
                json.WriteStartObject();
                json.WriteString("side", SideName(medium.Side));
                json.WriteString("name", medium.Name);
                json.WriteBoolean("freshAtStart", medium.FreshAtStart);
                json.WriteNumber("receivedKgPerSquareMeter", medium.ReceivedKgPerSquareMeter);
                json.WriteNumber("concentrationAtEndKgPerCubicMeter", medium.ConcentrationAtEndKgPerCubicMeter);
                SummaryJson.WriteNullable(json, "massFractionAtEnd", medium.MassFractionAtEnd);
                json.WriteNumber("highestFluxKgPerSquareMeterSecond", medium.HighestFluxKgPerSquareMeterSecond);
                json.WriteNumber("lowestFluxKgPerSquareMeterSecond", medium.LowestFluxKgPerSquareMeterSecond);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("renewed");
        foreach (var medium in schedule.Renewed)
        {
            json.WriteStartObject();
            json.WriteString("side", SideName(medium.Side));
            json.WriteString("name", medium.Name);
            json.WriteNumber("renewals", medium.Renewals);
            json.WriteNumber("carriedAwayKgPerSquareMeter", medium.CarriedAwayKgPerSquareMeter);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("layerMoves");
        foreach (var move in schedule.LayerMoves)
        {
            json.WriteStartObject();
            json.WriteString("period", move.PeriodLabel);
            json.WriteNumber("timeSeconds", move.TimeSeconds);
            WriteNames(json, "takenOff", move.TakenOff);
            WriteNames(json, "putOn", move.PutOn);
            SummaryJson.WriteNullable(json, "takenAwayKgPerSquareMeter", move.TakenAwayKgPerSquareMeter);
            json.WriteNumber("broughtKgPerSquareMeter", move.BroughtKgPerSquareMeter);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("repetitions");
        foreach (var state in schedule.PeriodicSteadyStates)
        {
            json.WriteStartObject();
            json.WriteString("period", state.PeriodName);
            json.WriteNumber("repetitions", state.Repetitions);
            SummaryJson.WriteNullable(json, "settledAtRepetition", state.SettledAtRepetition);
            json.WriteNumber("lastRelativeChange", state.LastRelativeChange);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        WriteRepeatedUse(json, schedule.RepeatedUse);
        json.WriteEndObject();
    }

    private static void WriteRepeatedUse(Utf8JsonWriter json, RepeatedUseVerdict? verdict)
    {
        if (verdict is null)
        {
            json.WriteNull("repeatedUse");
            return;
        }

        json.WriteStartObject("repeatedUse");
        json.WriteStartArray("contactsKgPerKg");
        foreach (var value in verdict.Contacts)
        {
            json.WriteNumberValue(value);
        }

        json.WriteEndArray();
        json.WriteNumber("judgedContact", verdict.JudgedContact);
        SummaryJson.WriteNullable(json, "limitKgPerKg", verdict.LimitKgPerKg);
        json.WriteBoolean("limitExceeded", verdict.LimitExceeded);
        json.WriteStartArray("risingAfterContacts");
        foreach (var contact in verdict.RisingFrom)
        {
            json.WriteNumberValue(contact);
        }

        json.WriteEndArray();
        json.WriteBoolean("complies", verdict.Complies);
        json.WriteEndObject();
    }

    private static void WriteNames(Utf8JsonWriter json, string key, IReadOnlyList<string> names)
    {
        json.WriteStartArray(key);
        foreach (var name in names)
        {
            json.WriteStringValue(name);
        }

        json.WriteEndArray();
    }

    private static string SideName(Side side) => side == Side.Left ? "left" : "right";
}
