using Layers.Core.Domain;
using Layers.Core.Results;
using OxyPlot;
using OxyPlot.Annotations;

namespace Layers.Plotting;

/// <summary>
/// The periods of a schedule on the plots: a dashed vertical line at the start of each period after the first on a time
/// axis, and on a profile the period a report time ends ("end of contact 2 of 3"). Past <see cref="MostMarked"/>
/// periods the lines would merge into a grey band, so they are left out and the subtitle says so.
/// </summary>
internal static class PeriodMarks
{
    /// <summary>Most period starts drawn as lines.</summary>
    public const int MostMarked = 60;

    /// <summary>
    /// The subtitle line that says what the period lines are (or that there are too many to draw); null for a case
    /// without a schedule or with no period starting on the plotted range.
    /// </summary>
    public static string? Text(SimulationResult result, TimeAxis time)
    {
        var starts = Starts(result, time);
        if (starts is null || starts.Count == 0)
        {
            return null;
        }

        if (starts.Count > MostMarked)
        {
            return $"{result.Case.Schedule!.Periods.Count} periods of the schedule, too many to mark";
        }

        var renewed = starts.Any(period => period.Renewed.Count > 0);
        return "dashed vertical lines: the starts of the schedule's periods" + (renewed ? " (fresh media where a period renews them)" : string.Empty);
    }

    /// <summary>Draws a dashed vertical line at each period start on the plotted range, unless there are too many.</summary>
    public static void Draw(PlotModel model, SimulationResult result, TimeAxis time)
    {
        var starts = Starts(result, time);
        if (starts is null || starts.Count > MostMarked)
        {
            return;
        }

        foreach (var period in starts)
        {
            model.Annotations.Add(new LineAnnotation
            {
                Type = LineAnnotationType.Vertical,
                X = time.Unit.FromSi(period.StartSeconds),
                Color = PlotStyle.Interface,
                LineStyle = LineStyle.Dash,
                StrokeThickness = PlotStyle.InterfaceThickness,
                Layer = AnnotationLayer.BelowSeries,
            });
        }
    }

    /// <summary>" (end of 'contact 2 of 3')" when a time is the end of a period of the case's schedule; else empty.</summary>
    public static string EndOfPeriod(SimulationCase simulation, double timeSeconds)
    {
        var period = simulation.Schedule?.Periods.FirstOrDefault(period => Math.Abs(period.EndSeconds - timeSeconds) <= 1e-9 * period.EndSeconds);
        return period is null ? string.Empty : $" (end of '{period.Label}')";
    }

    private static List<SchedulePeriod>? Starts(SimulationResult result, TimeAxis time)
        => result.Case.Schedule?.Periods.Skip(1).Where(period => time.Covers(period.StartSeconds, result.Case.DurationSeconds)).ToList();
}
