using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

public sealed class TemperatureStageTests
{
    [Fact]
    public void A_stage_puts_the_source_D_at_its_own_temperature_and_its_own_K_into_the_case()
    {
        // Arrhenius law D(T) = D_ref exp(-Ea/R (1/T - 1/T_ref)) (the Arrhenius equation of physical chemistry,
        // from memory). Worked by hand for D_ref = 1e-13 m2/s at 25 degC, Ea = 80 kJ/mol, T = 70 degC:
        // 1/343.15 - 1/298.15 = -4.39839e-4 1/K; x 80000 / 8.314462618 = -4.23204; exp(4.23204) = 68.8574,
        // so D = 6.88574e-12 m2/s.
        var source = new ArrheniusDiffusivity(1e-13, 298.15, 80e3);
        var stage = new TemperatureStage("hot fill", 3600, 343.15)
        {
            FacePartitionOverrides = new Dictionary<Side, double> { [Side.Right] = 3 },
        };
        var simulation = FoodCases.Film(2, [new TemperatureStage("storage", 86400, 298.15)], source);

        var staged = stage.Apply(simulation);

        Tolerance.Relative(6.88574e-12, staged.Stack.Layers[0].DiffusivitySquareMetersPerSecond, 1e-5, "D at 70 degC");
        Assert.Equal(2, staged.Stack.Layers[0].PartitionCoefficient);
        Assert.Equal(3, Assert.IsType<CompartmentFace>(staged.Right).PartitionCoefficient);
        Assert.Equal(simulation.Left, staged.Left);
    }

    [Fact]
    public void A_D_given_for_a_stage_replaces_the_source_for_that_layer_only()
    {
        // A value given for the stage is used as written, whatever the temperature (the case format's rule; common
        // practice, no source).
        var source = new GivenDiffusivity(1e-13);
        var stage = new TemperatureStage("cold", 3600, 278.15) { DiffusivityOverrides = new Dictionary<int, double> { [1] = 1e-17 } };

        Assert.Equal((1e-17, TemperatureStage.GivenForStage), stage.DiffusivityOf(1, source));
        Assert.Equal(1e-13, stage.DiffusivityOf(0, source).Value);
    }
}
