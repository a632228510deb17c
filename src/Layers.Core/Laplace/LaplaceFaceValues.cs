namespace Layers.Core.Laplace;

/// <summary>What one face medium (bath or compartment) holds at one time, from the exact method.</summary>
/// <param name="TransferredIntoMediumPerArea">
/// Mass per unit contact area that has crossed the face from the stack into the medium since t = 0, kg/m2 (negative
/// when the medium gave mass to the stack); for a removing compartment this includes what was removed since.
/// </param>
/// <param name="FluxIntoMediumKgPerSquareMeterSecond">Flux from the stack into the medium at that time, kg/(m2 s).</param>
/// <param name="ConcentrationKgPerCubicMeter">Concentration in the medium, kg/m3 (fixed for a bath).</param>
/// <param name="MediumMassPerArea">Mass per contact area held by a compartment, kg/m2; null for a bath.</param>
/// <param name="RemovedPerArea">Mass per contact area removed by first-order removal since t = 0, kg/m2 (0 without).</param>
public sealed record LaplaceFaceValues(
    double TransferredIntoMediumPerArea,
    double FluxIntoMediumKgPerSquareMeterSecond,
    double ConcentrationKgPerCubicMeter,
    double? MediumMassPerArea,
    double RemovedPerArea);
