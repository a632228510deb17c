using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// The figures of a result that the accuracy promise covers, each named by its path in summary.json (a test checks
/// that every path holds the same value there): amounts in every layer and medium, medium and layer-edge
/// concentrations, the flux into each medium and the concentrations at the depths the case names, at every report
/// time; times to 50/90/99 % of the final state; steady flux, flux at the end and lag
/// time; the food-contact figures; what each period of a schedule delivered.
/// </summary>
public static class KeyFigures
{
    /// <summary>The key figures of a completed result, with their floors from <paramref name="negligibleAmountPerArea"/>.</summary>
    public static IReadOnlyList<KeyFigure> Of(SimulationResult result, double negligibleAmountPerArea)
    {
        ArgumentNullException.ThrowIfNull(result);
        var figures = new List<KeyFigure>();
        var amount = negligibleAmountPerArea;
        var stack = result.Case.Stack;
        var layerConcentration = amount / stack.Layers.Sum(layer => layer.ThicknessMeters);
        var flux = amount / result.Case.DurationSeconds;

        void Series(string path, FigureKind kind, string what, double floor, Func<ReportPoint, double?> value)
        {
            for (var i = 0; i < result.Reports.Count; i++)
            {
                Add(figures, Indexed(path, i), kind, value(result.Reports[i]), what, result.Reports[i].Sample.TimeSeconds, floor);
            }
        }

        for (var layer = 0; layer < stack.Count; layer++)
        {
            var index = layer;
            var path = Indexed("$.layers", index);
            var name = stack.Layers[index].Name;
            Series(path + ".massPerAreaKgPerSquareMeter", FigureKind.Amount, name + ": mass per area", amount, report => report.Sample.LayerMassPerArea[index]);
            Series(path + ".leftEdgeConcentrationKgPerCubicMeter", FigureKind.Concentration, name + ": concentration at its left edge", layerConcentration, report => report.Profiles[index].ConcentrationsKgPerCubicMeter[0]);
            Series(path + ".rightEdgeConcentrationKgPerCubicMeter", FigureKind.Concentration, name + ": concentration at its right edge", layerConcentration, report => report.Profiles[index].ConcentrationsKgPerCubicMeter[^1]);
        }

        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var face = result.Case.Face(side);
            if (!face.IsOpen)
            {
                continue;
            }

            var path = "$.faces." + (side == Side.Left ? "left" : "right");
            FaceSample Pick(ReportPoint report) => (side == Side.Left ? report.Sample.Left : report.Sample.Right)!;
            var medium = face.MediumName;
            Series(path + ".transferredMassPerAreaKgPerSquareMeter", FigureKind.Amount, medium + ": received per area", amount, report => Pick(report).TransferredIntoMediumPerArea);
            Series(path + ".fluxIntoMediumKgPerSquareMeterSecond", FigureKind.Flux, medium + ": flux into the medium", flux, report => Pick(report).FluxIntoMediumKgPerSquareMeterSecond);
            if (NegligibleFloor.LargestPortion(result.Case, side) is { } portion)
            {
                // The floor of a concentration: the amount scale over the largest portion, the lowest concentration it makes.
                var concentration = amount * portion.ContactAreaSquareMeters / portion.VolumeCubicMeters;
                Series(path + ".concentrationKgPerCubicMeter", FigureKind.Concentration, medium + ": concentration", concentration, report => Pick(report).ConcentrationKgPerCubicMeter);
            }
        }

        var readings = result.Reports.Count > 0 ? result.Reports[0].Depths.Count : 0;
        for (var reading = 0; reading < readings; reading++)
        {
            var index = reading;
            var depth = result.Reports[0].Depths[index];
            Series(
                Indexed("$.depths", index) + ".concentrationKgPerCubicMeter",
                FigureKind.Concentration,
                string.Create(CultureInfo.InvariantCulture, $"{depth.LayerName}: concentration at {depth.DepthMeters * 1e6:G4} um"),
                layerConcentration,
                report => report.Depths[index].ConcentrationKgPerCubicMeter);
        }

        AddFinalState(figures, result);
        AddSchedule(figures, result, amount);
        if (result.Permeation is { } permeation)
        {
            Add(figures, "$.permeation.steadyFluxKgPerSquareMeterSecond", FigureKind.Flux, permeation.SteadyFluxKgPerSquareMeterSecond, "steady flux", null, flux);
            Add(figures, "$.permeation.fluxAtEndKgPerSquareMeterSecond", FigureKind.Flux, permeation.FluxAtEndKgPerSquareMeterSecond, "flux at the end", null, flux);
            Add(figures, "$.permeation.lagTimeSeconds", FigureKind.Time, permeation.LagTimeSeconds, "lag time", null, 0);
        }

