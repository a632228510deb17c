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
        return perArea > 0 ? new MigrationLimit(perArea, food.FoodSide, food.LimitReachedSeconds) : null;
    }
}
