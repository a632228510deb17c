using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>
/// The verdict of a result against a limit given in the case: today the food's concentration at the end against the
/// specific migration limit of a food-contact case (docs/outputs.md, "Batch summary").
/// </summary>
/// <param name="Result">Which named result is compared; read at the end of the duration.</param>
/// <param name="LimitSi">The limit in the SI unit of that result.</param>
/// <param name="ValueSi">The result, same unit.</param>
public sealed record LimitCheck(NamedResult Result, double LimitSi, double ValueSi)
{
    /// <summary>True when the result is above the limit.</summary>
    public bool Exceeded => ValueSi > LimitSi;

    /// <summary>The compared result as the summaries name it, with its SI unit: "food concentration at the end [kg/kg]".</summary>
    public string Quantity => QuantityOf(Result);

    /// <summary>
    /// The limit check of a solved case: its specific migration limit, when the case gives one, against the food at the
    /// end, or for an article tested in repeated contacts with fresh food, at the end of the judged contact.
    /// </summary>
    public static LimitCheck? Of(SimulationResult result)
        => result?.FoodContact is { SpecificMigrationLimit: { } limit } food
            ? new LimitCheck(NamedResult.FoodConcentration, limit, result.Schedule?.RepeatedUse?.JudgedValue ?? food.FinalConcentration)
            : null;

    /// <summary>The named result whose <see cref="Quantity"/> text this is, for reading a summary back; null when none.</summary>
    public static NamedResult? ParseQuantity(string text) =>
        NamedResults.All.Where(result => QuantityOf(result) == text).Select(result => (NamedResult?)result).FirstOrDefault();

    private static string QuantityOf(NamedResult result) => $"{NamedResults.Words(result)} [{NamedResults.SiUnit(result).Symbol}]";
}
