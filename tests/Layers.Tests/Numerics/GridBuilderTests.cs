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
        var grid = GridBuilder.Build(Stack, new GridOptions());

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
        var grid = GridBuilder.Build(Stack, new GridOptions { MinimumCellsPerLayer = 9 });

        Assert.All(Enumerable.Range(0, Stack.Count), layer => Assert.True(grid.CellsIn(layer) >= 9));
    }

    [Fact]
    public void Widths_are_smallest_at_both_edges_and_grow_by_at_most_the_grading_ratio()
    {
        var widths = GridBuilder.GradedWidths(1, 41, new GridOptions { GradingRatio = 1.1 });

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
    public void With_an_early_time_to_resolve_the_edge_cells_are_narrower_than_a_quarter_of_the_diffusion_length()
    {
        // docs/numerics.md, Mesh: edge cells at most a quarter of sqrt(D t) of their own layer, reached by a steeper
        // but still smooth grading (neighbours differ by at most the steepest ratio).
        var stack = new LayerStack([Cases.Layer("slow", 50e-6, 1e-16, k: 1000), Cases.Layer("fast", 30e-6, 1e-12)]);
        var grid = GridBuilder.Build(stack, new GridOptions { TotalCells = 120, ResolvedFromSeconds = 7200 });

        for (var layer = 0; layer < stack.Count; layer++)
        {
            var widths = grid.WidthsMeters.Slice(grid.FirstCell(layer), grid.CellsIn(layer)).ToArray();
            var limit = 0.25 * Math.Sqrt(stack.Layers[layer].DiffusivitySquareMetersPerSecond * 7200);
            Assert.True(widths[0] <= limit * (1 + 1e-9), $"layer {layer}: edge {widths[0]} > {limit}");
            Assert.Equal(widths[0], widths[^1], 15);
            for (var i = 1; i < widths.Length; i++)
            {
                Assert.True(Math.Max(widths[i] / widths[i - 1], widths[i - 1] / widths[i]) <= GridBuilder.SteepestGradingRatio + 1e-9);
            }
        }
    }
}
