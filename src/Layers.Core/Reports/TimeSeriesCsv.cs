using System.Text;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// timeseries.csv: one row per output time (t = 0, the report and extra times and a dense log-spaced grid), with
/// the amounts in every face medium and layer and the flux into every face medium. SI units, stated in every header as "name [unit]".
/// </summary>
public static class TimeSeriesCsv
{
    /// <summary>The CSV text of a result.</summary>
    public static string Write(SimulationResult result)
    {
        var simulation = result.Case;
        var header = new List<string> { "time [s]", "fraction of final state [-]" };
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (simulation.Face(side).IsOpen)
            {
                var name = FaceName(simulation.Face(side));
                header.Add($"{name}: transferred into medium [kg/m2]");
                header.Add($"{name}: concentration [kg/m3]");
                header.Add($"{name}: flux into medium [kg/(m2 s)]");
            }
        }

        header.AddRange(simulation.Stack.Layers.Select(layer => $"{layer.Name}: mass [kg/m2]"));
        header.Add("mass balance error [-]");

        var text = new StringBuilder();
        text.Append(CsvText.Line(header.Select(CsvText.Field))).Append('\n');
        foreach (var sample in result.TimeSeries)
        {
            text.Append(CsvText.Line(Row(sample))).Append('\n');
        }

        return text.ToString();
    }

    internal static string FaceName(FaceCondition face) => face.MediumName;

    private static IEnumerable<string> Row(StateSample sample)
    {
        yield return CsvText.Number(sample.TimeSeconds);
        // Empty when not applicable (the system starts at its final state).
        yield return double.IsNaN(sample.FractionOfFinalState) ? string.Empty : CsvText.Number(sample.FractionOfFinalState);
        foreach (var face in new[] { sample.Left, sample.Right })
        {
            if (face is not null)
            {
                yield return CsvText.Number(face.TransferredIntoMediumPerArea);
                yield return CsvText.Number(face.ConcentrationKgPerCubicMeter);
                yield return CsvText.Number(face.FluxIntoMediumKgPerSquareMeterSecond);
            }
        }

        foreach (var mass in sample.LayerMassPerArea)
        {
            yield return CsvText.Number(mass);
        }

        yield return CsvText.Number(sample.MassBalanceError);
    }
}
