using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Numerics;

/// <summary>
/// Hand calculations of what each kind of face puts into the discrete model. The links are the two-resistance law
/// (Cussler, Diffusion, 3rd ed., ch. 13.2): the half cell h / (2 D K) and a liquid film 1 / (k K) carry the same
/// flux in series. A well-mixed compartment of volume V over the contact area A stores (V/A) K per unit area in
/// u = c / K, the mass balance of a well-stirred solution of limited volume (Crank, The Mathematics of Diffusion,
/// 2nd ed., ch. 4, section 4.3, from memory). First-order removal k V c is common practice, no source.
/// </summary>
public sealed class FaceModelTests
{
    private const double HalfCell = 2.5e5;

    [Fact]
    public void A_bath_link_conducts_the_inverse_of_the_half_cell_and_the_film_in_series_towards_the_bath_value()
    {
        var model = FaceModel.For(Cases.Bath(6, k: 0.5, film: 4e-6));

        var coupling = model.OuterCoupling(HalfCell);

        // Film 1 / (k K) = 1 / (4e-6 * 0.5) = 5e5 s/m; u_bath = c / K = 6 / 0.5 = 12 kg/m3.
        Assert.Equal(1 / (HalfCell + 5e5), coupling.Conductance, 1e-18);
        Assert.Equal(12, coupling.BathValue, 1e-12);
        Assert.False(model.AddsNode);
    }

    [Fact]
    public void A_perfectly_mixed_bath_links_through_the_half_cell_alone()
    {
        var coupling = FaceModel.For(Cases.Bath(1, k: 3)).OuterCoupling(HalfCell);

        Assert.Equal(1 / HalfCell, coupling.Conductance, 1e-18);
    }

    [Fact]
    public void A_bath_face_value_is_the_series_resistance_weighted_mean_of_the_end_cell_and_the_bath()
    {
        var model = FaceModel.For(Cases.Bath(6, k: 0.5, film: 4e-6));

        // u_f = (u_cell / R_half + u_bath / R_film) / (1 / R_half + 1 / R_film): the flux is the same across both.
        var film = 1 / (4e-6 * 0.5);
        var expected = ((2.0 / HalfCell) + (12.0 / film)) / ((1 / HalfCell) + (1 / film));
        Assert.Equal(expected, model.FaceValue(2, HalfCell, 2), 1e-12);
    }

    [Fact]
    public void A_perfectly_mixed_bath_holds_the_face_at_its_own_value()
    {
        var model = FaceModel.For(Cases.Bath(6, k: 0.5));

        Assert.Equal(12, model.FaceValue(2, HalfCell, 2), 1e-12);
    }

    [Fact]
    public void A_closed_face_adds_no_node_and_no_link_and_reads_the_end_cell_on_the_face()
    {
        var model = FaceModel.For(Cases.Closed);

        // No flux: no gradient in the half cell, so the face carries the end cell's value.
        Assert.False(model.AddsNode);
        Assert.False(model.OuterCoupling(HalfCell).Exists);
        Assert.Equal(3.5, model.FaceValue(3.5, HalfCell, 3.5));
    }

    [Fact]
    public void A_compartment_adds_one_node_storing_volume_over_area_times_K_starting_at_c_over_K()
    {
        var model = FaceModel.For(new CompartmentFace("food", 2e-4, 0.05, 4, 8, null));

        Assert.True(model.AddsNode);
        Assert.Equal(2e-4 / 0.05 * 4, model.NodeCapacity, 1e-15);
        Assert.Equal(4, model.NodePartitionCoefficient);
        Assert.Equal(8.0 / 4, model.NodeInitialValue, 1e-15);
    }

    [Fact]
    public void A_compartment_node_links_to_the_end_cell_through_the_half_cell_and_its_film_in_series()
    {
        var model = FaceModel.For(Cases.Compartment(1e-3, k: 2, film: 1e-6));

        Assert.Equal(1 / (HalfCell + (1 / (1e-6 * 2))), model.NodeConductance(HalfCell), 1e-18);
    }

    [Fact]
    public void A_compartment_face_value_is_the_series_resistance_weighted_mean_of_the_end_cell_and_the_compartment()
    {
        var model = FaceModel.For(Cases.Compartment(1e-3, k: 2, film: 1e-6));

        var film = 1 / (1e-6 * 2);
        var expected = ((1.0 / HalfCell) + (5.0 / film)) / ((1 / HalfCell) + (1 / film));
        Assert.Equal(expected, model.FaceValue(1, HalfCell, 5), 1e-12);
    }

    [Fact]
    public void First_order_removal_is_a_link_of_conductance_k_times_volume_over_area_times_K_to_a_bath_at_zero()
    {
        var removing = Cases.Compartment(1e-3, k: 2) with { RemovalRatePerSecond = 1e-4 };

        var coupling = FaceModel.For(removing).OuterCoupling(HalfCell);

        // Loss k V c per area = k (V/A) K u: a conductance k (V/A) K towards u = 0.
        Assert.Equal(1e-4 * 1e-3 * 2, coupling.Conductance, 1e-18);
        Assert.Equal(0, coupling.BathValue);
        Assert.Equal(-1e-4 * 1e-3 * 2 * 3, coupling.InflowRate(3), 1e-18);
        Assert.False(FaceModel.For(Cases.Compartment(1e-3, k: 2)).OuterCoupling(HalfCell).Exists);
    }

    [Fact]
    public void The_assembled_system_reads_its_end_nodes_and_links_from_the_two_face_models()
    {
        var simulation = Cases.Make(
            Cases.Compartment(1e-3, k: 4, c0: 2, film: 1e-6) with { RemovalRatePerSecond = 1e-5 },
            Cases.Bath(3, k: 0.5, film: 2e-6),
            1,
            numerics: new NumericsSettings(new CellCountMesh(8) { MinimumCellsPerLayer = 4, GradingRatio = 1 }, new SolverOptions { RelativeTolerance = 1e-6 }),
            layers: [Cases.Layer("a", 4e-6, 2e-12, k: 0.1), Cases.Layer("b", 8e-6, 1e-13, k: 50)]);
        var (system, initial) = DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation));

        // Node 0 is the compartment: (V/A) K = 4e-3, u0 = 2 / 4; its removal k (V/A) K towards u = 0.
        Assert.Equal(system.Grid.CellCount + 1, system.NodeCount);
        Assert.Equal(0, system.CompartmentNode(Side.Left));
        Assert.Equal(-1, system.CompartmentNode(Side.Right));
        Assert.Equal(4e-3, system.Capacity[0], 1e-15);
        Assert.Equal(0.5, initial[0], 1e-15);
        Assert.Equal(1e-5 * 4e-3, system.ConductanceToLeft(0), 1e-18);
        var firstHalfCell = system.Grid.WidthsMeters[0] / (2 * 2e-12 * 0.1);
        var toCompartment = 1 / (firstHalfCell + (1 / (1e-6 * 4)));
        Assert.Equal(toCompartment, system.ConductanceToRight(0), toCompartment * 1e-12);

        // The last cell (of b) links to the bath at u = 3 / 0.5 through its half cell and the film 1 / (k K).
        var lastHalfCell = system.Grid.WidthsMeters[^1] / (2 * 1e-13 * 50);
        var toBath = 1 / (lastHalfCell + (1 / (2e-6 * 0.5)));
        Assert.Equal(toBath, system.ConductanceToRight(system.NodeCount - 1), toBath * 1e-12);
        Assert.Equal(6, system.RightBath.BathValue, 1e-12);
    }
}
