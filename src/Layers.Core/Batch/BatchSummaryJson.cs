using System.Text;
using System.Text.Json;
using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>
/// summary.json of a batch: tool, caution, counts by status and one entry per case with its key results in SI
/// units. Deterministic (no clock readings). <see cref="Read"/> reads it back for <c>layers merge</c>.
/// </summary>
public static class BatchSummaryJson
{
    /// <summary>The JSON text for rows already in order.</summary>
    public static string Write(IReadOnlyList<BatchRow> rows)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            json.WriteStartObject();
            json.WriteStartObject("tool");
            json.WriteString("name", ToolInfo.Name);
            json.WriteString("version", ToolInfo.Version);
            json.WriteEndObject();
            json.WriteString("caution", CautionText.Paragraph);
            json.WriteStartObject("counts");
            foreach (var status in Enum.GetValues<BatchStatus>())
            {
                json.WriteNumber(BatchColumns.StatusName(status), rows.Count(row => row.Status == status));
            }

            json.WriteEndObject();
            json.WriteStartArray("cases");
            foreach (var row in rows)
            {
                WriteRow(json, row);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    /// <summary>The rows of a summary.json; throws <see cref="JsonException"/> or <see cref="KeyNotFoundException"/> when it is not one.</summary>
    public static IReadOnlyList<BatchRow> Read(string text)
    {
        using var document = JsonDocument.Parse(text);
        var rows = new List<BatchRow>();
        foreach (var entry in document.RootElement.GetProperty("cases").EnumerateArray())
        {
            var status = BatchColumns.ParseStatus(entry.GetProperty("status").GetString()!)
                ?? throw new JsonException($"unknown status '{entry.GetProperty("status").GetString()}'");
            var parameters = Values(entry.GetProperty("parameters"));
            rows.Add(new BatchRow(
                entry.GetProperty("name").GetString()!,
                entry.GetProperty("file").GetString()!,
                parameters,
                status,
                entry.GetProperty("message").GetString()!,
                entry.GetProperty("results") is { ValueKind: JsonValueKind.Object } results ? ReadResults(results) : null)
            {
                Inputs = entry.TryGetProperty("inputs", out var inputs) ? Values(inputs) : [],
                PeriodFigure = entry.TryGetProperty("periodFigure", out var figure) ? ReadPeriodFigure(figure) : null,
                Limit = entry.TryGetProperty("limit", out var limit) && limit.ValueKind == JsonValueKind.Object
                    ? new LimitCheck(
                        LimitCheck.ParseQuantity(limit.GetProperty("quantity").GetString()!)
                            ?? throw new JsonException($"unknown limit quantity '{limit.GetProperty("quantity").GetString()}'"),
                        limit.GetProperty("limit").GetDouble(),
                        limit.GetProperty("value").GetDouble())
                    : null,
            });
        }

        return rows;
    }

    private static void WriteRow(Utf8JsonWriter json, BatchRow row)
    {
        json.WriteStartObject();
        json.WriteString("name", row.Name);
        json.WriteString("file", row.File);
        WriteValues(json, "parameters", row.Parameters);
        WriteValues(json, "inputs", row.Inputs);
        json.WriteString("status", BatchColumns.StatusName(row.Status));
        json.WriteString("message", row.Message);
        if (row.Results is { } results)
        {
            json.WriteStartObject("results");
            json.WriteString("finalState", results.FinalState);
            foreach (var result in NamedResults.InBatchSummary)
            {
                SummaryJson.WriteNullable(json, NamedResults.SummaryKey(result), results.Pick(result));
            }

            SummaryJson.WriteNullable(json, "foodMigrationKgPerSquareMeter", results.FoodMigrationKgPerSquareMeter);

            json.WriteNumber("worstMassBalanceError", results.WorstMassBalanceError);
            SummaryJson.WriteNullable(json, "worstEstimatedError", results.WorstEstimatedError);
            SummaryJson.WriteNullable(json, "figuresAboveAccuracy", results.FiguresAboveAccuracy);
            json.WriteEndObject();
        }
        else
        {
            json.WriteNull("results");
        }

        if (row.PeriodFigure is { } figure)
        {
            json.WriteStartObject("periodFigure");
            json.WriteString("name", figure.Measure.Name);
            if (figure.Measure.Period is { } period)
            {
                json.WriteString("period", period);
            }
            else
            {
                json.WriteNull("period");
            }

            SummaryJson.WriteNullable(json, "value", figure.ValueSi);
            json.WriteEndObject();
        }

        if (row.Limit is { } limit)
        {
            json.WriteStartObject("limit");
            json.WriteString("quantity", limit.Quantity);
            json.WriteNumber("limit", limit.LimitSi);
            json.WriteNumber("value", limit.ValueSi);
            json.WriteBoolean("exceeded", limit.Exceeded);
            json.WriteEndObject();
        }
        else
        {
            json.WriteNull("limit");
        }
        json.WriteEndObject();
    }

    /// <summary>
    /// Swept values or varied inputs: path, label (as the summaries show it, so that a merge shows the same) and the
    /// value as written.
    /// </summary>
    private static void WriteValues(Utf8JsonWriter json, string key, IReadOnlyList<SweepValue> values)
    {
        json.WriteStartArray(key);
        foreach (var value in values)
        {
            json.WriteStartObject();
            json.WriteString("path", value.Path);
            json.WriteString("label", value.Label);
            json.WriteString("value", value.Written);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static List<SweepValue> Values(JsonElement values) =>
        values.EnumerateArray()
            .Select(value =>
            {
                var read = SweepValues.Of(value.GetProperty("path").GetString()!, value.GetProperty("value").GetString()!);
                return value.TryGetProperty("label", out var label) ? read with { Label = label.GetString()! } : read;
            })
            .ToList();

    private static PeriodFigureValue ReadPeriodFigure(JsonElement figure)
    {
        var name = figure.GetProperty("name").GetString()!;
        var result = NamedResults.All.Where(NamedResults.IsReadInPeriod).FirstOrDefault(candidate => NamedResults.Name(candidate) == name, (NamedResult)(-1));
        if (!Enum.IsDefined(result))
        {
            throw new JsonException($"unknown figure of one period '{name}'");
        }

        var period = figure.GetProperty("period") is { ValueKind: JsonValueKind.String } label ? label.GetString() : null;
        var value = figure.GetProperty("value") is { ValueKind: JsonValueKind.Number } number ? number.GetDouble() : (double?)null;
        return new PeriodFigureValue(new Studies.ResultMeasure(result) { Period = period }, value);
    }

    private static BatchKeyResults ReadResults(JsonElement results)
    {
        double? Number(string key) => results.TryGetProperty(key, out var value) && value.ValueKind == JsonValueKind.Number ? value.GetDouble() : null;
        double? Optional(NamedResult result) => Number(NamedResults.SummaryKey(result));
        return new BatchKeyResults(
            results.GetProperty("finalState").GetString()!,
            Optional(NamedResult.LeftReceived),
            Optional(NamedResult.RightReceived),
            Optional(NamedResult.SteadyFlux),
            Optional(NamedResult.LagTime),
            Optional(NamedResult.TimeTo90Percent),
            results.GetProperty("worstMassBalanceError").GetDouble(),
            Number("worstEstimatedError"),
            (int?)Number("figuresAboveAccuracy"))
        {
            LeftConcentrationKgPerCubicMeter = Optional(NamedResult.LeftConcentration),
            RightConcentrationKgPerCubicMeter = Optional(NamedResult.RightConcentration),
            FoodConcentrationKgPerKg = Optional(NamedResult.FoodConcentration),
            FoodMigrationKgPerSquareMeter = Number("foodMigrationKgPerSquareMeter"),
            TimeToLimitSeconds = Optional(NamedResult.TimeToLimit),
        };
    }
}
