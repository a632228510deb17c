namespace Layers.Core.Results;

/// <summary>The state the system tends to and how fast it gets there.</summary>
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
    double HorizonSeconds);
