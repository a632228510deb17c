using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Simulation;

namespace Layers.Tests.FoodContact;

/// <summary>
/// No mass is lost or created between stages: the mass balance (mass now = initial mass + mass from baths) holds at
/// every output time of a three-stage run, with a bath on one face so that the bath totals must be carried across
/// stages too (conservation of mass, a consequence of the equations; no source needed).
/// </summary>
public sealed class StageMassBalanceTests
{
    private const double Day = 86400;

    [Fact]
    public void Mass_balance_holds_across_stages_with_a_bath_and_a_food()
    {
        var arrhenius = new ArrheniusDiffusivity(1e-13, 298.15, 90e3);
        var outer = new Layer("outer", 20e-6, arrhenius, 2, 0, 900);
        var core = new Layer("core", 40e-6, arrhenius, 1, 0.9, 900);
        var skin = new Layer("skin", 10e-6, arrhenius, 0.5, 0, 900);
        var stages = new[]
        {
            new TemperatureStage("fill", 2 * 3600, 343.15),
            new TemperatureStage("cold", 5 * Day, 278.15) { DiffusivityOverrides = new Dictionary<int, double> { [2] = 1e-17 } },
            new TemperatureStage("storage", 30 * Day, 298.15),
        };
        var simulation = new SimulationCase
        {
            Title = "three stages",
            Stack = new LayerStack([outer, core, skin]),
            Left = new BathFace("air side", 0.01, 1, 1e-6),
            Right = new CompartmentFace("food", 1e-3, 0.06, 1, 0, null, 1000),
            DurationSeconds = stages.Sum(stage => stage.DurationSeconds),
            ReportTimesSeconds = [2 * 3600, (2 * 3600) + (5 * Day), stages.Sum(stage => stage.DurationSeconds)],
            FoodContact = new FoodContactSettings
            {
                Stages = stages,
                FoodSide = Side.Right,
            },
        };

        var result = Simulator.Run(simulation);

        Assert.True(result.Completed);
        Assert.True(result.WorstMassBalanceError < 1e-9, $"worst mass-balance error {result.WorstMassBalanceError}");
        Assert.True(result.Reports[^1].Sample.Left!.TransferredIntoMediumPerArea != 0, "the bath must exchange mass for the check to mean anything");
        var food = result.FoodContact!;
        Assert.Equal(food.FinalConcentration, food.Stages[^1].FoodConcentrationAtEnd);
        Assert.True(food.Stages[0].FoodConcentrationAtEnd <= food.Stages[1].FoodConcentrationAtEnd);
    }
}
