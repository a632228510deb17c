using Layers.Core.Results;
using Layers.Core.Units;
using OxyPlot.Axes;

namespace Layers.Plotting;

/// <summary>The time axis of a plot over the simulated duration, in the run's time unit.</summary>
internal sealed class TimeAxis
{
    private TimeAxis(Axis axis, UnitDefinition unit, double firstSeconds)
    {
        Axis = axis;
        Unit = unit;
        FirstSeconds = firstSeconds;
    }

    /// <summary>The axis, at the bottom.</summary>
    public Axis Axis { get; }

    /// <summary>The unit of its values.</summary>
    public UnitDefinition Unit { get; }

    /// <summary>The earliest time plotted, s: 0 on a linear axis, the first positive output time on a log axis.</summary>
    public double FirstSeconds { get; }

    /// <summary>A log or linear time axis from the first plotted time to the end of the duration.</summary>
    public static TimeAxis Create(SimulationResult result, bool logarithmic)
    {
        var duration = result.Case.DurationSeconds;
        // The run's one time unit (display.time), the unit of the console and the report too.
        var unit = result.Case.Display.Time;
        var title = $"Time ({DisplayText.Unit(unit)})" + (logarithmic ? ", logarithmic scale" : string.Empty);
        var first = logarithmic
            ? result.TimeSeries.Select(sample => sample.TimeSeconds).Where(t => t > 0).DefaultIfEmpty(duration / 1000).Min()
            : 0;
        var axis = PlotFrame.Axis(logarithmic, AxisPosition.Bottom, title);
        axis.Minimum = unit.FromSi(first);
        axis.Maximum = unit.FromSi(duration);
        return new TimeAxis(axis, unit, first);
    }

    /// <summary>True when a time lies on the plotted range.</summary>
    public bool Covers(double seconds, double durationSeconds) => seconds >= FirstSeconds && seconds <= durationSeconds;

    /// <summary>The output times to plot: all of them on a linear axis, the positive ones on a log axis.</summary>
    public IEnumerable<StateSample> Samples(SimulationResult result) =>
        result.TimeSeries.Where(sample => sample.TimeSeconds >= FirstSeconds);
}
