using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>
/// The flux into a face medium is taken with the D and K of the stage its time lies in: a membrane between a source
/// bath and a food large enough to stay a sink, held at each temperature long enough to reach steady state, passes
/// Fick's steady flux D K c / L of that stage (Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, the steady
/// state of a membrane; section from memory), with D by the Arrhenius law of the case and K given for the second stage.
/// </summary>
public sealed class StageFaceFluxTests
{
    [Fact]
    public void At_the_end_of_each_steady_stage_the_face_fluxes_are_that_stages_steady_flux()
    {
        const double thickness = 20e-6, bathConcentration = 1, secondStagePartition = 2;
        var arrhenius = new ArrheniusDiffusivity(1e-13, 298.15, 90e3);
        var hot = new TemperatureStage("hot", 3600, 343.15);
        var cold = new TemperatureStage("cold", 15 * 86400, 278.15) { LayerPartitionOverrides = new Dictionary<int, double> { [0] = secondStagePartition } };
        var hotDiffusivity = arrhenius.AtTemperature(hot.TemperatureKelvin).DiffusivitySquareMetersPerSecond;
        var coldDiffusivity = arrhenius.AtTemperature(cold.TemperatureKelvin).DiffusivitySquareMetersPerSecond;

        // Each stage lasts at least 20 diffusion times L^2/D: steady to exp(-20 pi^2) of the change.
        Assert.True(hot.DurationSeconds > 20 * thickness * thickness / hotDiffusivity);
        Assert.True(cold.DurationSeconds > 20 * thickness * thickness / coldDiffusivity);
        var simulation = new SimulationCase
        {
            Title = "two steady stages",
            Stack = new LayerStack([new Layer("membrane", thickness, arrhenius, 1, 0, 900)]),
            Left = new BathFace("source", bathConcentration, 1, null),

            // 100 m of food per unit area: what it receives raises its concentration by a few 1e-6 of the source's.
            Right = new CompartmentFace("food", 6, 0.06, 1, 0, null, 1000),
            DurationSeconds = hot.DurationSeconds + cold.DurationSeconds,
            ReportTimesSeconds = [hot.DurationSeconds, hot.DurationSeconds + cold.DurationSeconds],
            FoodContact = new FoodContactSettings { Stages = [hot, cold], FoodSide = Side.Right },
        };

        var result = Simulator.Run(simulation);

        Assert.True(result.Completed, result.FailureReason);
        var hotFlux = hotDiffusivity * bathConcentration / thickness;
        var coldFlux = coldDiffusivity * secondStagePartition * bathConcentration / thickness;
        Tolerance.Relative(-hotFlux, result.Reports[0].Sample.Left!.FluxIntoMediumKgPerSquareMeterSecond, 1e-3, "into the source at the end of the hot stage");
        Tolerance.Relative(hotFlux, result.Reports[0].Sample.Right!.FluxIntoMediumKgPerSquareMeterSecond, 1e-3, "into the food at the end of the hot stage");
        Tolerance.Relative(-coldFlux, result.Reports[1].Sample.Left!.FluxIntoMediumKgPerSquareMeterSecond, 1e-3, "into the source at the end of the cold stage");
        Tolerance.Relative(coldFlux, result.Reports[1].Sample.Right!.FluxIntoMediumKgPerSquareMeterSecond, 1e-3, "into the food at the end of the cold stage");
    }
}
