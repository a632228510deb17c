namespace Layers.Core.Domain;

/// <summary>
/// One homogeneous layer of the stack, in SI units.
/// </summary>
/// <param name="Name">Unique name within the stack (used in reports and CSV columns).</param>
/// <param name="ThicknessMeters">Thickness, m; strictly positive.</param>
/// <param name="DiffusivitySquareMetersPerSecond">Diffusion coefficient of the substance in this layer, m2/s.</param>
/// <param name="PartitionCoefficient">
/// Volume-basis partition coefficient relative to the case's reference medium:
/// K = c_layer / c_reference at equilibrium, both in kg/m3. Mass-basis inputs are converted before this record is made.
/// </param>
/// <param name="InitialConcentrationKgPerCubicMeter">Uniform initial concentration, kg/m3.</param>
/// <param name="DensityKgPerCubicMeter">Density, kg/m3, when the case gives one (needed only for mass-basis inputs and outputs).</param>
public sealed record Layer(
    string Name,
    double ThicknessMeters,
    double DiffusivitySquareMetersPerSecond,
    double PartitionCoefficient,
    double InitialConcentrationKgPerCubicMeter,
    double? DensityKgPerCubicMeter = null)
{
    /// <summary>
    /// The variable that is continuous across interfaces, u = c / K (kg/m3 of reference-medium equivalent),
    /// at the start of the simulation.
    /// </summary>
    public double InitialContinuousVariable => InitialConcentrationKgPerCubicMeter / PartitionCoefficient;

    /// <summary>Initial mass of substance per unit area of the stack, kg/m2.</summary>
    public double InitialMassPerArea => InitialConcentrationKgPerCubicMeter * ThicknessMeters;

    /// <summary>
    /// Solubility of the substance in this layer, kg/m3, or null for none. The dissolved concentration is capped at it;
    /// <see cref="InitialConcentrationKgPerCubicMeter"/> is then the total loading (dissolved plus undissolved) and may
    /// exceed it, the excess dissolving instantly as the dissolved concentration falls (a dispersed-drug matrix).
    /// </summary>
    public double? SolubilityKgPerCubicMeter { get; init; }

    /// <summary>u = c / K at which the layer saturates, kg/m3; +infinity without a solubility.</summary>
    public double SaturationContinuousVariable => SolubilityKgPerCubicMeter is { } solubility
        ? solubility / PartitionCoefficient
        : double.PositiveInfinity;

    /// <summary>Initial undissolved mass per unit area, kg/m2 (zero without a solubility or below it).</summary>
    public double InitialUndissolvedPerArea => SolubilityKgPerCubicMeter is { } solubility
        ? Math.Max(0, InitialConcentrationKgPerCubicMeter - solubility) * ThicknessMeters
        : 0;

    /// <summary>
    /// Where the case's D comes from, as the case says: <c>given</c> (the default: a value taken from elsewhere),
    /// <c>measured</c>, or <c>fitted</c> (written by <c>layers fit</c>). Estimated values say so through
    /// <see cref="Estimate"/> or the food-contact settings instead.
    /// </summary>
    public string DiffusivityOrigin { get; init; } = DiffusivityOrigins.Given;

    /// <summary>How D and K were estimated (Potts-Guy), or null when the case gave them.</summary>
    public SkinEstimate? Estimate { get; init; }

    /// <summary>Diffusive resistance of the whole layer in the u = c/K variable, h / (D K), s/m.</summary>
    public double ResistanceSecondsPerMeter => ThicknessMeters / (DiffusivitySquareMetersPerSecond * PartitionCoefficient);
}
