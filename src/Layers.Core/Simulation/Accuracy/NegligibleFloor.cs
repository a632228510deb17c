using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// The amount per area below which a figure counts as negligible: the case's own, or a default that fits the trade
/// (docs/numerics.md, "The accuracy promise").
/// </summary>
public static class NegligibleFloor
{
    /// <summary>
    /// The floor for amounts, kg/m2: the case's <see cref="NumericsSettings.NegligibleAmountPerArea"/> when given;
    /// for a food-contact case, <see cref="NumericsSettings.NegligibleFractionOfDetectionLimit"/> of the detection limit
    /// as an amount in the food; otherwise <see cref="NumericsSettings.NegligibleFractionOfContent"/> of the largest
    /// content of the run (the stack and what the media received, at any output time).
    /// </summary>
    public static double AmountPerArea(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Case.Numerics.NegligibleAmountPerArea is { } given)
        {
            return given;
        }

        if (result.FoodContact is { } food)
        {
            return NumericsSettings.NegligibleFractionOfDetectionLimit * food.DetectionLimit / food.AreaPerFoodMassSquareMetersPerKilogram;
        }

        var content = result.TimeSeries.Max(sample => sample.LayerMassPerArea.Sum()
            + Math.Abs(sample.Left?.TransferredIntoMediumPerArea ?? 0)
            + Math.Abs(sample.Right?.TransferredIntoMediumPerArea ?? 0));
        return NumericsSettings.NegligibleFractionOfContent * Math.Max(content, result.Case.Left.InitialMassPerArea + result.Case.Right.InitialMassPerArea);
    }

    /// <summary>
    /// The floor as a concentration in the medium on a side, kg/m3: the floor amount spread over the compartment
    /// (amount x contact area / volume; over the largest portion a schedule brings, the lowest concentration it can
    /// make); null for a medium whose concentration is an input (a bath) or a closed face.
    /// </summary>
    public static double? ConcentrationIn(SimulationResult result, Side side)
    {
        ArgumentNullException.ThrowIfNull(result);
        return LargestPortion(result.Case, side) is { } portion
            ? AmountPerArea(result) * portion.ContactAreaSquareMeters / portion.VolumeCubicMeters
            : null;
    }

    /// <summary>
    /// The compartment portion on a side with the largest volume per contact area (the case's own without a schedule
    /// that brings others): a given amount makes its lowest concentration there. Null for a bath or a closed face.
    /// </summary>
    internal static CompartmentFace? LargestPortion(SimulationCase simulation, Side side)
        => simulation.MediaOn(side).OfType<CompartmentFace>().MaxBy(portion => portion.VolumePerAreaMeters);

    /// <summary>
    /// True when a figure is below the floor in magnitude and not zero: such a figure has no known accuracy (the error
    /// estimate counts it as negligible), so reports for people show "&lt; floor" in its place, not its digits.
    /// </summary>
    public static bool Hides(double value, double? floor) => floor is { } level && value != 0 && Math.Abs(value) < level;

    /// <summary>
    /// The floor as people read it in "&lt; floor": rounded up to one significant digit, so that the statement stays
    /// true for every value it hides (1.4E-05 reads "&lt; 2E-05", not "&lt; 1E-05"); a floor that is one digit already,
    /// up to round-off, stays as it is.
    /// </summary>
    /// <param name="floor">The floor in the unit it is shown in, &gt; 0.</param>
    public static double RoundedUp(double floor)
    {
        if (!(floor > 0) || !double.IsFinite(floor))
        {
            return floor;
        }

        var magnitude = Math.Pow(10, Math.Floor(Math.Log10(floor)));
        return Math.Ceiling((floor / magnitude) - 1e-9) * magnitude;
    }
}
