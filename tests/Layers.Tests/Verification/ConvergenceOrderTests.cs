using Layers.Core.Analytics;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// Observed order of accuracy from successive refinements (the method of Roache, Verification and Validation in
/// Computational Science and Engineering, 1998, ch. 5: p = log2(e_h / e_h/2)).
/// </summary>
public sealed class ConvergenceOrderTests
{
    [Fact]
    public void Spatial_error_falls_with_the_square_of_the_cell_width_across_a_partition_jump()
    {
        // Two semi-infinite media with a partition jump: Crank, The Mathematics of Diffusion, 2nd ed., ch. 3 (section from memory).
        const double d1 = 2e-13, d2 = 5e-13, k = 4, c0 = 100, thickness = 200e-6;
        var time = Math.Pow(thickness / 8, 2) / d2;
        var expected = TwoSemiInfiniteMedia.MassPerAreaTransferred(d1, d2, k, c0, time);
        var errors = new[] { 20, 40, 80 }.Select(cells =>
        {
            var simulation = Cases.Make(
                Cases.Closed,
                Cases.Closed,
                time,
                numerics: new NumericsSettings(new CellCountMesh(2 * cells) { MinimumCellsPerLayer = cells, GradingRatio = 1 }, new SolverOptions { RelativeTolerance = 1e-10 }),
                layers: [Cases.Layer("first", thickness, d1, k, c0), Cases.Layer("second", thickness, d2)]);
            var result = Simulator.Run(simulation);
            return Math.Abs(result.Reports[^1].Sample.LayerMassPerArea[1] - expected);
        }).ToArray();

        var orders = new[] { Math.Log2(errors[0] / errors[1]), Math.Log2(errors[1] / errors[2]) };
        Assert.All(orders, order => Assert.InRange(order, 1.8, 2.3));
    }

    [Fact]
    public void Time_error_of_fixed_TR_BDF2_steps_falls_with_the_square_of_the_step()
    {
        // TR-BDF2 is second order: Bank et al., IEEE Trans. Electron Devices 32 (1985) 1992.
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Compartment(50e-6, k: 0.5),
            1,
            numerics: NumericsSettings.FixedCells(40, 1e-6),
            layers: Cases.Layer("sheet", 50e-6, 1e-13, c0: 100));
        var grid = GridBuilder.Build(simulation);
        var (system, initial) = DiffusionSystemBuilder.Build(simulation, grid);
        const double end = 2000;
        var reference = Integrate(system, initial, end, 4096);
        var errors = new[] { 16, 32, 64 }.Select(steps => Math.Abs(Integrate(system, initial, end, steps) - reference)).ToArray();

        var orders = new[] { Math.Log2(errors[0] / errors[1]), Math.Log2(errors[1] / errors[2]) };
        Assert.All(orders, order => Assert.InRange(order, 1.8, 2.3));
    }

    private static double Integrate(DiffusionSystem system, double[] initial, double end, int steps)
    {
        var stepper = new TrBdf2Stepper(system);
        var current = (double[])initial.Clone();
        var next = new double[current.Length];
        for (var i = 0; i < steps; i++)
        {
            stepper.Try(current, end / steps, next, new ErrorWeights(1, 1));
            (current, next) = (next, current);
        }

        return current[^1];
    }
}
