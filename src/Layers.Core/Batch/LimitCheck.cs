namespace Layers.Core.Batch;

/// <summary>
/// The verdict of a result against a limit given in the case. The case format has no limit key yet, so no row
/// carries one and the summary's <c>limit</c> and <c>limitVerdict</c> columns stay empty; this record is the shape
/// those columns and exit code 1 will take when the key is added (docs/outputs.md, "Batch summary").
/// </summary>
/// <param name="Quantity">Which key result is compared, e.g. <c>rightReceivedKgPerSquareMeter</c>.</param>
/// <param name="LimitSi">The limit in the SI unit of that result.</param>
/// <param name="ValueSi">The result, same unit.</param>
public sealed record LimitCheck(string Quantity, double LimitSi, double ValueSi)
{
    /// <summary>True when the result is above the limit.</summary>
    public bool Exceeded => ValueSi > LimitSi;

    /// <summary>Name of the quantity of a specific migration limit: the food's concentration at the end, kg/kg.</summary>
    public const string FoodConcentration = "food concentration at the end [kg/kg]";

    /// <summary>The limit check of a solved case: its specific migration limit, when the case gives one.</summary>
    public static LimitCheck? Of(Results.SimulationResult result)
        => result.FoodContact is { SpecificMigrationLimit: { } limit } food
            ? new LimitCheck(FoodConcentration, limit, food.FinalConcentration)
            : null;
}
