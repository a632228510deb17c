using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Numerics;

/// <summary>
/// Hand calculations of what the assembled system tells its readers about each node: the half-cell resistance
/// h / (2 D K) of every cell, the conductance towards each neighbour or bath (a film 1/(k K) in series with the
/// half cell: the two-resistance law, Cussler, Diffusion, 3rd ed., ch. 13.2), and the concentration c = K u of the
/// node's own medium (partition equilibrium, Crank, The Mathematics of Diffusion, 2nd ed., section 3.4, from memory).
/// </summary>
public sealed class DiscreteSystemNodeMapTests
{
    private static readonly NumericsSettings FourCellsPerLayer =
        new(new CellCountMesh(8) { MinimumCellsPerLayer = 4, GradingRatio = 1 }, new SolverOptions { RelativeTolerance = 1e-6 });

    [Fact]
    public void Every_cell_carries_the_half_cell_resistance_of_its_own_layer()
    {
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            1,
            numerics: FourCellsPerLayer,
            layers: [Cases.Layer("a", 4e-6, 2e-12, k: 0.1), Cases.Layer("b", 8e-6, 1e-13, k: 50)]);
        var (system, _) = DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation));

        // R = h / (2 D K) with each cell's own width and its own layer's D and K.
        var grid = system.Grid;
        Assert.Equal(grid.CellCount, system.HalfCellResistance.Length);
        for (var cell = 0; cell < grid.CellCount; cell++)
        {
            var (diffusivity, k) = grid.LayerOfCell[cell] == 0 ? (2e-12, 0.1) : (1e-13, 50.0);
            var expected = grid.WidthsMeters[cell] / (2 * diffusivity * k);
            Assert.Equal(expected, system.HalfCellResistance[cell], expected * 1e-12);
        }
    }

    [Fact]
    public void A_node_concentration_is_the_partition_coefficient_of_its_own_medium_times_u()
    {
        var simulation = Cases.Make(
            Cases.Compartment(1e-3, k: 4),
            Cases.Closed,
            1,
            numerics: FourCellsPerLayer,
            layers: [Cases.Layer("a", 4e-6, 2e-12, k: 0.1), Cases.Layer("b", 8e-6, 1e-13, k: 50)]);
        var (system, _) = DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation));

        // Node 0 is the compartment (K = 4), then the cells of a (K = 0.1), then those of b (K = 50).
        var lastOfA = system.Grid.CellsIn(0);
        Assert.Equal(4 * 2.5, system.ConcentrationOf(0, 2.5), 1e-12);
        Assert.Equal(0.1 * 2.5, system.ConcentrationOf(1, 2.5), 1e-12);
        Assert.Equal(0.1 * 2.5, system.ConcentrationOf(lastOfA, 2.5), 1e-12);
        Assert.Equal(50 * 2.5, system.ConcentrationOf(lastOfA + 1, 2.5), 1e-12);
        Assert.Equal(50 * 2.5, system.ConcentrationOf(system.NodeCount - 1, 2.5), 1e-12);
    }

    [Fact]
    public void The_first_node_conducts_to_a_bath_through_film_and_half_cell_and_the_last_to_nothing_on_a_closed_face()
    {
        var simulation = Cases.Make(
            Cases.Bath(1, k: 0.5, film: 2e-6),
            Cases.Closed,
            1,
            numerics: FourCellsPerLayer,
            layers: [Cases.Layer("a", 4e-6, 2e-12, k: 0.1), Cases.Layer("b", 8e-6, 1e-13, k: 50)]);
        var (system, _) = DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation));

        // Film on the bath's side: 1 / (k K_bath); half cells of a: h / (2 D K) with each cell's own width.
        var first = system.Grid.WidthsMeters[0] / (2 * 2e-12 * 0.1);
        var second = system.Grid.WidthsMeters[1] / (2 * 2e-12 * 0.1);
        var toBath = 1 / ((1 / (2e-6 * 0.5)) + first);
        var withinA = 1 / (first + second);
        Assert.Equal(toBath, system.ConductanceToLeft(0), toBath * 1e-12);
        Assert.Equal(withinA, system.ConductanceToRight(0), withinA * 1e-12);
        Assert.Equal(withinA, system.ConductanceToLeft(1), withinA * 1e-12);
        Assert.Equal(0, system.ConductanceToRight(system.NodeCount - 1));
    }
}
