using System.Text;
using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Core.Reports;

/// <summary>
/// summary.json: the key results in SI units (kg, m, s, kg/m3, kg/m2, kg/(m2 s)), every key naming its unit.
/// The keys are listed in docs/outputs.md. Arrays indexed like <c>reportTimesSeconds</c> hold one value per report
/// time. The output is deterministic: no clock readings, invariant formatting.
/// </summary>
public static class SummaryJson
{
    /// <summary>The JSON text for a result.</summary>
    /// <param name="result">The solved case.</param>
    /// <param name="caseFile">The case file path as given by the user.</param>
    public static string Write(SimulationResult result, string caseFile)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            json.WriteStartObject();
            WriteHeader(json, result, caseFile);
            json.WriteStartArray("reportTimesSeconds");
            result.Reports.ToList().ForEach(report => json.WriteNumberValue(report.Sample.TimeSeconds));
            json.WriteEndArray();
            WriteLayers(json, result);
            json.WriteStartObject("faces");
            WriteFace(json, "left", result, Side.Left);
            WriteFace(json, "right", result, Side.Right);
            json.WriteEndObject();
            WriteDepths(json, result);
            WriteMassBalance(json, result);
            WriteDispersedLayers(json, result);
            SummaryJsonFinalState.Write(json, result);
            SummaryJsonFoodContact.Write(json, result);
            SummaryJsonDiffusionCell.Write(json, result);
            SummaryJsonSchedule.Write(json, result);
            WriteSolver(json, result);
            SummaryJsonNumericalError.Write(json, result);
            SummaryJsonCrossCheck.Write(json, result);
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    private static void WriteHeader(Utf8JsonWriter json, SimulationResult result, string caseFile)
    {
        json.WriteStartObject("tool");
        json.WriteString("name", ToolInfo.Name);
        json.WriteString("version", ToolInfo.Version);
        json.WriteEndObject();
        json.WriteStartObject("case");
        json.WriteString("title", result.Case.Title);
        json.WriteString("file", Path.GetFileName(caseFile));
        if (result.Case.SourceSha256 is { } hash)
        {
            json.WriteString("sha256", hash);
        }

        json.WriteString("referenceMedium", result.Case.ReferenceMedium);
        json.WriteNumber("durationSeconds", result.Case.DurationSeconds);
        json.WriteEndObject();
        json.WriteString("caution", CautionText.For(result));
    }

