using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;
using MathNet.Numerics.RootFinding;

namespace Layers.Tests.FoodContact;

/// <summary>Functional-barrier figures: the detection-threshold time and the lag time d^2/(6D).</summary>
public sealed class FunctionalBarrierTests
{
    private const double Day = 86400;

    [Fact]
    public void Detection_threshold_time_of_a_single_film_matches_the_root_of_the_series()
    {
        // Single film, no barrier: c_food(t) = threshold solved on Crank (1975) eq. 4.37 (from memory) with Math.NET's
        // Brent. A threshold of 1 mg/kg (of at most 2.76 mg/kg) is reached at D t / L^2 of about 0.2; the default
        // 0.01 mg/kg would be reached at D t / L^2 near 1e-5, where the mesh, not the root finder, limits accuracy.
        const double diffusivity = 1e-16;
        var simulation = FoodCases.Film(1, [new TemperatureStage("storage", 30 * Day, 298.15)], new GivenDiffusivity(diffusivity));
        simulation = simulation with { FoodContact = simulation.FoodContact! with { DetectionLimit = 1e-6 } };

        var result = Simulator.Run(simulation).FoodContact!;

        double Excess(double days) => (FoodCases.FoodConcentration(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            diffusivity, FoodCases.Thickness, FoodCases.InitialConcentration, FoodCases.VolumePerArea, 1, days * Day)) / 1e-6) - 1;
        var expected = Brent.FindRoot(Excess, 1e-9, 30, 1e-10) * Day;
        Tolerance.Relative(expected, result.DetectionReachedSeconds!.Value, 1e-3, "time to 1 mg/kg");
    }

    [Fact]
    public void Barrier_lag_is_thickness_squared_over_six_D_for_the_layer_between_source_and_food()
    {
        // Daynes-Barrer time lag of a membrane, L^2/(6D) (Crank 1975, ch. 4, eq. 4.24a, from memory):
        // 12 um, D = 1e-17 m2/s: (12e-6)^2 / 6e-17 = 1.44e-10 / 6e-17 = 2.4e6 s (27.8 d).
        var core = new Layer("core", 40e-6, 1e-13, 1, 0.92, 920);
        var barrier = new Layer("barrier", 12e-6, 1e-17, 1, 0, 1380);
        var food = new CompartmentFace("food", 1e-3, 0.06, 1, 0, null, 1000);
        var stage = new TemperatureStage("storage", 60 * Day, 298.15);
        var simulation = new SimulationCase
        {
            Title = "barrier",
            Stack = new LayerStack([core, barrier]),
            Left = new ClosedFace(),
            Right = food,
            DurationSeconds = 60 * Day,
            ReportTimesSeconds = [60 * Day],
            FoodContact = new FoodContactSettings
            {
                Stages = [stage],
                FoodSide = Side.Right,
            },
        };

        var result = Simulator.Run(simulation).FoodContact!;

        var lag = Assert.Single(result.BarrierLags);
        Assert.Equal("barrier", lag.Layer);
        Tolerance.Relative(2.4e6, lag.Seconds, 1e-12, "d^2/(6D)");
        Assert.NotNull(result.DetectionReachedSeconds);
        Assert.InRange(result.DetectionReachedSeconds!.Value, 1, 60 * Day);
    }
}
