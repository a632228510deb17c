using System.Text.Json;
using Layers.Core.Units;

namespace Layers.Core.Results;

/// <summary>
/// The catalogue of <see cref="NamedResult"/>: the name a case file uses, the dimension and SI unit (from
/// <see cref="UnitTable"/>), whether the result is read at a time, its words in tables and plots, and its column in a
/// batch summary. The switches have no fallback arm on purpose (the build treats a missing arm as an error).
/// </summary>
public static class NamedResults
{
    /// <summary>Every named result, in declaration order.</summary>
    public static IReadOnlyList<NamedResult> All { get; } = Enum.GetValues<NamedResult>();

    /// <summary>
    /// The results a batch summary lists (and a sweep can plot), in column order: every named result but the figures of
    /// one period (a batch row names no period, and a summary with a column per period and medium would be read by no
    /// one), the five that earlier summaries listed first so that their columns keep their places.
    /// </summary>
    public static IReadOnlyList<NamedResult> InBatchSummary { get; } =
    [
        NamedResult.LeftReceived, NamedResult.RightReceived, NamedResult.SteadyFlux, NamedResult.LagTime, NamedResult.TimeTo90Percent,
        NamedResult.LeftConcentration, NamedResult.RightConcentration, NamedResult.FoodConcentration, NamedResult.TimeToLimit,
    ];

    /// <summary>The case-file name of each result, e.g. <c>rightReceived</c>.</summary>
    public static IReadOnlyDictionary<string, NamedResult> ByName { get; } =
        All.ToDictionary(Name, result => result, StringComparer.Ordinal);

    /// <summary>The case-file name, e.g. <c>rightReceived</c>.</summary>
    public static string Name(NamedResult result) => JsonNamingPolicy.CamelCase.ConvertName(result.ToString());

    /// <summary>The dimension of the result, for parsing targets and limits and for its SI unit.</summary>
    public static Dimension Dimension(NamedResult result) => result switch
    {
        NamedResult.LeftReceived or NamedResult.RightReceived => Units.Dimension.MassPerArea,
        NamedResult.LeftConcentration or NamedResult.RightConcentration => Units.Dimension.MassConcentration,
        NamedResult.FoodConcentration => Units.Dimension.MassFraction,
        NamedResult.SteadyFlux => Units.Dimension.MassFlux,
        NamedResult.LagTime or NamedResult.TimeTo90Percent or NamedResult.TimeToLimit => Units.Dimension.Time,
        NamedResult.LeftPeriodReceived or NamedResult.RightPeriodReceived => Units.Dimension.MassPerArea,
        NamedResult.LeftPeriodLowestFlux or NamedResult.RightPeriodLowestFlux
            or NamedResult.LeftPeriodHighestFlux or NamedResult.RightPeriodHighestFlux => Units.Dimension.MassFlux,
        NamedResult.LeftPeriodEndConcentration or NamedResult.RightPeriodEndConcentration => Units.Dimension.MassConcentration,
    };

    /// <summary>The SI unit of the result as the unit table writes it, e.g. <c>kg/m2</c>.</summary>
    public static UnitDefinition SiUnit(NamedResult result) => UnitTable.SiUnit(Dimension(result));

    /// <summary>True for the results that are read at a time (and accept <c>at</c>); the others are single events or rates.</summary>
    public static bool IsReadAtTime(NamedResult result) => result switch
    {
        NamedResult.LeftReceived or NamedResult.RightReceived or NamedResult.LeftConcentration
            or NamedResult.RightConcentration or NamedResult.FoodConcentration => true,
        NamedResult.SteadyFlux or NamedResult.LagTime or NamedResult.TimeTo90Percent or NamedResult.TimeToLimit => false,
        NamedResult.LeftPeriodReceived or NamedResult.RightPeriodReceived or NamedResult.LeftPeriodLowestFlux
            or NamedResult.RightPeriodLowestFlux or NamedResult.LeftPeriodHighestFlux or NamedResult.RightPeriodHighestFlux
            or NamedResult.LeftPeriodEndConcentration or NamedResult.RightPeriodEndConcentration => false,
    };

    /// <summary>True for the figures of one period of a schedule (and accept <c>period</c>): read off the run's per-period outcomes.</summary>
    public static bool IsReadInPeriod(NamedResult result) => result switch
    {
        NamedResult.LeftReceived or NamedResult.RightReceived or NamedResult.LeftConcentration or NamedResult.RightConcentration
            or NamedResult.FoodConcentration or NamedResult.SteadyFlux or NamedResult.LagTime or NamedResult.TimeTo90Percent
            or NamedResult.TimeToLimit => false,
        NamedResult.LeftPeriodReceived or NamedResult.RightPeriodReceived or NamedResult.LeftPeriodLowestFlux
            or NamedResult.RightPeriodLowestFlux or NamedResult.LeftPeriodHighestFlux or NamedResult.RightPeriodHighestFlux
            or NamedResult.LeftPeriodEndConcentration or NamedResult.RightPeriodEndConcentration => true,
    };

