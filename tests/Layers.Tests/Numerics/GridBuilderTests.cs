using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Numerics;

/// <summary>Mesh rules (common practice, no source: faces on interfaces, widths summing to each thickness).</summary>
public sealed class GridBuilderTests
{
    private static readonly LayerStack Stack = new(
    [
        Cases.Layer("thin", 1e-6, 1e-12),
        Cases.Layer("thick", 500e-6, 1e-12),
        Cases.Layer("middle", 40e-6, 1e-12),
    ]);

    [Fact]
    public void Cells_of_each_layer_sum_to_its_thickness_and_faces_fall_on_interfaces()
    {
        var grid = GridBuilder.Build(Stack, new CellCountMesh(240));

        for (var layer = 0; layer < Stack.Count; layer++)
        {
            var widths = grid.WidthsMeters.Slice(grid.FirstCell(layer), grid.CellsIn(layer)).ToArray();
            Assert.Equal(Stack.Layers[layer].ThicknessMeters, widths.Sum(), 1e-18);
            var firstCentre = grid.CentresMeters[grid.FirstCell(layer)];
            Assert.Equal(Stack.LeftEdgeMeters(layer) + (0.5 * widths[0]), firstCentre, 1e-15);
        }
    }

    [Fact]
    public void Every_layer_gets_at_least_the_minimum_number_of_cells()
    {
        var grid = GridBuilder.Build(Stack, new CellCountMesh(240) { MinimumCellsPerLayer = 9 });

        Assert.All(Enumerable.Range(0, Stack.Count), layer => Assert.True(grid.CellsIn(layer) >= 9));
    }

    [Fact]
    public void Widths_are_smallest_at_both_edges_and_grow_by_at_most_the_grading_ratio()
    {
        var widths = GridBuilder.GradedWidths(1, 41, new CellCountMesh(240) { GradingRatio = 1.1 });

        Assert.Equal(widths[0], widths[^1], 15);
        Assert.Equal(widths.Min(), widths[0]);
        for (var i = 1; i < widths.Length; i++)
        {
            var ratio = Math.Max(widths[i] / widths[i - 1], widths[i - 1] / widths[i]);
            Assert.True(ratio <= 1.1 + 1e-12);
        }

        Assert.True(widths.Max() / widths.Min() <= 20 + 1e-9);
    }

    [Fact]
    public void By_diffusion_length_the_edge_cells_are_the_fraction_of_sqrt_D_t_and_grow_by_one_plus_it()
    {
        // docs/numerics.md, "Choosing the accuracy" (common practice, no source: a mesh graded geometrically from the
        // edges, width proportional to the distance from the edge, resolves the self-similar early profile).
        var mesh = new DiffusionLengthMesh(0.05, 4);
        const double thickness = 80e-6, diffusivity = 3e-13, earliest = 2600;

        var widths = mesh.Widths(thickness, diffusivity, share: 1, earliest, resolveStart: true, resolveEnd: true);

        Assert.Equal(thickness, widths.Sum(), 1e-18);
        var edge = 0.05 * Math.Sqrt(diffusivity * earliest);
        Assert.InRange(widths[0], 0.9 * edge, edge * (1 + 1e-12));
        Assert.Equal(widths[0] / edge, widths[^1] / edge, 12);
        for (var i = 1; i < widths.Length; i++)
        {
            var ratio = Math.Max(widths[i] / widths[i - 1], widths[i - 1] / widths[i]);
            Assert.True(ratio <= 1.05 + 1e-9, $"cells {i - 1} and {i}: ratio {ratio}");
        }

        // A layer holding a quarter of what moves gets cells twice as wide relative to its diffusion length.
        var quarter = mesh.Widths(thickness, diffusivity, share: 0.25, earliest, resolveStart: true, resolveEnd: true);
        Assert.InRange(quarter[0], 0.9 * 2 * edge, 2 * edge * (1 + 1e-12));
    }

    [Fact]
    public void By_diffusion_length_a_closed_face_gets_no_small_cells_and_open_edges_do()
    {
        var stack = new LayerStack([Cases.Layer("loaded", 50e-6, 8e-14, c0: 1), Cases.Layer("skin", 10e-6, 1e-15)]);
        var simulation = Cases.Make(Cases.Closed, Cases.Bath(0), 86400, numerics: NumericsSettings.Default with { Grid = new DiffusionLengthMesh(0.05, 4) }, layers: [.. stack.Layers]);

        var grid = GridBuilder.Build(simulation);

        var loaded = grid.WidthsMeters.Slice(grid.FirstCell(0), grid.CellsIn(0)).ToArray();
        var skin = grid.WidthsMeters.Slice(grid.FirstCell(1), grid.CellsIn(1)).ToArray();
        Assert.Equal(50e-6, loaded.Sum(), 1e-18);
        Assert.Equal(10e-6, skin.Sum(), 1e-18);
        Assert.Equal(loaded.Max(), loaded[0]);
        Assert.Equal(loaded.Min(), loaded[^1]);
        Assert.True(skin[0] < skin[skin.Length / 2] && skin[^1] < skin[skin.Length / 2], "both edges of the inner layer are fine");
    }
}
