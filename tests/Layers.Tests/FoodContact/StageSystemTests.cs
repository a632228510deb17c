using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>A run as a list of stages on one grid, a plain case included.</summary>
public sealed class StageSystemTests
{
    private const double Day = 86400;

    [Fact]
    public void A_plain_case_is_one_stage_spanning_its_duration_on_the_system_built_once()
    {
        // A case without a temperature history is solved at one set of coefficients over its duration (the case
        // format's rule; common practice, no source).
        var simulation = Cases.Make(Cases.Closed, Cases.Compartment(0.01), 5 * Day, layers: Cases.Layer("film", 50e-6, 1e-13, 2, 1));
        var grid = GridBuilder.Build(simulation);
        var own = DiffusionSystemBuilder.Build(simulation, grid).System;

        var stage = Assert.Single(StageSystem.For(simulation, grid, own));

        var only = Assert.Single(simulation.Stages);
        Assert.Equal(5 * Day, only.DurationSeconds);
        Assert.False(only.HasPartitionOverrides);
        Assert.Empty(only.DiffusivityOverrides);
        Assert.Equal(0, stage.StartSeconds);
        Assert.Equal(5 * Day, stage.EndSeconds);
        Assert.Same(own, stage.System);
        Assert.Null(stage.ToStage);
        Assert.Equal(simulation.Stack.Layers[0], stage.Case.Stack.Layers[0]);
    }

    [Fact]
    public void The_storage_ratio_is_K_case_over_K_stage_at_every_node_and_keeps_the_mass()
    {
        // A concentration carries over unchanged when K changes, so u = c/K is scaled by K_case / K_stage and the
        // mass, storage (size x K) times u, is the same on both sides of the stage boundary (mass conservation;
        // common practice, no source). The case says film K = 2, food K = 1; the second stage says 50 and 3.
        var stages = new[]
        {
            new TemperatureStage("first", Day, 298.15),
            new TemperatureStage("second", Day, 298.15)
            {
                LayerPartitionOverrides = new Dictionary<int, double> { [0] = 50 },
                FacePartitionOverrides = new Dictionary<Side, double> { [Side.Right] = 3 },
            },
        };
        var simulation = FoodCases.Film(2, stages, new GivenDiffusivity(1e-14));
        var grid = GridBuilder.Build(simulation);
        var (own, initial) = DiffusionSystemBuilder.Build(simulation, grid);

        var staged = StageSystem.For(simulation, grid, own);

        Assert.Same(own, staged[0].System);
        Assert.Null(staged[0].ToStage);
        var ratio = staged[1].ToStage!;
        for (var n = 0; n < grid.CellCount; n++)
        {
            Assert.Equal(2.0 / 50, ratio[n], 15);
        }

        Assert.Equal(1.0 / 3, ratio[^1], 15);
        var state = initial.Select((u, n) => u + (1e-3 * n)).ToArray();
        var before = own.TotalMass(state);
        staged[1].IntoStage(state);
        Tolerance.Relative(before, staged[1].System.TotalMass(state), 1e-14, "mass across the change of K");
    }
}
