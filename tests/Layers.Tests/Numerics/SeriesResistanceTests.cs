using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Numerics;

/// <summary>
/// Two-cell hand calculations of the face conductance with a partition jump: the flux between two media in series is
/// (c_a/K_a - c_b/K_b) / (h_a/(2 D_a K_a) + h_b/(2 D_b K_b)), the two-resistance law (Cussler, Diffusion, 3rd ed.,
/// ch. 13.2) with half-cell distances.
/// </summary>
public sealed class SeriesResistanceTests
{
    [Fact]
    public void Conductance_between_two_one_cell_layers_is_the_inverse_of_the_two_half_cell_resistances()
    {
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            1,
            numerics: new NumericsSettings(new CellCountMesh(8) { MinimumCellsPerLayer = 4, GradingRatio = 1 }, new SolverOptions { RelativeTolerance = 1e-6 }),
            layers: [Cases.Layer("a", 4e-6, 2e-12, k: 0.1), Cases.Layer("b", 8e-6, 1e-13, k: 50)]);
        var (system, _) = DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation));

        var interfaceFace = system.Grid.CellsIn(0) - 1;
        var widthA = system.Grid.WidthsMeters[interfaceFace];
        var widthB = system.Grid.WidthsMeters[interfaceFace + 1];
        Assert.Equal(4e-6 / system.Grid.CellsIn(0), widthA, 1e-18);
        var expected = 1 / ((widthA / (2 * 2e-12 * 0.1)) + (widthB / (2 * 1e-13 * 50)));
        Assert.Equal(expected, system.Conductance[interfaceFace], expected * 1e-12);
    }

    [Fact]
    public void Film_adds_one_over_k_times_K_in_series()
    {
        Assert.Equal(1 / (3e-6 * 0.25), SeriesResistance.Film(3e-6, 0.25), 1e-3);
        Assert.Equal(0, SeriesResistance.Film(null, 0.25));
    }

    [Fact]
    public void Uniform_u_gives_zero_flux_even_across_a_large_partition_jump()
    {
        var simulation = Cases.Make(
            Cases.Closed,
            new CompartmentFace("c", 1e-3, 1, 1e-4, 1e-4 * 3, null),
            1,
            layers: [Cases.Layer("a", 1e-5, 1e-12, k: 1e4, c0: 3 * 1e4), Cases.Layer("b", 1e-5, 1e-12, k: 1e-4, c0: 3 * 1e-4)]);
        var (system, initial) = DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation));
        var rate = new double[system.NodeCount];

        system.Residual(initial, rate);

        Assert.All(rate, value => Assert.Equal(0, value, 1e-18));
    }
}