    private static void WriteLayers(Utf8JsonWriter json, SimulationResult result)
    {
        json.WriteStartArray("layers");
        var stack = result.Case.Stack;

        // A D that depends on temperature is shown as in the first stage, where the run starts.
        var diffusivities = result.Case.WithFirstStageDiffusivities().Stack;
        for (var i = 0; i < stack.Count; i++)
        {
            var layer = stack.Layers[i];
            json.WriteStartObject();
            json.WriteString("name", layer.Name);
            json.WriteNumber("thicknessMeters", layer.ThicknessMeters);
            json.WriteNumber("diffusionCoefficientSquareMetersPerSecond", diffusivities.Layers[i].DiffusivitySquareMetersPerSecond);
            json.WriteString("diffusionCoefficientOrigin", InputTables.OriginOf(result.Case, i));
            json.WriteNumber("partitionCoefficientVolumeBasis", layer.PartitionCoefficient);
            json.WriteNumber("initialConcentrationKgPerCubicMeter", layer.InitialConcentrationKgPerCubicMeter);
            WriteNullable(json, "solubilityKgPerCubicMeter", layer.SolubilityKgPerCubicMeter);
            if (layer.Estimate is { } estimate)
            {
                json.WriteString("estimate", EstimateNotes.Describe(estimate));
            }
            else
            {
                json.WriteNull("estimate");
            }

            WriteSeries(json, "massPerAreaKgPerSquareMeter", result, sample => sample.LayerMassPerArea[i]);
            WriteSeries(json, "meanConcentrationKgPerCubicMeter", result, sample => sample.LayerMassPerArea[i] / layer.ThicknessMeters);
            WriteReportSeries(json, "leftEdgeConcentrationKgPerCubicMeter", result, report => report.Profiles[i].ConcentrationsKgPerCubicMeter[0]);
            WriteReportSeries(json, "rightEdgeConcentrationKgPerCubicMeter", result, report => report.Profiles[i].ConcentrationsKgPerCubicMeter[^1]);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WriteFace(Utf8JsonWriter json, string key, SimulationResult result, Side side)
    {
        var face = result.Case.Face(side);
        json.WriteStartObject(key);
        json.WriteString("kind", face.KindName);
        if (face.IsOpen)
        {
            json.WriteString("name", TimeSeriesCsv.FaceName(face));
            FaceSample Pick(StateSample sample) => (side == Side.Left ? sample.Left : sample.Right)!;
            WriteSeries(json, "transferredMassPerAreaKgPerSquareMeter", result, sample => Pick(sample).TransferredIntoMediumPerArea);
            WriteSeries(json, "concentrationKgPerCubicMeter", result, sample => Pick(sample).ConcentrationKgPerCubicMeter);
            WriteSeries(json, "fluxIntoMediumKgPerSquareMeterSecond", result, sample => Pick(sample).FluxIntoMediumKgPerSquareMeterSecond);
            if (face is CompartmentFace compartment)
            {
                json.WriteNumber("contactAreaSquareMeters", compartment.ContactAreaSquareMeters);
                json.WriteNumber("volumeCubicMeters", compartment.VolumeCubicMeters);
                WriteSeries(json, "transferredMassKg", result, sample => Pick(sample).TransferredIntoMediumPerArea * compartment.ContactAreaSquareMeters);
                WriteSeries(json, "fractionOfEquilibrium", result, sample => Pick(sample).FractionOfEquilibrium);
            }
        }

        json.WriteEndObject();
    }

    /// <summary>
    /// The concentrations at the depths the case names, one entry per reading (a depth on an interface has two, one
    /// per layer), each with its value per report time; written only when the case names depths.
    /// </summary>
    private static void WriteDepths(Utf8JsonWriter json, SimulationResult result)
    {
        if (result.Case.ReportDepthsMeters.Count == 0 || result.Reports.Count == 0)
        {
            return;
        }

        json.WriteStartArray("depths");
        var readings = result.Reports[0].Depths;
        for (var i = 0; i < readings.Count; i++)
        {
            json.WriteStartObject();
            json.WriteNumber("depthMeters", readings[i].DepthMeters);
            json.WriteString("layer", readings[i].LayerName);
            var reading = i;
            WriteReportSeries(json, "concentrationKgPerCubicMeter", result, report => report.Depths[reading].ConcentrationKgPerCubicMeter);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WriteMassBalance(Utf8JsonWriter json, SimulationResult result)
    {
        json.WriteStartObject("massBalance");
        json.WriteNumber("initialMassPerAreaKgPerSquareMeter", result.TimeSeries[0].LayerMassPerArea.Sum()
            + result.Case.Left.InitialMassPerArea
            + result.Case.Right.InitialMassPerArea);
        json.WriteNumber("worstRelativeError", result.WorstMassBalanceError);
        WriteSeries(json, "relativeErrorAtReportTimes", result, sample => sample.MassBalanceError);
        json.WriteEndObject();
    }

    private static void WriteDispersedLayers(Utf8JsonWriter json, SimulationResult result)
    {
        json.WriteStartArray("dispersedLayers");
        foreach (var layer in result.DispersedLayers)
        {
            json.WriteStartObject();
            json.WriteString("name", layer.Layer);
            json.WriteNumber("solubilityKgPerCubicMeter", layer.SolubilityKgPerCubicMeter);
            json.WriteNumber("initialUndissolvedMassPerAreaKgPerSquareMeter", layer.InitialUndissolvedPerArea);
            json.WriteNumber("undissolvedMassPerAreaAtEndKgPerSquareMeter", layer.UndissolvedAtEndPerArea);
            WriteNullable(json, "undissolvedExhaustedSeconds", layer.ExhaustedSeconds);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WriteSolver(Utf8JsonWriter json, SimulationResult result)
    {
        var statistics = result.Statistics;
        json.WriteStartObject("solver");
        if (result.Method == SolutionMethod.Laplace)
        {
            json.WriteString("solutionMethod", "laplace");
            json.WriteString("method", "exact solution in the Laplace domain, inverted on a Talbot contour; profiles read at the cell centres of the case's mesh");
            json.WriteString("methodReason", result.MethodReason);
            json.WriteNumber("contourPoints", ExactEstimation.ContourPoints);
            json.WriteNumber("cells", result.Grid.CellCount);
            json.WriteNumber("wallSeconds", statistics.WallSeconds);
            json.WriteString("stopReason", JsonNamingPolicy.CamelCase.ConvertName(statistics.StopReason.ToString()));
            json.WriteEndObject();
            return;
        }

        json.WriteString("solutionMethod", "finiteVolume");
        json.WriteString("method", "finite volumes in u = c/K, TR-BDF2 with adaptive steps");
        json.WriteString("methodReason", result.MethodReason);
        json.WriteNumber("cells", result.Grid.CellCount);
        json.WriteNumber("unknowns", statistics.Unknowns);
        json.WriteNumber("acceptedSteps", statistics.AcceptedSteps);
        json.WriteNumber("rejectedSteps", statistics.RejectedSteps);
        json.WriteNumber("smallestStepSeconds", statistics.SmallestStepSeconds);
        json.WriteNumber("largestStepSeconds", statistics.LargestStepSeconds);
        json.WriteNumber("relativeTolerance", result.Case.Numerics.Solver.RelativeTolerance);
        json.WriteString("stopReason", JsonNamingPolicy.CamelCase.ConvertName(statistics.StopReason.ToString()));
        json.WriteEndObject();
    }

    internal static void WriteSeries(Utf8JsonWriter json, string key, SimulationResult result, Func<StateSample, double?> value) =>
        WriteReportSeries(json, key, result, report => value(report.Sample));

    private static void WriteReportSeries(Utf8JsonWriter json, string key, SimulationResult result, Func<ReportPoint, double?> value)
    {
        json.WriteStartArray(key);
        foreach (var report in result.Reports)
        {
            WriteNullable(json, value(report));
        }

        json.WriteEndArray();
    }

    internal static void WriteNullable(Utf8JsonWriter json, double? value)
    {
        if (value is { } number && double.IsFinite(number))
        {
            json.WriteNumberValue(number);
        }
        else
        {
            json.WriteNullValue();
        }
    }

    internal static void WriteNullable(Utf8JsonWriter json, string key, string? text)
    {
        if (text is null)
        {
            json.WriteNull(key);
        }
        else
        {
            json.WriteString(key, text);
        }
    }

    internal static void WriteNullable(Utf8JsonWriter json, string key, double? value)
    {
        json.WritePropertyName(key);
        WriteNullable(json, value);
    }
}
