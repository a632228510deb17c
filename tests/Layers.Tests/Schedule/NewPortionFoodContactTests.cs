using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Food contact with portions of food that change during the run: a renewal inside a stage that gives the food its
/// own K, and a later portion of another mass. What each portion holds is checked by the mass balance (what the
/// renewals carried away is what the portions held at their ends, and everything adds up to the initial content;
/// common practice, no source), and every food figure reads the portion in contact.
/// </summary>
public sealed class NewPortionFoodContactTests
{
    [Fact]
    public void A_renewal_inside_a_stage_that_gives_the_food_its_own_K_keeps_the_mass_balance()
    {
        // Renewals at 5 d (the stage boundary) and 10 d (inside the stage with K of its own).
        var result = Run("""
            "stages": [
              { "name": "first", "duration": "5 d", "temperature": "40 degC" },
              { "name": "second", "duration": "10 d", "temperature": "40 degC", "partitionCoefficients": { "simulant": 3 } } ]
            """, """[ { "name": "contact", "duration": "5 d", "renew": ["right"], "repeat": 3 } ]""");

        var schedule = result.Schedule!;
        var volumePerArea = 1e-3 / 0.06;
        var held = schedule.Periods.SkipLast(1).Sum(period => period.Media.Single().ConcentrationAtEndKgPerCubicMeter * volumePerArea);
        Tolerance.Relative(held, schedule.Renewed.Single().CarriedAwayKgPerSquareMeter, 1e-12, "carried away is what the portions held");
        var end = result.TimeSeries.Single(sample => Math.Abs(sample.TimeSeconds - result.Case.DurationSeconds) <= 1e-9 * result.Case.DurationSeconds);
        var initial = 500e-6 * 900 * 50e-6;
        Tolerance.Relative(initial, end.LayerMassPerArea.Sum() + (end.Right!.ConcentrationKgPerCubicMeter * volumePerArea) + held, 1e-10, "mass balance");
        foreach (var (period, contact) in schedule.Periods.Zip(schedule.RepeatedUse!.Contacts))
        {
            Tolerance.Relative(period.Media.Single().ConcentrationAtEndKgPerCubicMeter / 1000, contact, 1e-12, $"food in {period.Period.Label}");
        }
    }

    [Fact]
    public void A_later_portion_of_another_mass_is_what_every_food_figure_reads()
    {
        var result = Run(
            """ "stages": [ { "name": "test", "duration": "15 d", "temperature": "40 degC" } ] """,
            """
            [ { "name": "contact", "duration": "5 d", "renew": ["right"], "repeat": 2 },
              { "name": "large portion", "duration": "5 d", "renew": [ { "face": "right", "mass": "2.5 kg" } ] } ]
            """);

        var schedule = result.Schedule!;
        var last = schedule.Periods[^1].Media.Single();
        var food = result.FoodContact!;
        Tolerance.Relative(last.ConcentrationAtEndKgPerCubicMeter / 1000, food.FinalConcentration, 1e-12, "food concentration at the end");
        Tolerance.Relative(last.ReceivedKgPerSquareMeter, food.FinalMigrationPerArea, 1e-10, "migration per area into the last portion");
        Tolerance.Relative(0.06 / 2.5, food.AreaPerFoodMassSquareMetersPerKilogram, 1e-12, "area per food mass of the last portion");

        // The verdict's migration per contact is what each fresh portion received (each starts free of the substance).
        var verdict = schedule.RepeatedUse!;
        foreach (var (period, migration) in schedule.Periods.Zip(verdict.ContactMigrationKgPerSquareMeter))
        {
            Tolerance.Relative(period.Media.Single().ReceivedKgPerSquareMeter, migration, 1e-10, $"migration in {period.Period.Label}");
        }
    }

    [Fact]
    public void A_stage_reports_the_food_at_its_own_end_when_the_schedule_splits_it()
    {
        // A film kept in a reel for 5 d, then filled: the one temperature stage is run in two parts, and its report reads
        // the food at its end, not at the end of the first part (where the food, out of contact, holds nothing).
        var result = Run(
            """ "stages": [ { "name": "storage", "duration": "15 d", "temperature": "40 degC" } ] """,
            """[ { "name": "reel", "duration": "5 d", "close": ["right"] }, { "name": "filled", "duration": "10 d", "open": ["right"] } ]""");

        var food = result.FoodContact!;
        Assert.True(food.FinalConcentration > 0);
        Assert.Equal(food.FinalConcentration, food.Stages.Single().FoodConcentrationAtEnd);
    }

    [Theory]
    [InlineData("0 mg/L")]
    [InlineData("0.2 mg/L")]
    public void The_maximum_loading_brings_the_judged_contact_to_the_limit(string freshFood)
    {
        // Fick's law is linear in the initial state and each fresh portion comes at a fixed concentration, so the judged
        // (third of five) contact is affine in the loading: loaded at the reported maximum it sits on the limit.
        const string stages = """ "stages": [ { "name": "test", "duration": "25 d", "temperature": "40 degC" } ] """;
        const string schedule = """[ { "name": "contact", "duration": "5 d", "renew": ["right"], "repeat": 5 } ]""";
        var first = Run(stages, schedule, freshFood: freshFood);
        var loading = first.FoodContact!.MaximumLoading!;
        Assert.Equal(3, first.Schedule!.RepeatedUse!.JudgedContact);
        Assert.Equal(freshFood == "0 mg/L", loading.OffsetConcentration == 0);

        var again = Run(stages, schedule, freshFood: freshFood, loading: $"{loading.Layers[0].KgPerCubicMeter * 1e3:R} mg/L");

        Tolerance.Relative(60e-6, again.Schedule!.RepeatedUse!.JudgedValue, 1e-6, "judged contact at the maximum loading");
    }

    private static SimulationResult Run(string stages, string schedule, string freshFood = "0 mg/L", string loading = "500 mg/kg")
    {
        var json = $$"""
            {
              "layers": [ { "name": "source", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "{{loading}}", "density": "0.9 g/cm3" } ],
              "left": { "kind": "closed" },
              "right": { "kind": "compartment", "name": "simulant", "mass": "1 kg", "density": "1 g/cm3", "area": "6 dm2", "initialConcentration": "{{freshFood}}" },
              "schedule": {{schedule}},
              "foodContact": { {{stages}}, "specificMigrationLimit": "60 mg/kg" }
            }
            """;
        var read = CaseJson.Read(json);
        Assert.Empty(CaseJson.ErrorLines(read));
        var result = Simulator.Run(read.Case!);
        Assert.True(result.Completed, result.FailureReason);
        return result;
    }
}
