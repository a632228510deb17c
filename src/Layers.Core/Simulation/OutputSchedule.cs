using Layers.Core.Domain;

namespace Layers.Core.Simulation;

/// <summary>
/// The output times of a run: the report times, the extra output times and a dense grid spaced evenly in log time
/// over the last four decades of the duration (for time series and plots), merged and sorted.
/// </summary>
public static class OutputSchedule
{
    /// <summary>Points per decade of the dense log-spaced grid.</summary>
    public const int PointsPerDecade = 25;

    /// <summary>Decades covered by the dense grid, ending at the duration.</summary>
    public const int Decades = 4;

    /// <summary>All output times of a case, ascending, without duplicates, all in (0, duration].</summary>
    public static double[] For(SimulationCase simulation)
    {
        var end = simulation.DurationSeconds;
        var times = new List<double>(simulation.ReportTimesSeconds);
        times.AddRange(simulation.ExtraOutputTimesSeconds);
        if (simulation.PermeationTest is not null)
        {
            // Day boundaries, so that the delivery per day is read from exact values.
            for (var day = 1; day * Permeation.Delivery.DaySeconds <= end * (1 + 1e-12); day++)
            {
                times.Add(day * Permeation.Delivery.DaySeconds);
            }
        }

        foreach (var face in new[] { simulation.Left, simulation.Right })
        {
            // Sampling happens at output times, which the loop lands on exactly.
            if (face is CompartmentFace { Sampling: { } sampling })
            {
                times.AddRange(sampling.TimesSeconds);
            }
        }

        // Period boundaries: what each period delivered is read there, and renewals happen there.
        times.AddRange(simulation.Schedule?.Periods.Select(period => period.EndSeconds) ?? []);

        var count = (PointsPerDecade * Decades) + 1;
        for (var i = 0; i < count; i++)
        {
            times.Add(end * Math.Pow(10, -Decades + ((double)i / PointsPerDecade)));
        }

        times.Add(end);
        times.Sort();
        var merged = new List<double>();
        foreach (var time in times)
        {
            if (time > 0 && time <= end && (merged.Count == 0 || time > merged[^1] * (1 + 1e-9)))
            {
                merged.Add(time);
            }
        }

        return merged.ToArray();
    }

    /// <summary>True when <paramref name="time"/> equals one of the report times to 1e-9 relative.</summary>
    public static bool IsReportTime(SimulationCase simulation, double time)
    {
        ArgumentNullException.ThrowIfNull(simulation);

        // Asked at every output: a plain loop, no closure or enumerator to allocate.
        var reports = simulation.ReportTimesSeconds;
        for (var i = 0; i < reports.Count; i++)
        {
            if (Math.Abs(reports[i] - time) <= 1e-9 * reports[i])
            {
                return true;
            }
        }

        return false;
    }
}
