namespace Layers.Plotting;

/// <summary>What the plots look like: size in pixels and the choice of linear or logarithmic axes.</summary>
/// <param name="WidthPixels">Width of each PNG, pixels.</param>
/// <param name="HeightPixels">Height of each PNG, pixels.</param>
/// <param name="LogConcentrationAxis">
/// True for a logarithmic concentration axis on the profile plot; values at or below zero are drawn at the bottom
/// of the axis.
/// </param>
/// <param name="LogTimeAxis">
/// True for a logarithmic time axis on the transfer plot and on the approach-to-equilibrium plot. The permeation
/// plot always uses a linear time axis, on which the steady-state asymptote is a straight line, and so does the
/// transfer plot of a case with a schedule, whose periods repeat on a linear clock.
/// </param>
public sealed record PlotOptions(
    int WidthPixels = 1200,
    int HeightPixels = 800,
    bool LogConcentrationAxis = false,
    bool LogTimeAxis = true)
{
    private const int MinimumPixels = 200;
    private const int MaximumPixels = 10000;

    /// <summary>
    /// A limit on the mass transferred per contact area, kg/m2 (e.g. a specific migration limit expressed per area),
    /// drawn as a dashed horizontal line on the transfer plot, with the times read off the plotted output times; null
    /// for none, in which case a food-contact result's specific migration limit is drawn, with the time the solver
    /// located.
    /// </summary>
    public double? LimitMassPerArea { get; init; }

    /// <summary>Text shown next to the limit line, before its value.</summary>
    public string LimitLabel { get; init; } = "limit";

    /// <summary>Throws when the size is not usable.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A size is below 200 or above 10000 pixels.</exception>
    /// <exception cref="ArgumentException">The limit is not a finite positive number.</exception>
    internal void Validate()
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(WidthPixels, MinimumPixels, nameof(WidthPixels));
        ArgumentOutOfRangeException.ThrowIfGreaterThan(WidthPixels, MaximumPixels, nameof(WidthPixels));
        ArgumentOutOfRangeException.ThrowIfLessThan(HeightPixels, MinimumPixels, nameof(HeightPixels));
        ArgumentOutOfRangeException.ThrowIfGreaterThan(HeightPixels, MaximumPixels, nameof(HeightPixels));
        if (LimitMassPerArea is { } limit && !(double.IsFinite(limit) && limit > 0))
        {
            throw new ArgumentException("The limit must be a finite positive mass per area.", nameof(LimitMassPerArea));
        }
    }
}
