using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>The <c>crossCheck</c> object of summary.json: the run against the other method (docs/outputs.md).</summary>
internal static class SummaryJsonCrossCheck
{
    /// <summary>The exact method as the checking method, in words.</summary>
    public const string ExactMethod = "exact solution in the Laplace domain, inverted on a Talbot contour";

    /// <summary>The finite volumes as the checking method, in words.</summary>
    public const string FiniteVolumeMethod = "finite volumes with TR-BDF2 steps, error estimated and controlled as numerics.method \"finiteVolume\" would";

    public static void Write(Utf8JsonWriter json, SimulationResult result)
    {
        json.WritePropertyName("crossCheck");
        if (result.CrossCheck is not { } check)
        {
            json.WriteNullValue();
            return;
        }

        json.WriteStartObject();
        json.WriteString("method", check.CheckedBy == SolutionMethod.FiniteVolume ? FiniteVolumeMethod : ExactMethod);
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
            json.WriteNumber("checkValue", figure.CheckValue);
            SummaryJson.WriteNullable(json, "estimatedError", figure.Figure.EstimatedError);
            json.WriteNumber("checkEstimatedError", figure.CheckEstimatedError);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }
}
