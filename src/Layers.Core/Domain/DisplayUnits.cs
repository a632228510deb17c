using Layers.Core.Units;

namespace Layers.Core.Domain;

/// <summary>
/// The units results are presented in to a person: those the trade uses for the kind of case, or those the case
/// asks for in its <c>display</c> object. The physics never reads these.
/// </summary>
public sealed record DisplayUnits
{
    /// <summary>Unit for times.</summary>
    public UnitDefinition Time { get; init; } = UnitTable.Get("h");

    /// <summary>Unit for depths in the stack.</summary>
    public UnitDefinition Depth { get; init; } = UnitTable.Get("um");

    /// <summary>Unit for concentrations in mass per volume.</summary>
    public UnitDefinition Concentration { get; init; } = UnitTable.Get("mg/L");

    /// <summary>
    /// Unit for the concentration in a face medium of known density as a mass fraction (mg/kg of food), or null to
    /// show mass per volume.
    /// </summary>
    public UnitDefinition? MediumMassFraction { get; init; }

    /// <summary>
    /// Unit for concentrations inside the layers as a mass fraction (mg/kg of polymer), each layer's with its own
    /// density, when the case wrote a layer's concentration so and every layer gives its density; null to show
    /// them as mass per volume (<see cref="Concentration"/>).
    /// </summary>
    public UnitDefinition? LayerMassFraction { get; init; }

    /// <summary>
    /// Why layers written as mass fractions are shown as mass per volume (a layer without a density), for the
    /// reports to say; null otherwise.
    /// </summary>
    public string? LayerMassFractionRefused { get; init; }

    /// <summary>Unit for mass per contact area.</summary>
    public UnitDefinition MassPerArea { get; init; } = UnitTable.Get("ug/cm2");

    /// <summary>Unit for fluxes.</summary>
    public UnitDefinition Flux { get; init; } = UnitTable.Get("ug/cm2/h");
}
