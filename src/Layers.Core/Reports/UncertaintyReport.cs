using System.Globalization;
using System.Text;
using System.Text.Json;
using Layers.Core.Results;
using Layers.Core.Studies;

namespace Layers.Core.Reports;

/// <summary>
/// The files of an uncertainty study: uncertainty.json, percentiles.csv and samples.csv (documented in
/// docs/outputs.md), all in SI except the inputs, which stay in the unit the case writes them in.
/// </summary>
public static class UncertaintyReport
{
    /// <summary>uncertainty.json.</summary>
    public static string Json(UncertaintyOutcome outcome, string caseFile)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var settings = outcome.Settings;
        return StudyJson.Write(caseFile, json =>
        {
            json.WriteNumber("samples", settings.Samples);
            json.WriteNumber("seed", settings.Seed);
            json.WriteString("sampling", JsonNamingPolicy.CamelCase.ConvertName(settings.Sampling.ToString()));
            StudyJson.Numbers(json, "percentiles", settings.Percentiles);
            json.WriteStartArray("inputs");
            for (var i = 0; i < settings.Inputs.Count; i++)
            {
                var input = settings.Inputs[i];
                json.WriteStartObject();
                json.WriteString("path", input.Input.Path);
                json.WriteString("unit", input.Input.Unit);
                json.WriteString("distribution", input.Distribution.Describe(input.Input.Unit));
                StudyJson.Numbers(json, "sampledPercentiles", Percentile.Of(outcome.InputValues.Select(row => row[i]), settings.Percentiles));
                json.WriteEndObject();
            }

            json.WriteEndArray();
            StudyJson.Numbers(json, "reportTimesSeconds", outcome.BaseCase.ReportTimesSeconds);
            json.WriteStartObject("atReportTimes");
            foreach (var series in outcome.Series)
            {
                json.WriteStartObject(series.Name);
                json.WriteString("unit", series.SiUnit);
                json.WriteStartArray("percentiles");
                foreach (var time in outcome.BaseCase.ReportTimesSeconds)
                {
                    var index = IndexOf(outcome.TimesSeconds, time);
                    StudyJson.Numbers(json, null, index < 0 ? [] : series.Percentiles[index]);
                }

                json.WriteEndArray();
                json.WriteEndObject();
            }

            json.WriteEndObject();
            json.WriteStartArray("results");
            foreach (var result in outcome.Results)
            {
                json.WriteStartObject();
                json.WriteString("name", result.Result.Name);
                StudyJson.Number(json, "atSeconds", result.Result.AtSeconds);
                json.WriteString("period", result.Result.Period);
                json.WriteString("unit", result.Result.SiUnit);
                StudyJson.Numbers(json, "percentiles", result.Percentiles);
                json.WriteNumber("samplesWithoutResult", result.Undefined);
                json.WriteNumber("samplesNeverReached", result.Values.Count(double.IsPositiveInfinity));
                json.WriteEndObject();
            }

            json.WriteEndArray();
            WriteExceedance(json, outcome.Exceedance);
            json.WriteString("caution", CaseCautions.Paragraph(outcome.BaseCase));
            json.WriteStartArray("notes");
            foreach (var note in CaseCautions.UnverifiedConstants(outcome.BaseCase))
            {
                json.WriteStringValue(note);
            }

            json.WriteEndArray();
        });
    }

    /// <summary>percentiles.csv: one row per output time, one column per result and percentile.</summary>
    public static string PercentilesCsv(UncertaintyOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var percents = outcome.Settings.Percentiles;
        var header = new List<string> { "time [s]" };
        foreach (var series in outcome.Series)
        {
            header.AddRange(percents.Select(percent => $"{series.Name} p{Text(percent)} [{series.SiUnit}]"));
        }

        var text = new StringBuilder();
        text.Append(CsvText.Line(header.Select(CsvText.Field))).Append('\n');
        for (var t = 0; t < outcome.TimesSeconds.Count; t++)
        {
            var row = new List<string> { CsvText.Number(outcome.TimesSeconds[t]) };
            row.AddRange(outcome.Series.SelectMany(series => series.Percentiles[t].Select(Cell)));
            text.Append(CsvText.Line(row)).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>samples.csv: one row per sample with its input values and its results.</summary>
    public static string SamplesCsv(UncertaintyOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var settings = outcome.Settings;
        var header = new List<string> { "sample" };
        header.AddRange(settings.Inputs.Select(input => input.Input.Unit.Length > 0 ? $"{input.Input.Path} [{input.Input.Unit}]" : input.Input.Path));
        header.AddRange(outcome.Results.Select(result => $"{result.Result.Describe()} [{result.Result.SiUnit}]"));
        if (settings.Limit is { } limit)
        {
            header.Add($"limit: {limit.Result.Describe()} [{limit.Result.SiUnit}]");
        }

        var text = new StringBuilder();
        text.Append(CsvText.Line(header.Select(CsvText.Field))).Append('\n');
        for (var i = 0; i < outcome.InputValues.Count; i++)
        {
            var row = new List<string> { (i + 1).ToString(CultureInfo.InvariantCulture) };
            row.AddRange(outcome.InputValues[i].Select(value => value.ToString("R", CultureInfo.InvariantCulture)));
            row.AddRange(outcome.Results.Select(result => Cell(result.Values[i])));
            if (outcome.LimitValues.Count > i)
            {
                row.Add(Cell(outcome.LimitValues[i]));
            }

            text.Append(CsvText.Line(row)).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>The lines printed on the console.</summary>
    public static IReadOnlyList<string> Lines(UncertaintyOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var settings = outcome.Settings;
        var format = new DisplayFormat(outcome.BaseCase.Display);
        var percents = string.Join(" / ", settings.Percentiles.Select(percent => $"p{Text(percent)}"));
        var lines = new List<string>
        {
            $"{settings.Samples} samples ({JsonNamingPolicy.CamelCase.ConvertName(settings.Sampling.ToString())}, seed {settings.Seed}) of " +
                string.Join("; ", settings.Inputs.Select(input => input.Describe())),
        };
        foreach (var series in outcome.Series.Where(series => NamedResults.Dimension(series.Result) == Units.Dimension.MassPerArea))
        {
            lines.Add($"{series.Label} ({percents}):");
            foreach (var time in outcome.BaseCase.ReportTimesSeconds)
            {
                var index = IndexOf(outcome.TimesSeconds, time);
                if (index >= 0)
                {
                    lines.Add($"  {format.Time(time),12}  {string.Join(" / ", series.Percentiles[index].Select(format.MassPerArea))}");
                }
            }
        }

        foreach (var result in outcome.Results)
        {
            // In the run's display units, as the console shows every other figure of the case.
            Func<double, string> show = result.Result.Dimension switch
            {
                Units.Dimension.Time => format.Time,
                Units.Dimension.MassPerArea => format.MassPerArea,
                Units.Dimension.MassFlux => format.Flux,
                Units.Dimension.MassConcentration => format.Concentration,
                Units.Dimension.MassFraction => value => DisplayFormat.Shown(value, Units.UnitTable.Get("mg/kg")),
                _ => value => DisplayFormat.Number(value) + " " + result.Result.SiUnit,
            };
            lines.Add($"{result.Result.Label} ({percents}): {string.Join(" / ", result.Percentiles.Select(value => double.IsPositiveInfinity(value) ? "not reached" : show(value)))}");
        }

        if (outcome.Exceedance is { } exceedance)
        {
            var limit = exceedance.Limit;
            lines.Add(string.Create(CultureInfo.InvariantCulture,
                $"chance that {limit.Result.Label} exceeds {DisplayFormat.Shown(limit.ValueSi, limit.Unit)} ({limit.Origin}): {exceedance.Above} of {exceedance.Counted} samples = {DisplayFormat.Percent(exceedance.Probability)} (95 % interval {DisplayFormat.Percent(exceedance.Low)} to {DisplayFormat.Percent(exceedance.High)})"));
        }

        return lines;
    }

    private static void WriteExceedance(Utf8JsonWriter json, Exceedance? exceedance)
    {
        if (exceedance is null)
        {
            json.WriteNull("limit");
            return;
        }

        json.WriteStartObject("limit");
        json.WriteString("result", exceedance.Limit.Result.Name);
        StudyJson.Number(json, "atSeconds", exceedance.Limit.Result.AtSeconds);
        json.WriteString("period", exceedance.Limit.Result.Period);
        json.WriteString("unit", exceedance.Limit.Result.SiUnit);
        json.WriteNumber("value", exceedance.Limit.ValueSi);
        json.WriteString("origin", exceedance.Limit.Origin);
        json.WriteNumber("samplesAbove", exceedance.Above);
        json.WriteNumber("samplesCounted", exceedance.Counted);
        StudyJson.Number(json, "probability", exceedance.Probability);
        StudyJson.Numbers(json, "interval95", [exceedance.Low, exceedance.High]);
        json.WriteEndObject();
    }

    private static int IndexOf(IReadOnlyList<double> times, double time)
    {
        for (var i = 0; i < times.Count; i++)
        {
            if (Math.Abs(times[i] - time) <= 1e-9 * time)
            {
                return i;
            }
        }

        return -1;
    }

    private static string Cell(double value) => double.IsFinite(value) ? CsvText.Number(value) : double.IsPositiveInfinity(value) ? "inf" : string.Empty;

    private static string Text(double percent) => percent.ToString("0.###", CultureInfo.InvariantCulture);
}
