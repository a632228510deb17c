using Layers.Core.Results;
using Layers.Core.Units;

namespace Layers.Core.Batch;

/// <summary>
/// The fixed trade units of the batch summary's columns for people. A batch mixes cases, so each column keeps one
/// unit whatever the case: food contact in mg/kg and mg/dm2 (the units migration limits and tests are stated in),
/// permeation in ug/cm2, ug/cm2/h and h (those of diffusion-cell reports).
/// </summary>
public static class BatchTradeUnits
{
    /// <summary>Food concentration and its limit.</summary>
    public static UnitDefinition FoodConcentration { get; } = UnitTable.Get("mg/kg");

    /// <summary>Mass that reached the food per contact area.</summary>
    public static UnitDefinition FoodMigration { get; } = UnitTable.Get("mg/dm2");

    /// <summary>Mass received by a medium per contact area.</summary>
    public static UnitDefinition Received { get; } = UnitTable.Get("ug/cm2");

    /// <summary>Steady flux, and the lowest and highest flux of a period.</summary>
    public static UnitDefinition Flux { get; } = UnitTable.Get("ug/cm2/h");

    /// <summary>Lag time, time to 90 %, time to the limit.</summary>
    public static UnitDefinition Time { get; } = UnitTable.Get("h");

    /// <summary>Concentration in a liquid medium.</summary>
    public static UnitDefinition MediumConcentration { get; } = UnitTable.Get("mg/L");

    /// <summary>The trade unit a named result is shown in (a sweep plot's axis).</summary>
    public static UnitDefinition Of(NamedResult result) => result switch
    {
        NamedResult.LeftReceived or NamedResult.RightReceived or NamedResult.LeftPeriodReceived or NamedResult.RightPeriodReceived => Received,
        NamedResult.LeftConcentration or NamedResult.RightConcentration
            or NamedResult.LeftPeriodEndConcentration or NamedResult.RightPeriodEndConcentration => MediumConcentration,
        NamedResult.FoodConcentration => FoodConcentration,
        NamedResult.SteadyFlux or NamedResult.LeftPeriodLowestFlux or NamedResult.RightPeriodLowestFlux
            or NamedResult.LeftPeriodHighestFlux or NamedResult.RightPeriodHighestFlux => Flux,
        NamedResult.LagTime or NamedResult.TimeTo90Percent or NamedResult.TimeToLimit => Time,
    };

    /// <summary>An SI value in a trade unit; null stays null.</summary>
    public static double? In(UnitDefinition unit, double? siValue) => siValue is { } value ? unit.FromSi(value) : null;
}
