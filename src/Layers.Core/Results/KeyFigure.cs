namespace Layers.Core.Results;

/// <summary>
/// One number a run reports and promises an accuracy for, named by where summary.json holds it.
/// </summary>
/// <param name="Path">The JSON path of the value in summary.json, e.g. <c>$.faces.right.concentrationKgPerCubicMeter[2]</c>.</param>
/// <param name="Kind">What it measures.</param>
/// <param name="Value">The value, in the SI unit its path names.</param>
/// <param name="What">The figure in words, without its time, e.g. "food: concentration".</param>
/// <param name="AtSeconds">The report time it is read at, s, or null for a single figure (a time, a steady flux).</param>
/// <param name="NegligibleBelow">
/// Below this magnitude the figure counts as negligible and the promise does not cover it (0 for times).
/// </param>
public sealed record KeyFigure(string Path, FigureKind Kind, double Value, string What, double? AtSeconds, double NegligibleBelow)
{
    /// <summary>True when the figure is below its floor.</summary>
    public bool IsNegligible => Math.Abs(Value) < NegligibleBelow;
}
