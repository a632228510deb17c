using System.Text;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// depths.csv: the concentration at the depths the case names (<c>$.depths</c>) at every report time, in long form
/// like profiles.csv; a depth on an interface has two rows, one per layer, as the partition jump leaves two values.
/// </summary>
public static class DepthsCsv
{
    /// <summary>The CSV text of a result, or null when the case names no depths (no file is written then).</summary>
    public static string? Write(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Case.ReportDepthsMeters.Count == 0)
        {
            return null;
        }

        var text = new StringBuilder();
        text.Append("time [s],depth [m],layer,concentration [kg/m3]\n");
        foreach (var report in result.Reports)
        {
            var time = CsvText.Number(report.Sample.TimeSeconds);
            foreach (var reading in report.Depths)
            {
                text.Append(time).Append(',')
                    .Append(CsvText.Number(reading.DepthMeters)).Append(',')
                    .Append(CsvText.Field(reading.LayerName)).Append(',')
                    .Append(CsvText.Number(reading.ConcentrationKgPerCubicMeter)).Append('\n');
            }
        }

        return text.ToString();
    }
}