    /// <summary>The result in words, read at the end of the duration, as a plot title names it.</summary>
    public static string Words(NamedResult result) => result switch
    {
        NamedResult.LeftReceived => "received by the left medium at the end",
        NamedResult.RightReceived => "received by the right medium at the end",
        NamedResult.LeftConcentration => "concentration in the left medium at the end",
        NamedResult.RightConcentration => "concentration in the right medium at the end",
        NamedResult.FoodConcentration => "food concentration at the end",
        NamedResult.SteadyFlux => "steady flux",
        NamedResult.LagTime => "lag time",
        NamedResult.TimeTo90Percent => "time to 90 % of the final state",
        NamedResult.TimeToLimit => "time to reach the specific migration limit",
        NamedResult.LeftPeriodReceived => "received by the left medium in one period",
        NamedResult.RightPeriodReceived => "received by the right medium in one period",
        NamedResult.LeftPeriodLowestFlux => "lowest flux into the left medium in one period",
        NamedResult.RightPeriodLowestFlux => "lowest flux into the right medium in one period",
        NamedResult.LeftPeriodHighestFlux => "highest flux into the left medium in one period",
        NamedResult.RightPeriodHighestFlux => "highest flux into the right medium in one period",
        NamedResult.LeftPeriodEndConcentration => "concentration in the left medium at the end of one period",
        NamedResult.RightPeriodEndConcentration => "concentration in the right medium at the end of one period",
    };

    /// <summary>
    /// The quantity in words without a time, for the tables and plots of studies: "mass per area received by the right
    /// medium", "lag time". A result read at a time adds its time, a figure of one period its period (see
    /// <c>ResultMeasure.Label</c>).
    /// </summary>
    public static string Quantity(NamedResult result) => result switch
    {
        NamedResult.LeftReceived => "mass per area received by the left medium",
        NamedResult.RightReceived => "mass per area received by the right medium",
        NamedResult.LeftConcentration => "concentration in the left medium",
        NamedResult.RightConcentration => "concentration in the right medium",
        NamedResult.FoodConcentration => "concentration in the food",
        NamedResult.SteadyFlux => "steady flux",
        NamedResult.LagTime => "lag time",
        NamedResult.TimeTo90Percent => "time to 90 % of the final state",
        NamedResult.TimeToLimit => "time to reach the specific migration limit",
        NamedResult.LeftPeriodReceived => "mass per area received by the left medium",
        NamedResult.RightPeriodReceived => "mass per area received by the right medium",
        NamedResult.LeftPeriodLowestFlux => "lowest flux into the left medium",
        NamedResult.RightPeriodLowestFlux => "lowest flux into the right medium",
        NamedResult.LeftPeriodHighestFlux => "highest flux into the left medium",
        NamedResult.RightPeriodHighestFlux => "highest flux into the right medium",
        NamedResult.LeftPeriodEndConcentration => "concentration in the left medium",
        NamedResult.RightPeriodEndConcentration => "concentration in the right medium",
    };

    /// <summary>A short heading for a console column, e.g. "right received".</summary>
    public static string Heading(NamedResult result) => result switch
    {
        NamedResult.LeftReceived => "left received",
        NamedResult.RightReceived => "right received",
        NamedResult.LeftConcentration => "left concentration",
        NamedResult.RightConcentration => "right concentration",
        NamedResult.FoodConcentration => "food concentration",
        NamedResult.SteadyFlux => "steady flux",
        NamedResult.LagTime => "lag time",
        NamedResult.TimeTo90Percent => "90 % time",
        NamedResult.TimeToLimit => "time to limit",
        NamedResult.LeftPeriodReceived => "left period received",
        NamedResult.RightPeriodReceived => "right period received",
        NamedResult.LeftPeriodLowestFlux => "left period trough",
        NamedResult.RightPeriodLowestFlux => "right period trough",
        NamedResult.LeftPeriodHighestFlux => "left period peak",
        NamedResult.RightPeriodHighestFlux => "right period peak",
        NamedResult.LeftPeriodEndConcentration => "left period end concentration",
        NamedResult.RightPeriodEndConcentration => "right period end concentration",
    };

    /// <summary>
    /// The key of the result in summary.csv and summary.json of a batch: name and SI unit in one word. Only the results
    /// of <see cref="InBatchSummary"/> have one; asking for a period's figure is a mistake in the caller.
    /// </summary>
    public static string SummaryKey(NamedResult result) => result switch
    {
        NamedResult.LeftReceived => "leftReceivedKgPerSquareMeter",
        NamedResult.RightReceived => "rightReceivedKgPerSquareMeter",
        NamedResult.SteadyFlux => "steadyFluxKgPerSquareMeterSecond",
        NamedResult.LagTime => "lagTimeSeconds",
        NamedResult.TimeTo90Percent => "timeTo90PercentSeconds",
        NamedResult.LeftConcentration => "leftConcentrationKgPerCubicMeter",
        NamedResult.RightConcentration => "rightConcentrationKgPerCubicMeter",
        NamedResult.FoodConcentration => "foodConcentrationKgPerKg",
        NamedResult.TimeToLimit => "timeToLimitSeconds",
        NamedResult.LeftPeriodReceived or NamedResult.RightPeriodReceived or NamedResult.LeftPeriodLowestFlux
            or NamedResult.RightPeriodLowestFlux or NamedResult.LeftPeriodHighestFlux or NamedResult.RightPeriodHighestFlux
            or NamedResult.LeftPeriodEndConcentration or NamedResult.RightPeriodEndConcentration
            => throw new ArgumentOutOfRangeException(nameof(result), result, "a period's figure is not a column of a batch summary"),
    };
}
