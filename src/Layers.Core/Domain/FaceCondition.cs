namespace Layers.Core.Domain;

/// <summary>
/// What touches one face of the stack. A closed set of kinds: <see cref="ClosedFace"/>, <see cref="BathFace"/>
/// and <see cref="CompartmentFace"/>. How each kind enters the discrete equations is in its face model
/// (Discretization.FaceModel). Code that only asks what a face does reads the questions below rather than its kind.
/// </summary>
public abstract record FaceCondition
{
    private protected FaceCondition()
    {
    }

    /// <summary>Short name of the kind, as written in case files.</summary>
    public abstract string KindName { get; }

    /// <summary>Whether substance can cross the face (a medium touches it), so that it has a received amount.</summary>
    public abstract bool IsOpen { get; }

    /// <summary>Whether the medium beyond the face is unlimited and held at a fixed concentration.</summary>
    public abstract bool IsUnlimited { get; }

    /// <summary>Whether the medium beyond the face is finite and well mixed, its concentration changing with what it receives.</summary>
    public abstract bool HasFiniteVolume { get; }

    /// <summary>Initial mass per unit contact area in a finite medium, kg/m2; 0 when the face holds none.</summary>
    public virtual double InitialMassPerArea => 0;

    /// <summary>The name reports give the medium at this face: its own name, or the kind of a face with none.</summary>
    public virtual string MediumName => KindName;
}

/// <summary>No flux through the face: an outer film surface, a patch backing, a symmetry plane.</summary>
public sealed record ClosedFace : FaceCondition
{
    /// <inheritdoc />
    public override string KindName => "closed";

    /// <inheritdoc />
    public override bool IsOpen => false;

    /// <inheritdoc />
    public override bool IsUnlimited => false;

    /// <inheritdoc />
    public override bool HasFiniteVolume => false;
}

/// <summary>
/// An unlimited external medium held at a fixed concentration (0 is a perfect sink), optionally behind a
/// liquid-side film with mass-transfer coefficient k, which adds the resistance 1 / (k K) in the u = c/K variable.
/// </summary>
/// <param name="Name">Name used in reports.</param>
/// <param name="ConcentrationKgPerCubicMeter">Concentration in the bath, kg/m3.</param>
/// <param name="PartitionCoefficient">K of the bath medium relative to the reference medium (volume basis).</param>
/// <param name="FilmCoefficientMetersPerSecond">Film mass-transfer coefficient, m/s; null for a perfectly mixed bath.</param>
public sealed record BathFace(
    string Name,
    double ConcentrationKgPerCubicMeter,
    double PartitionCoefficient,
    double? FilmCoefficientMetersPerSecond) : FaceCondition
{
    /// <inheritdoc />
    public override string KindName => "bath";

    /// <inheritdoc />
    public override string MediumName => Name;

    /// <inheritdoc />
    public override bool IsOpen => true;

    /// <inheritdoc />
    public override bool IsUnlimited => true;

    /// <inheritdoc />
    public override bool HasFiniteVolume => false;

    /// <summary>The bath's value of the interface-continuous variable, u = c / K.</summary>
    public double ContinuousVariable => ConcentrationKgPerCubicMeter / PartitionCoefficient;
}

/// <summary>
/// A finite, well-mixed medium (a food, a simulant, a donor or receptor solution) whose concentration changes by
/// the flux it receives through the contact area.
/// </summary>
/// <param name="Name">Name used in reports.</param>
/// <param name="VolumeCubicMeters">Volume of the medium, m3.</param>
/// <param name="ContactAreaSquareMeters">Area of the face in contact with the stack, m2.</param>
/// <param name="PartitionCoefficient">K of the medium relative to the reference medium (volume basis).</param>
/// <param name="InitialConcentrationKgPerCubicMeter">Initial concentration in the medium, kg/m3.</param>
/// <param name="FilmCoefficientMetersPerSecond">Film mass-transfer coefficient on the medium's side, m/s; null for none.</param>
/// <param name="DensityKgPerCubicMeter">Density of the medium, kg/m3, when given (for mass-fraction outputs).</param>
public sealed record CompartmentFace(
    string Name,
    double VolumeCubicMeters,
    double ContactAreaSquareMeters,
    double PartitionCoefficient,
    double InitialConcentrationKgPerCubicMeter,
    double? FilmCoefficientMetersPerSecond,
    double? DensityKgPerCubicMeter = null) : FaceCondition
{
    /// <inheritdoc />
    public override string KindName => "compartment";

    /// <inheritdoc />
    public override string MediumName => Name;

    /// <inheritdoc />
    public override bool IsOpen => true;

    /// <inheritdoc />
    public override bool IsUnlimited => false;

    /// <inheritdoc />
    public override bool HasFiniteVolume => true;

    /// <summary>Volume per unit contact area, m: the compartment's depth if it were a slab over the contact area.</summary>
    public double VolumePerAreaMeters => VolumeCubicMeters / ContactAreaSquareMeters;

    /// <summary>Initial mass per unit contact area, kg/m2.</summary>
    public override double InitialMassPerArea => InitialConcentrationKgPerCubicMeter * VolumePerAreaMeters;

    /// <summary>Sampling with replacement by fresh medium, or null for an unsampled compartment.</summary>
    public ReceptorSampling? Sampling { get; init; }

    /// <summary>
    /// First-order removal rate constant k, 1/s (from a half-life, k = ln 2 / t_half), an approximation of systemic
    /// clearance: the compartment loses k V c per unit time; 0 for none.
    /// </summary>
    public double RemovalRatePerSecond { get; init; }

    /// <summary>Solubility of the substance in this medium, kg/m3, for the sink-condition check; null for no check.</summary>
    public double? SolubilityKgPerCubicMeter { get; init; }

    /// <summary>Fraction of the solubility above which sink conditions are taken as lost (default 0.1).</summary>
    public double SinkFraction { get; init; } = DefaultSinkFraction;

    /// <summary>The default sink fraction: 10 % of solubility (common practice, no source; some texts accept 30 %).</summary>
    public const double DefaultSinkFraction = 0.1;
}
