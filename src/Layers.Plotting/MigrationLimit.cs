using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Plotting;

/// <summary>
/// The specific migration limit of a food-contact result as the transfer plot draws it: a mass per contact area, and
/// the time the food reaches it as the solver located it (the same number summary.json and the console give), not
/// one read off the plotted output times.
/// </summary>
/// <param name="MassPerArea">(limit - initial fraction) x density x volume per area, kg/m2: what brings the food to the limit.</param>
/// <param name="FoodSide">The face the food touches.</param>
/// <param name="ReachedSeconds">When the food first reaches the limit, s, or null when it does not within the history.</param>
internal sealed record MigrationLimit(double MassPerArea, Side FoodSide, double? ReachedSeconds)
{
    /// <summary>The label drawn beside the line.</summary>
    public const string Label = "specific migration limit";

    /// <summary>
    /// For food renewed by a schedule (an article for repeated use), the repeated-use verdict: each fresh portion is held
    /// to the limit by its own concentration, which the cumulative amount no longer shows, so the line is drawn on the
    /// food's concentration (<see cref="FoodConcentrationKgPerCubicMeter"/>) instead; null for one contact.
    /// </summary>
    public RepeatedUseVerdict? PerContact { get; init; }

    /// <summary>The limit as the food's concentration, kg/m3 (the mass fraction times the food's density).</summary>
    public double FoodConcentrationKgPerCubicMeter { get; init; }

    /// <summary>The limit of a result with food-contact figures and a limit above the food's initial content, else null.</summary>
    public static MigrationLimit? Of(SimulationResult result)
    {
        if (result.FoodContact is not { SpecificMigrationLimit: { } limit } food
            || result.Case.Face(food.FoodSide) is not CompartmentFace compartment)
        {
            return null;
        }

        var initialFraction = compartment.InitialConcentrationKgPerCubicMeter / food.FoodDensityKgPerCubicMeter;
        var perArea = (limit - initialFraction) * food.FoodDensityKgPerCubicMeter * compartment.VolumePerAreaMeters;
        return perArea > 0
            ? new MigrationLimit(perArea, food.FoodSide, food.LimitReachedSeconds)
            {
                PerContact = result.Schedule?.RepeatedUse,
                FoodConcentrationKgPerCubicMeter = limit * food.FoodDensityKgPerCubicMeter,
            }
            : null;
    }
}
