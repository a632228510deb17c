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

    /// <summary>Evenly spaced output times in each period of a schedule, the last at its end.</summary>
    public const int PointsPerPeriod = 20;

    /// <summary>Most output times spent on the periods of a schedule; beyond, each period gets fewer (at least its end).</summary>
    public const int MaxScheduleOutputs = 4000;

    /// <summary>
    /// The evenly spaced output times of a period of a schedule, the last at its end: the same places in every period,
    /// so that the highest and lowest flux of successive periods are read alike.
    /// </summary>
    public static IEnumerable<double> WithinPeriod(ContactSchedule schedule, SchedulePeriod period)
    {
        ArgumentNullException.ThrowIfNull(schedule);
        ArgumentNullException.ThrowIfNull(period);
        var within = Math.Clamp(MaxScheduleOutputs / schedule.Periods.Count, 1, PointsPerPeriod);
        return Enumerable.Range(1, within).Select(i => period.StartSeconds + (period.DurationSeconds * i / within));
    }

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

        // Period boundaries, where what each period delivered is read and renewals happen, and evenly spaced times
        // within each period, where its highest and lowest flux are looked for.
        if (simulation.Schedule is { } schedule)
        {
            times.AddRange(schedule.Periods.SelectMany(period => WithinPeriod(schedule, period)));
        }

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
