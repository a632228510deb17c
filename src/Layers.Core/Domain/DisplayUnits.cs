using Layers.Core.Units;

namespace Layers.Core.Domain;

/// <summary>
/// The units a case was written in, kept so that human-readable output speaks the user's units.
/// The physics never reads these.
/// </summary>
public sealed record DisplayUnits
{
    /// <summary>Unit for times (the unit of the case duration).</summary>
    public UnitDefinition Time { get; init; } = UnitTable.Get("s");

    /// <summary>Unit for depths in the stack (the unit of the first layer's thickness).</summary>
    public UnitDefinition Depth { get; init; } = UnitTable.Get("m");

    /// <summary>Unit for concentrations (the unit of the first concentration the case gives in mass per volume).</summary>
    public UnitDefinition Concentration { get; init; } = UnitTable.Get("kg/m3");

    /// <summary>Unit for mass per contact area.</summary>
    public UnitDefinition MassPerArea { get; init; } = UnitTable.Get("kg/m2");
}
