using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>
/// Partition coefficients given per stage. At a stage boundary the concentrations carry over and the new K applies,
/// so the film and the food move toward the equilibrium of the new K.
/// </summary>
public sealed class StagePartitionTests
{
    private const double Day = 86400;
    private const double Diffusivity = 1e-15;

    [Fact]
    public void K_given_by_every_stage_matches_the_limited_volume_series_with_that_K()
    {
        // The case says K = 1; both stages say 1000, so the run must be the K = 1000 film:
        // Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, eq. 4.37 (from memory).
        var stages = new[] { Stage("first", 4 * Day, 1000), Stage("second", 6 * Day, 1000) };
        var simulation = FoodCases.Film(1, stages, new GivenDiffusivity(Diffusivity));

        var result = Simulator.Run(simulation);

        var expected = FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            Diffusivity, FoodCases.Thickness, FoodCases.InitialConcentration, FoodCases.VolumePerArea, 1000, 10 * Day));
        Tolerance.Relative(expected, result.FoodContact!.FinalConcentration, 1e-3, "food concentration, K = 1000 from the stages (Crank eq. 4.37)");
        Assert.True(result.WorstMassBalanceError < 1e-9, $"mass balance {result.WorstMassBalanceError}");
    }

    [Fact]
    public void Food_gives_substance_back_when_K_rises_and_ends_at_the_equilibrium_of_the_new_K()
    {
        // Stage 1 at K = 1 draws most of the substance into the food; stage 2 at K = 1000 lasts 200 diffusion times
        // of the film, long enough to reach the new equilibrium, where the food holds alpha / (1 + alpha) of the
        // mass with alpha = V_F / (K V_P): Crank (1975) ch. 4, the limit of eq. 4.37 as t -> infinity (from memory),
        // which is also plain mass balance with c_film = K c_food.
        var stages = new[] { Stage("warm", 10 * Day, 1), Stage("cold", 200 * FoodCases.Thickness * FoodCases.Thickness / 1e-13, 1000) };
        var simulation = FoodCases.Film(1, stages, new GivenDiffusivity(1e-13));

        var result = Simulator.Run(simulation);

        var alpha = FoodCases.VolumePerArea / (1000 * FoodCases.Thickness);
        var total = FoodCases.InitialConcentration * FoodCases.Thickness;
        var food = result.FoodContact!;
        Tolerance.Relative(FoodCases.FoodConcentration(total * alpha / (1 + alpha)), food.FinalConcentration, 1e-6, "equilibrium of the last stage's K");
        Assert.True(food.Stages[0].FoodConcentrationAtEnd > 3 * food.FinalConcentration, "the food must first take up far more than it keeps");
        Assert.True(result.WorstMassBalanceError < 1e-9, $"mass balance {result.WorstMassBalanceError}");
        var foodAtEquilibrium = total * alpha / (1 + alpha) / FoodCases.VolumePerArea;
        Tolerance.Relative(foodAtEquilibrium, result.FinalState.RightConcentrationKgPerCubicMeter!.Value, 1e-12, "reported final state of the food");
        Tolerance.Relative(1000 * foodAtEquilibrium, result.FinalState.LayerConcentrationsKgPerCubicMeter[0].Left, 1e-12, "reported final state of the film, K = 1000");
        Assert.NotNull(result.FinalState.System.NinetyPercent);
    }

    [Fact]
    public void Scaling_every_K_of_a_stage_by_one_factor_changes_nothing()
    {
        // K is a ratio to a reference medium, so multiplying the film's and the food's K by the same factor only
        // changes the reference: the physics, and every concentration, must stay the same (the definition of the
        // partition coefficient; common practice, no source).
        var plain = FoodCases.Film(1, [Stage("first", 3 * Day, 1), Stage("second", 7 * Day, 1)], new GivenDiffusivity(Diffusivity));
        var scaled = FoodCases.Film(
            1,
            [Stage("first", 3 * Day, 1), Stage("second", 7 * Day, 50) with { LayerPartitionOverrides = new Dictionary<int, double> { [0] = 50 }, FacePartitionOverrides = new Dictionary<Side, double> { [Side.Right] = 50 } }],
            new GivenDiffusivity(Diffusivity));

        var expected = Simulator.Run(plain).FoodContact!;
        var actual = Simulator.Run(scaled).FoodContact!;

        Tolerance.Relative(expected.FinalConcentration, actual.FinalConcentration, 1e-8, "food concentration with every K of stage 2 scaled by 50");
        Tolerance.Relative(expected.Stages[0].FoodConcentrationAtEnd, actual.Stages[0].FoodConcentrationAtEnd, 1e-12, "stage 1 is untouched");
    }

    private static TemperatureStage Stage(string name, double seconds, double filmK)
        => new(name, seconds, 298.15) { LayerPartitionOverrides = new Dictionary<int, double> { [0] = filmK } };
}
