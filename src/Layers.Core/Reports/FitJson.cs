using System.Text;
using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Fitting;

namespace Layers.Core.Reports;

/// <summary>
/// fit.json: the estimates with their standard errors, intervals and correlations, the findings on
/// identifiability, and the quality of the fit. Estimates are in the unit the case writes them in (named beside
/// each); times and measured values in SI. The keys are listed in docs/outputs.md.
/// </summary>
public static class FitJson
{
    /// <summary>The JSON text of a fit.</summary>
    public static string Write(FitResult fit)
    {
        ArgumentNullException.ThrowIfNull(fit);
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            json.WriteStartObject();
            json.WriteString("tool", ToolInfo.Name);
            json.WriteString("version", ToolInfo.Version);
            json.WriteString("caseFile", fit.Request.CasePath);
            json.WriteString("dataFile", fit.Request.Data.FileName);
            json.WriteString("face", fit.Request.Face == Side.Left ? "left" : "right");
            json.WriteString("measured", fit.Request.Data.Quantity switch
            {
                MeasuredQuantity.Concentration => "concentration",
                MeasuredQuantity.MassFraction => "concentrationMassFraction",
                MeasuredQuantity.AmountPerArea => "cumulativeAmountPerArea",
            });
            json.WriteBoolean("weighted", fit.Request.Data.Deviations is not null);
            json.WriteNumber("confidenceLevel", fit.Request.Confidence);
            json.WriteBoolean("trustworthy", fit.IsTrustworthy);
            WriteEstimates(json, fit);
            WriteCorrelation(json, fit);
            WriteFindings(json, fit);
            json.WriteStartObject("quality");
            json.WriteNumber("measurements", fit.Points.Count);
            json.WriteNumber("degreesOfFreedom", fit.DegreesOfFreedom);
            json.WriteNumber("sumOfSquares", fit.SumOfSquares);
            json.WriteNumber("residualScale", fit.ResidualScale);
            json.WriteNumber("tQuantile", fit.TQuantile);
            SummaryJson.WriteNullable(json, "conditionNumber", fit.ConditionNumber);
            json.WriteNumber("iterations", fit.Iterations);
            json.WriteNumber("modelRuns", fit.ModelRuns);
            json.WriteString("stop", fit.Stop switch
            {
                LeastSquaresStop.Converged => "converged",
                LeastSquaresStop.NoFurtherDecrease => "noFurtherDecrease",
                _ => "iterationLimit",
            });
            json.WriteEndObject();
            json.WriteString("caution", CaseCautions.Paragraph(fit.FittedCase, CautionText.FittedInputs));
            json.WriteStartArray("notes");
            foreach (var note in CaseCautions.UnverifiedConstants(fit.FittedCase))
            {
                json.WriteStringValue(note);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    private static void WriteEstimates(Utf8JsonWriter json, FitResult fit)
    {
        json.WriteStartArray("estimates");
        foreach (var estimate in fit.Estimates)
        {
            json.WriteStartObject();
            json.WriteString("path", estimate.Parameter.Path);
            json.WriteString("unit", estimate.Parameter.Unit);
            json.WriteNumber("start", estimate.Parameter.StartValue);
            json.WriteNumber("value", estimate.Value);
            SummaryJson.WriteNullable(json, "log10StandardError", estimate.Log10StandardError);
            SummaryJson.WriteNullable(json, "relativeStandardError", estimate.RelativeStandardError);
            SummaryJson.WriteNullable(json, "lower", estimate.Lower);
            SummaryJson.WriteNullable(json, "upper", estimate.Upper);
            json.WriteBoolean("identifiable", estimate.Identifiable);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WriteCorrelation(Utf8JsonWriter json, FitResult fit)
    {
        json.WriteStartArray("correlation");
        for (var i = 0; i < fit.Estimates.Count; i++)
        {
            json.WriteStartArray();
            for (var j = 0; j < fit.Estimates.Count; j++)
            {
                SummaryJson.WriteNullable(json, fit.Correlation[i, j]);
            }

            json.WriteEndArray();
        }

        json.WriteEndArray();
    }

    private static void WriteFindings(Utf8JsonWriter json, FitResult fit)
    {
        json.WriteStartArray("findings");
        foreach (var finding in fit.Findings)
        {
            json.WriteStartObject();
            json.WriteBoolean("notIdentifiable", finding.NotIdentifiable);
            json.WriteStartArray("paths");
            finding.Paths.ToList().ForEach(json.WriteStringValue);
            json.WriteEndArray();
            json.WriteString("message", finding.Message);
            if (finding.Combination is { } combination)
            {
                json.WriteStartObject("determined");
                json.WriteString("combination", combination.Text);
                json.WriteString("unit", combination.Unit);
                json.WriteNumber("value", combination.Value);
                json.WriteNumber("lower", combination.Lower);
                json.WriteNumber("upper", combination.Upper);
                json.WriteEndObject();
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
    }
}
