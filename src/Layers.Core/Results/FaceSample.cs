namespace Layers.Core.Results;

/// <summary>What one face medium (compartment or bath) holds at one time. Closed faces have no sample.</summary>
/// <param name="TransferredIntoMediumPerArea">
/// Mass per unit contact area that has moved from the stack into the medium since t = 0, kg/m2 (negative when the
/// medium gave mass to the stack, e.g. a donor).
/// </param>
/// <param name="ConcentrationKgPerCubicMeter">Concentration in the medium, kg/m3 (fixed for a bath).</param>
/// <param name="FluxIntoMediumKgPerSquareMeterSecond">
/// Flux from the stack across the face into the medium at this time, kg/(m2 s), positive into the medium: the rate of
/// the face link of the discrete system, whose time integral is <paramref name="TransferredIntoMediumPerArea"/>. For a
/// compartment with first-order removal it is the flux across the face, before removal (the removal is not part of it).
/// </param>
/// <param name="FractionOfEquilibrium">
/// For a compartment of a system that tends to a final state: (M(t) - M(0)) / (M_final - M(0)); null where that
/// change is nil or the medium is a bath.
/// </param>
public sealed record FaceSample(
    double TransferredIntoMediumPerArea,
    double ConcentrationKgPerCubicMeter,
    double FluxIntoMediumKgPerSquareMeterSecond,
    double? FractionOfEquilibrium);
