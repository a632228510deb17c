using Layers.Core.Domain;
using Layers.Core.FoodContact;

namespace Layers.Tests.FoodContact;

/// <summary>
/// A single film against a food in SI for the food-contact tests: 50 um film loaded at 0.92 kg/m3 (1000 mg/kg at
/// 0.92 g/cm3), 1 kg of food of density 1000 kg/m3 on 6 dm2 (the conventional ratio), the food as reference medium.
/// </summary>
internal static class FoodCases
{
    public const double Thickness = 50e-6;
    public const double InitialConcentration = 0.92;
    public const double FoodDensity = 1000;
    public const double Area = 0.06;
    public const double FoodVolume = 1e-3;
    public const double VolumePerArea = FoodVolume / Area;

    public static SimulationCase Film(
        double kFilmOverFood,
        IReadOnlyList<TemperatureStage> stages,
        DiffusivitySource source,
        double? limit = null,
        TemperatureStage? test = null,
        double foodInitial = 0,
        double initial = InitialConcentration)
    {
        var layer = new Layer("film", Thickness, source, kFilmOverFood, initial, 920);
        var food = new CompartmentFace("food", FoodVolume, Area, 1, foodInitial, null, FoodDensity);
        return new SimulationCase
        {
            Title = "film on food",
            Stack = new LayerStack([layer]),
            Left = new ClosedFace(),
            Right = food,
            DurationSeconds = stages.Sum(stage => stage.DurationSeconds),
            ReportTimesSeconds = [stages.Sum(stage => stage.DurationSeconds)],
            FoodContact = new FoodContactSettings
            {
                Stages = stages,
                FoodSide = Side.Right,
                SpecificMigrationLimit = limit,
                TestCondition = test,
            },
        };
    }

    /// <summary>Concentration in the food (kg/kg) for a mass per area that reached it (kg/m2).</summary>
    public static double FoodConcentration(double massPerArea) => massPerArea / VolumePerArea / FoodDensity;
}
