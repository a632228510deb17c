using System.Text;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// profiles.csv: the concentration across the stack at every report time, in long form. Each layer contributes its
/// left-face value, its cell centres and its right-face value, so two rows share the position of every interface
/// (one per side) and the partition jump is visible.
/// </summary>
public static class ProfilesCsv
{
    /// <summary>The CSV text of a result.</summary>
    public static string Write(SimulationResult result)
    {
        var text = new StringBuilder();
        text.Append("time [s],layer,position [m],concentration [kg/m3]\n");
        foreach (var report in result.Reports)
        {
            var time = CsvText.Number(report.Sample.TimeSeconds);
            foreach (var profile in report.Profiles)
            {
                var name = CsvText.Field(profile.LayerName);
                for (var i = 0; i < profile.PositionsMeters.Count; i++)
                {
                    text.Append(time).Append(',').Append(name).Append(',')
                        .Append(CsvText.Number(profile.PositionsMeters[i])).Append(',')
                        .Append(CsvText.Number(profile.ConcentrationsKgPerCubicMeter[i])).Append('\n');
                }
            }
        }

        return text.ToString();
    }
}
