using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;
using MathNet.Numerics.RootFinding;

namespace Layers.Tests.FoodContact;

/// <summary>
/// Food-contact runs of a single film against a finite, well-mixed food, checked against the plane sheet in a
/// stirred solution of limited volume: Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, eq. 4.37 (from
/// memory), the solution the EU migration-modelling guidance uses for a single layer (JRC EUR 27529 EN, 2015).
/// </summary>
public sealed class FoodContactVerificationTests
{
    private const double Hour = 3600;
    private const double Day = 86400;

    [Theory]
    [InlineData(1.0)]
    [InlineData(1000.0)]
    public void Film_against_a_finite_food_matches_the_limited_volume_series(double kFilmOverFood)
    {
        // K = 1 (migrant dissolves well in the food) and K = 1000 (poorly): the two worst-case conventions.
        const double diffusivity = 1e-14;
        var stage = new TemperatureStage("storage", 10 * Day, 298.15);
        var simulation = FoodCases.Film(kFilmOverFood, [stage], new GivenDiffusivity(diffusivity));

        var result = Simulator.Run(simulation).FoodContact!;

        var expected = FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            diffusivity, FoodCases.Thickness, FoodCases.InitialConcentration, FoodCases.VolumePerArea, kFilmOverFood, 10 * Day));
        Tolerance.Relative(expected, result.FinalConcentration, 1e-3, $"food concentration, K = {kFilmOverFood} (Crank eq. 4.37)");
        Tolerance.Relative(expected * FoodCases.VolumePerArea * FoodCases.FoodDensity, result.FinalMigrationPerArea, 1e-3, "migration per area");
    }

    [Fact]
    public void Two_temperature_stages_equal_one_stage_with_the_diffusivity_weighted_time()
    {
        // Linearity with constant K: time enters only as integral D dt, so 2 h at 70 C then 5 d at 25 C give the
        // single-stage solution at tau = (D70 x 2 h + D25 x 5 d) / L^2 (a consequence of the equation, no source).
        var source = new ArrheniusDiffusivity(2e-14, 298.15, 80e3);
        var stages = new[] { new TemperatureStage("hot fill", 2 * Hour, 343.15), new TemperatureStage("storage", 5 * Day, 298.15) };
        var simulation = FoodCases.Film(1, stages, source);

        var result = Simulator.Run(simulation).FoodContact!;

        var d70 = 2e-14 * Math.Exp(-80e3 / 8.314462618 * ((1 / 343.15) - (1 / 298.15)));
        var equivalentSeconds = ((d70 * 2 * Hour) + (2e-14 * 5 * Day)) / 2e-14;
        var expected = FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            2e-14, FoodCases.Thickness, FoodCases.InitialConcentration, FoodCases.VolumePerArea, 1, equivalentSeconds));
        Tolerance.Relative(expected, result.FinalConcentration, 1e-3, "two-stage history vs D-weighted time");
        var afterFill = FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            d70, FoodCases.Thickness, FoodCases.InitialConcentration, FoodCases.VolumePerArea, 1, 2 * Hour));
        Tolerance.Relative(afterFill, result.Stages[0].FoodConcentrationAtEnd, 1e-3, "food concentration at the end of the hot fill");
    }

    [Fact]
    public void Time_the_limit_is_reached_matches_the_root_of_the_series()
    {
        // The film holds 0.92 kg/m3 x 50 um = 4.6e-5 kg/m2, at most 2.76 mg/kg in the food; 2 mg/kg is reached part-way.
        const double diffusivity = 1e-14;
        var simulation = FoodCases.Film(1, [new TemperatureStage("storage", 30 * Day, 298.15)], new GivenDiffusivity(diffusivity), limit: 2e-6) with { Numerics = Cases.FixedFineMesh };

        var result = Simulator.Run(simulation).FoodContact!;

        // Root of c_food(t) / 2 mg/kg - 1 on the series (Crank eq. 4.37), by Math.NET's Brent method, time in days.
        double Excess(double days) => (FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            diffusivity, FoodCases.Thickness, FoodCases.InitialConcentration, FoodCases.VolumePerArea, 1, days * Day)) / 2e-6) - 1;
        var expected = Brent.FindRoot(Excess, 1e-6, 30, 1e-10) * Day;
        Assert.NotNull(result.LimitReachedSeconds);
        Tolerance.Relative(expected, result.LimitReachedSeconds!.Value, 1e-4, "time the limit is reached");
        Assert.False(result.MeetsLimit);
    }

    [Theory]
    [InlineData(1.0)]
    [InlineData(1000.0)]
    public void Time_the_detection_limit_is_reached_long_before_the_first_report_matches_the_root_of_the_series(double kFilmOverFood)
    {
        // At the default accuracy: 0.01 mg/kg in the food is reached within seconds of a 10 d run reported at its end, and
        // the mesh resolves that time too.
        const double diffusivity = 1e-14;
        var result = Simulator.Run(FoodCases.Film(kFilmOverFood, [new TemperatureStage("storage", 10 * Day, 298.15)], new GivenDiffusivity(diffusivity)));
        var food = result.FoodContact!;

        // Root of c_food(t) / detection limit - 1 on the series (Crank eq. 4.37, with its short-time form 4.38; from
        // memory), by Math.NET's Brent method, time in seconds.
        double Excess(double seconds) => (FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            diffusivity, FoodCases.Thickness, FoodCases.InitialConcentration, FoodCases.VolumePerArea, kFilmOverFood, seconds)) / food.DetectionLimit) - 1;
        var expected = Brent.FindRoot(Excess, 1e-6, 10 * Day, 1e-12);
        Assert.True(expected < 1e-4 * result.Case.DurationSeconds);
        Tolerance.Relative(expected, food.DetectionReachedSeconds!.Value, 1e-3, "time the detection limit is reached");
        Assert.DoesNotContain(result.NumericalError!.AboveAccuracy, error => error.Figure.Path == "$.foodContact.detectionReachedSeconds");
    }

    [Fact]
    public void Maximum_initial_concentration_meets_the_limit_exactly_when_used()
    {
        // Linearity in the initial concentration (the food and other layers start empty): a run loaded at the
        // reported maximum ends exactly at the limit.
        var stages = new[] { new TemperatureStage("storage", 20 * Day, 298.15) };
        var source = new GivenDiffusivity(1e-14);
        var first = Simulator.Run(FoodCases.Film(1, stages, source, limit: 1e-6)).FoodContact!;
        var loading = first.MaximumLoading!;
        Assert.Equal(0, loading.OffsetConcentration);

        var again = Simulator.Run(FoodCases.Film(1, stages, source, limit: 1e-6, initial: loading.Layers[0].KgPerCubicMeter)).FoodContact!;

        Tolerance.Relative(1e-6, again.FinalConcentration, 1e-6, "food concentration at the maximum loading");
    }

    [Fact]
    public void Maximum_initial_concentration_solves_the_affine_relation_when_the_food_starts_loaded()
    {
        var stages = new[] { new TemperatureStage("storage", 20 * Day, 298.15) };
        var source = new GivenDiffusivity(1e-14);
        var foodStart = 0.2e-6 * FoodCases.FoodDensity; // 0.2 mg/kg already in the food
        var first = Simulator.Run(FoodCases.Film(1, stages, source, limit: 1e-6, foodInitial: foodStart)).FoodContact!;
        var loading = first.MaximumLoading!;
        Assert.True(loading.OffsetConcentration > 0);

        var again = Simulator.Run(FoodCases.Film(1, stages, source, limit: 1e-6, foodInitial: foodStart, initial: loading.Layers[0].KgPerCubicMeter)).FoodContact!;

        Tolerance.Relative(1e-6, again.FinalConcentration, 1e-6, "food concentration at the maximum loading, food loaded at start");
    }

    [Fact]
    public void Hotter_test_covers_the_shelf_life_by_model_and_by_rule_and_a_short_cold_one_does_not()
    {
        var source = new ArrheniusDiffusivity(1e-15, 298.15, 80e3);
        var shelf = new[] { new TemperatureStage("storage", 180 * Day, 298.15) };
        var hot = Simulator.Run(FoodCases.Film(1, shelf, source, test: new TemperatureStage("test", 10 * Day, 333.15))).FoodContact!;
        var cold = Simulator.Run(FoodCases.Film(1, shelf, source, test: new TemperatureStage("test", 10 * Day, 313.15))).FoodContact!;

        // With Ea = 80 kJ/mol for D as well, the model and the rule agree: 10 d at 60 C ~ 297 d at 25 C > 180 d;
        // 10 d at 40 C ~ 47 d < 180 d (EU Regulation 10/2011 Annex V; values computed by hand in ArrheniusEquivalenceTests).
        Assert.True(hot.Test!.CoversByModel(hot.FinalConcentration));
        Assert.True(hot.Test.CoversByRule);
        Assert.False(cold.Test!.CoversByModel(cold.FinalConcentration));
        Assert.False(cold.Test.CoversByRule);
        var expected = FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            1e-15 * Math.Exp(-80e3 / 8.314462618 * ((1 / 333.15) - (1 / 298.15))), FoodCases.Thickness, FoodCases.InitialConcentration,
            FoodCases.VolumePerArea, 1, 10 * Day));
        Tolerance.Relative(expected, hot.Test.FoodConcentration, 1e-3, "test migration (Crank eq. 4.37 at the test's D)");
    }
}
