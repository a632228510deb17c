using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Core.Reports;

/// <summary>
/// The <c>numericalError</c> object of summary.json: the accuracy promised, the floor, the solves, and every key
/// figure with its estimated error, named by its path in the same file (docs/outputs.md).
/// </summary>
internal static class SummaryJsonNumericalError
{
    /// <summary>How the estimate is made, in words.</summary>
    public const string Method =
        "difference from a second solve with every error source about four times larger (cells twice as wide, step tolerance eight times looser); " +
        "mesh and steps refined while a figure above its floor misses the accuracy";

    public static void Write(Utf8JsonWriter json, SimulationResult result)
    {
        json.WritePropertyName("numericalError");
        if (result.NumericalError is not { } error)
        {
            json.WriteNullValue();
            return;
        }

        json.WriteStartObject();
        json.WriteNumber("accuracy", error.Accuracy);
        json.WriteNumber("negligibleAmountKgPerSquareMeter", error.NegligibleAmountPerArea);
        json.WriteString("method", result.Method == SolutionMethod.Laplace ? ExactEstimation.Description : Method);
        json.WriteStartArray("solves");
        foreach (var solve in error.Solves)
        {
            json.WriteStartObject();
            json.WriteNumber("cells", solve.Cells);
            json.WriteNumber("acceptedSteps", solve.AcceptedSteps);
            json.WriteNumber("relativeTolerance", solve.RelativeTolerance);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        SummaryJson.WriteNullable(json, "unavailable", error.Unavailable);

        json.WriteBoolean("meetsAccuracy", error.MeetsAccuracy);
        SummaryJson.WriteNullable(json, "refinementStopped", error.RefinementStopped);

        SummaryJson.WriteNullable(json, "worstRelativeError", error.WorstRelativeError);
        json.WriteStartArray("figures");
        foreach (var figure in error.Figures)
        {
            json.WriteStartObject();
            json.WriteString("path", figure.Figure.Path);
            json.WriteNumber("value", figure.Figure.Value);
            SummaryJson.WriteNullable(json, "estimatedError", figure.EstimatedError);
            json.WriteNumber("negligibleBelow", figure.Figure.NegligibleBelow);
            if (figure.Figure.IsNegligible)
            {
                json.WriteNull("withinAccuracy");
            }
            else
            {
                json.WriteBoolean("withinAccuracy", !figure.Exceeds(error.Accuracy));
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }
}