        if (result.FoodContact is { } food)
        {
            var foodConcentration = amount * food.AreaPerFoodMassSquareMetersPerKilogram;
            Add(figures, "$.foodContact.finalConcentrationKgPerKg", FigureKind.Concentration, food.FinalConcentration, "food: concentration at the end", null, foodConcentration);
            Add(figures, "$.foodContact.finalMigrationKgPerSquareMeter", FigureKind.Amount, food.FinalMigrationPerArea, "food: migration per area at the end", null, amount);
            Add(figures, "$.foodContact.limitReachedSeconds", FigureKind.Time, food.LimitReachedSeconds, "time to the specific migration limit", null, 0);
            Add(figures, "$.foodContact.detectionReachedSeconds", FigureKind.Time, food.DetectionReachedSeconds, "time to the detection limit", null, 0);
            Add(figures, "$.foodContact.test.foodConcentrationKgPerKg", FigureKind.Concentration, food.Test?.FoodConcentration, "food: concentration in the test", null, foodConcentration);
        }

        return figures;
    }

    /// <summary>
    /// What each period of a schedule delivered into each compartment, its concentration at the period's end, the
    /// highest and lowest flux into it (with the flux floor of the period's length), and what renewals carried away.
    /// </summary>
    private static void AddSchedule(List<KeyFigure> figures, SimulationResult result, double amount)
    {
        if (result.Schedule is not { } schedule)
        {
            return;
        }

        var mediaBySide = new[] { result.Case.Schedule!.MediaByPeriod(Side.Left, result.Case.Left), result.Case.Schedule!.MediaByPeriod(Side.Right, result.Case.Right) };
        for (var p = 0; p < schedule.Periods.Count; p++)
        {
            var outcome = schedule.Periods[p];
            var periodFlux = amount / outcome.Period.DurationSeconds;
            for (var m = 0; m < outcome.Media.Count; m++)
            {
                var medium = outcome.Media[m];
                var path = Indexed(Indexed("$.schedule.periods", p) + ".media", m);
                var what = $"{outcome.Period.Label}: {medium.Name}";
                var end = outcome.Period.EndSeconds;
                Add(figures, path + ".receivedKgPerSquareMeter", FigureKind.Amount, medium.ReceivedKgPerSquareMeter, what + " received in the period", end, amount);
                if (mediaBySide[(int)medium.Side][p] is CompartmentFace compartment)
                {
                    Add(figures, path + ".concentrationAtEndKgPerCubicMeter", FigureKind.Concentration, medium.ConcentrationAtEndKgPerCubicMeter, what + " concentration at the end", end, amount / compartment.VolumePerAreaMeters);
                }

                Add(figures, path + ".highestFluxKgPerSquareMeterSecond", FigureKind.Flux, medium.HighestFluxKgPerSquareMeterSecond, what + " highest flux", end, periodFlux);
                Add(figures, path + ".lowestFluxKgPerSquareMeterSecond", FigureKind.Flux, medium.LowestFluxKgPerSquareMeterSecond, what + " lowest flux", end, periodFlux);
            }
        }

        for (var move = 0; move < schedule.LayerMoves.Count; move++)
        {
            Add(figures, Indexed("$.schedule.layerMoves", move) + ".takenAwayKgPerSquareMeter", FigureKind.Amount, schedule.LayerMoves[move].TakenAwayKgPerSquareMeter, schedule.LayerMoves[move].PeriodLabel + ": taken away with the layers", schedule.LayerMoves[move].TimeSeconds, amount);
        }

        for (var r = 0; r < schedule.Renewed.Count; r++)
        {
            Add(figures, Indexed("$.schedule.renewed", r) + ".carriedAwayKgPerSquareMeter", FigureKind.Amount, schedule.Renewed[r].CarriedAwayKgPerSquareMeter, schedule.Renewed[r].Name + ": carried away by renewals", null, amount);
        }
    }

    private static void AddFinalState(List<KeyFigure> figures, SimulationResult result)
    {
        var final = result.FinalState;
        foreach (var (key, what, times) in new[]
        {
            ("system", "whole system", final.System),
            ("leftCompartment", result.Case.Left.MediumName, final.LeftCompartment),
            ("rightCompartment", result.Case.Right.MediumName, final.RightCompartment),
        })
        {
            if (times is null)
            {
                continue;
            }

            var path = "$.finalState." + key;
            Add(figures, path + ".timeTo50PercentSeconds", FigureKind.Time, times.Half, what + ": time to 50 % of the final state", null, 0);
            Add(figures, path + ".timeTo90PercentSeconds", FigureKind.Time, times.NinetyPercent, what + ": time to 90 % of the final state", null, 0);
            Add(figures, path + ".timeTo99PercentSeconds", FigureKind.Time, times.NinetyNinePercent, what + ": time to 99 % of the final state", null, 0);
        }
    }

    private static void Add(List<KeyFigure> figures, string path, FigureKind kind, double? value, string what, double? atSeconds, double floor)
    {
        if (value is { } number && double.IsFinite(number))
        {
            figures.Add(new KeyFigure(path, kind, number, what, atSeconds, floor));
        }
    }

    private static string Indexed(string path, int index) => path + "[" + index.ToString(CultureInfo.InvariantCulture) + "]";
}
