using System.Text.Json;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>The <c>crossCheck</c> object of summary.json: the run against the exact method (docs/outputs.md).</summary>
internal static class SummaryJsonCrossCheck
{
    /// <summary>The second method, in words.</summary>
    public const string Method = "exact solution in the Laplace domain, inverted on a Talbot contour";

    public static void Write(Utf8JsonWriter json, SimulationResult result)
    {
        json.WritePropertyName("crossCheck");
        if (result.CrossCheck is not { } check)
        {
            json.WriteNullValue();
            return;
        }

        json.WriteStartObject();
        json.WriteString("method", Method);
        SummaryJson.WriteNullable(json, "notApplicable", check.NotApplicable);

        json.WriteNumber("figuresCompared", check.Figures.Count);
        SummaryJson.WriteNullable(json, "largestRelativeDifference", check.LargestRelativeDifference);
        json.WriteBoolean("agrees", check.Disagreements.Count == 0);
        json.WriteStartArray("disagreements");
        foreach (var figure in check.Disagreements)
        {
            json.WriteStartObject();
            json.WriteString("path", figure.Figure.Figure.Path);
            json.WriteNumber("value", figure.Figure.Figure.Value);
            json.WriteNumber("exact", figure.Exact);
            SummaryJson.WriteNullable(json, "estimatedError", figure.Figure.EstimatedError);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }
}
