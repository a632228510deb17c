using System.Text;
using System.Text.Json;
using Layers.Core.Studies;

namespace Layers.Core.Reports;

/// <summary>
/// design.json (keys in docs/outputs.md, section "design.json") and the console lines of a design. Results in SI,
/// input values in the unit the case writes them in (named by <c>input.unit</c>).
/// </summary>
public static class DesignReport
{
    /// <summary>The JSON text.</summary>
    /// <param name="outcome">The design's outcome.</param>
    /// <param name="caseFile">The case file as given.</param>
    public static string Json(DesignOutcome outcome, string caseFile)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var settings = outcome.Settings;
        return StudyJson.Write(caseFile, json =>
        {
            json.WriteStartObject("input");
            json.WriteString("path", settings.Input.Path);
            json.WriteString("unit", settings.Input.Unit);
            json.WriteNumber("from", settings.Lowest);
            json.WriteNumber("to", settings.Highest);
            json.WriteString("scale", settings.LogScale ? "log" : "linear");
            json.WriteEndObject();
            json.WriteStartObject("result");
            json.WriteString("name", settings.Result.Name);
            StudyJson.Number(json, "atSeconds", settings.Result.AtSeconds);
            json.WriteString("period", settings.Result.Period);
            json.WriteString("unit", settings.Result.SiUnit);
            json.WriteNumber("target", settings.TargetSi);
            json.WriteEndObject();
            json.WriteString("status", outcome.Status == StudyStatus.Done ? "found" : "notReached");
            json.WriteString("message", outcome.Message);
            StudyJson.Number(json, "answer", outcome.Answer);
            json.WriteString("answerText", outcome.Answer is { } answer ? settings.Input.Write(answer) : null);
            StudyJson.Number(json, "tolerance", outcome.Tolerance);
            json.WriteBoolean("toleranceConfirmed", outcome.Bracketed);
            StudyJson.Number(json, "resultAtAnswer", outcome.ResultAtAnswerSi);
            json.WriteNumber("requestedTolerance", settings.Tolerance);
            json.WriteNumber("crossings", outcome.Crossings);
            json.WriteStartArray("runs");
            foreach (var point in outcome.Points)
            {
                json.WriteStartObject();
                json.WriteNumber("input", point.Value);
                StudyJson.Number(json, "result", point.ResultSi);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteString("caution", Caution(outcome));
        });
    }

    /// <summary>
    /// The caution of the case solved at the answer, as <c>layers run</c> gives it (with the food-contact caution on a
    /// food-contact case), or the general one when there is no answer.
    /// </summary>
    public static string Caution(DesignOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        return outcome.RunAtAnswer is not { } run
            ? CautionText.Paragraph
            : run.FoodContact is null ? CautionText.For(run) : CautionText.For(run) + " " + FoodContactTables.Caution;
    }

    /// <summary>The answer in one line for the console, or the reason there is none.</summary>
    public static string Line(DesignOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var settings = outcome.Settings;
        var question = $"{settings.Input.Label} for {settings.Result.Label} = {DesignSolver.Show(settings, settings.TargetSi)}";
        if (outcome.Answer is not { } answer)
        {
            return outcome.Message ?? question;
        }

        var tolerance = outcome.Tolerance is { } within ? $" +- {settings.Input.Show(within)}" : string.Empty;
        var confirmed = outcome.Bracketed ? string.Empty : " (tolerance estimated, not confirmed by results on both sides)";
        var crossings = outcome.Crossings > 1 ? $"; the result crosses the target {outcome.Crossings} times in the range, the smallest value is given" : string.Empty;
        return $"{question}: {settings.Input.Show(answer)}{tolerance}{confirmed} (result there {DesignSolver.Show(settings, outcome.ResultAtAnswerSi ?? double.NaN)}; {outcome.Points.Count} runs){crossings}";
    }
}
