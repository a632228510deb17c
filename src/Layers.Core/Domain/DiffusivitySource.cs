using System.Globalization;
using Layers.Core.FoodContact;

namespace Layers.Core.Domain;

/// <summary>
/// Where a layer's diffusion coefficient comes from and how it depends on temperature. Reports print
/// <see cref="Describe"/> for every layer, so that a reader sees which numbers were given and which estimated.
/// </summary>
public abstract record DiffusivitySource
{
    private protected DiffusivitySource()
    {
    }

    /// <summary>Short kind name for summary.json: "given", "arrhenius" or "upperBoundEstimate".</summary>
    public abstract string KindName { get; }

    /// <summary>The diffusion coefficient at a temperature, m2/s.</summary>
    public abstract double At(double temperatureKelvin);

    /// <summary>One line for reports saying where the value comes from.</summary>
    public abstract string Describe();

    /// <summary>Where the value comes from in one word (<see cref="DiffusivityOrigins"/>).</summary>
    public abstract string Origin { get; init; }

    /// <summary>
    /// This source as a constant at a temperature: itself when it is constant already (its origin kept), else its
    /// value there.
    /// </summary>
    public virtual GivenDiffusivity AtTemperature(double temperatureKelvin) => new(At(temperatureKelvin)) { Origin = Origin };
}

/// <summary>A diffusion coefficient given in the case and used unchanged at every temperature.</summary>
/// <param name="DiffusivitySquareMetersPerSecond">D, m2/s.</param>
public sealed record GivenDiffusivity(double DiffusivitySquareMetersPerSecond) : DiffusivitySource
{
    /// <inheritdoc />
    public override string KindName => "given";

    /// <inheritdoc />
    public override double At(double temperatureKelvin) => DiffusivitySquareMetersPerSecond;

    /// <inheritdoc />
    public override string Describe() => $"{Origin}; the same at every temperature";

    /// <summary>What the case says of the value: <c>given</c>, <c>measured</c> or <c>fitted</c>.</summary>
    public override string Origin { get; init; } = DiffusivityOrigins.Given;

    /// <inheritdoc />
    public override GivenDiffusivity AtTemperature(double temperatureKelvin) => this;
}

/// <summary>A diffusion coefficient given at a reference temperature with an activation energy.</summary>
/// <param name="ReferenceDiffusivity">D at the reference temperature, m2/s.</param>
/// <param name="ReferenceKelvin">Reference temperature, K.</param>
/// <param name="ActivationEnergyJoulesPerMole">Activation energy, J/mol.</param>
public sealed record ArrheniusDiffusivity(
    double ReferenceDiffusivity, double ReferenceKelvin, double ActivationEnergyJoulesPerMole) : DiffusivitySource
{
    /// <inheritdoc />
    public override string KindName => "arrhenius";

    /// <inheritdoc />
    public override double At(double temperatureKelvin)
        => ReferenceDiffusivity * Arrhenius.Factor(ActivationEnergyJoulesPerMole, temperatureKelvin, ReferenceKelvin);

    /// <inheritdoc />
    public override string Describe() => string.Create(
        CultureInfo.InvariantCulture,
        $"{Origin} at {ReferenceKelvin - 273.15:0.##} degC, Arrhenius with Ea = {ActivationEnergyJoulesPerMole / 1e3:0.##} kJ/mol");

    /// <summary>What the case says of the value at the reference temperature: <c>given</c>, <c>measured</c> or <c>fitted</c>.</summary>
    public override string Origin { get; init; } = DiffusivityOrigins.Given;
}

/// <summary>The upper-bound estimate of <see cref="UpperBoundDiffusivity"/> for a polymer and a migrant.</summary>
/// <param name="Polymer">The polymer's constants, with their source.</param>
/// <param name="RelativeMolarMass">Relative molar mass of the migrant, g/mol as a plain number.</param>
public sealed record EstimatedDiffusivity(PolymerConstants Polymer, double RelativeMolarMass) : DiffusivitySource
{
    /// <inheritdoc />
    public override string KindName => "upperBoundEstimate";

    /// <inheritdoc />
    public override string Origin { get; init; } = DiffusivityOrigins.Estimated;

    /// <inheritdoc />
    public override double At(double temperatureKelvin)
        => UpperBoundDiffusivity.SquareMetersPerSecond(Polymer, RelativeMolarMass, temperatureKelvin);

    /// <inheritdoc />
    public override string Describe() => string.Create(
        CultureInfo.InvariantCulture,
        $"estimated (upper bound) for {Polymer.Name}, Mr = {RelativeMolarMass:0.##}, A_P' = {Polymer.APrime:0.###}, tau = {Polymer.TauKelvin:0.#} K ({(Polymer.Verified ? "constants checked" : "constants UNVERIFIED, from memory")}: {Polymer.Source})");
}
