namespace Layers.Core.Results;

/// <summary>
/// The state the system tends to and how fast it gets there. A sampled closed system tends to the equilibrium of the
/// mass left after its last sample (<see cref="MassLeftAfterSamplingPerArea"/>); a system that loses to first-order
/// removal with no bath ends with everything removed (<see cref="FinalStateKind.AllRemoved"/>).
/// </summary>
/// <param name="Kind">Equilibrium or steady permeation.</param>
/// <param name="LayerConcentrationsKgPerCubicMeter">
/// For each layer, its concentration in the final state at its left and right edge (equal for an equilibrium), kg/m3.
/// </param>
/// <param name="LeftConcentrationKgPerCubicMeter">Final concentration of the left medium, or null when closed.</param>
/// <param name="RightConcentrationKgPerCubicMeter">Final concentration of the right medium, or null when closed.</param>
/// <param name="System">Times for the whole system to go 50/90/99 % of the way to its final state.</param>
/// <param name="LeftCompartment">Same for the left compartment's transferred amount, when it has one that changes.</param>
/// <param name="RightCompartment">Same for the right compartment.</param>
/// <param name="HorizonSeconds">How far beyond the duration the solver looked for these times, s.</param>
public sealed record FinalStateSummary(
    FinalStateKind Kind,
    IReadOnlyList<(double Left, double Right)> LayerConcentrationsKgPerCubicMeter,
    double? LeftConcentrationKgPerCubicMeter,
    double? RightConcentrationKgPerCubicMeter,
    ThresholdTimes System,
    ThresholdTimes? LeftCompartment,
    ThresholdTimes? RightCompartment,
    double HorizonSeconds)
{
    /// <summary>
    /// For a sampled closed system, the mass per contact area left in it after the last sample, kg/m2, which its final
    /// equilibrium holds; null when the final state is built from the initial mass or is not a closed equilibrium.
    /// </summary>
    public double? MassLeftAfterSamplingPerArea { get; init; }

    /// <summary>Time of the last sample after which <see cref="MassLeftAfterSamplingPerArea"/> is left, s; else null.</summary>
    public double? LastSampleSeconds { get; init; }
}
