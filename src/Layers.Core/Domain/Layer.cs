namespace Layers.Core.Domain;

/// <summary>
/// One homogeneous layer of the stack, in SI units.
/// </summary>
/// <param name="Name">Unique name within the stack (used in reports and CSV columns).</param>
/// <param name="ThicknessMeters">Thickness, m; strictly positive.</param>
/// <param name="Diffusivity">
/// Where the diffusion coefficient of the substance in this layer comes from: a constant value, or a law in
/// temperature that a <see cref="TemperatureStage"/> resolves (the one place a D is taken at a temperature).
/// </param>
/// <param name="PartitionCoefficient">
/// Volume-basis partition coefficient relative to the case's reference medium:
/// K = c_layer / c_reference at equilibrium, both in kg/m3. Mass-basis inputs are converted before this record is made.
/// </param>
/// <param name="InitialConcentrationKgPerCubicMeter">Uniform initial concentration, kg/m3.</param>
/// <param name="DensityKgPerCubicMeter">Density, kg/m3, when the case gives one (needed only for mass-basis inputs and outputs).</param>
public sealed record Layer(
    string Name,
    double ThicknessMeters,
    DiffusivitySource Diffusivity,
    double PartitionCoefficient,
    double InitialConcentrationKgPerCubicMeter,
    double? DensityKgPerCubicMeter = null)
{
    /// <summary>A layer with a constant diffusion coefficient, m2/s (given, the same at every temperature).</summary>
    public Layer(
        string name,
        double thicknessMeters,
        double diffusivitySquareMetersPerSecond,
        double partitionCoefficient,
        double initialConcentrationKgPerCubicMeter,
        double? densityKgPerCubicMeter = null)
        : this(name, thicknessMeters, new GivenDiffusivity(diffusivitySquareMetersPerSecond), partitionCoefficient, initialConcentrationKgPerCubicMeter, densityKgPerCubicMeter)
    {
    }

    /// <summary>
    /// The diffusion coefficient, m2/s, of a layer whose D is constant: every layer of a case without a temperature
    /// history, and every layer of a stage's case (<see cref="TemperatureStage.Apply"/>). A D that depends on
    /// temperature has no value of its own: it is taken at a stage's temperature there, and asking for it here is
    /// a mistake in the code, not in the case.
    /// </summary>
    public double DiffusivitySquareMetersPerSecond => Diffusivity is GivenDiffusivity constant
        ? constant.DiffusivitySquareMetersPerSecond
        : throw new InvalidOperationException(
            $"the diffusion coefficient of layer '{Name}' depends on temperature; take the layer from a stage's case (TemperatureStage.Apply)");

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
    /// Where the case's D comes from, in one word: <c>estimated</c> (Potts-Guy, see <see cref="Estimate"/>, or the
    /// upper-bound polymer correlation), else what the case says: <c>given</c> (the default: a value taken from
    /// elsewhere), <c>measured</c>, or <c>fitted</c> (written by <c>layers fit</c>).
    /// </summary>
    public string DiffusivityOrigin => Estimate is not null ? DiffusivityOrigins.Estimated : Diffusivity.Origin;

    /// <summary>How D and K were estimated (Potts-Guy), or null when the case gave them.</summary>
    public SkinEstimate? Estimate { get; init; }

    /// <summary>Diffusive resistance of the whole layer in the u = c/K variable, h / (D K), s/m.</summary>
    public double ResistanceSecondsPerMeter => ThicknessMeters / (DiffusivitySquareMetersPerSecond * PartitionCoefficient);
}
