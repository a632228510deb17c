using BenchmarkDotNet.Attributes;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Benchmarks;

/// <summary>
/// The 50-layer stack at 600, 1200 and 2400 cells: with O(n) work per step the time per step doubles with the
/// cells, and with no allocation in the loop the bytes allocated grow with the outputs, not with the steps. The
/// step counts are printed by the setup, so the time per step can be read off.
/// </summary>
[Config(typeof(SolveConfig))]
public class StackScalingBenchmarks
{
    private SimulationCase _case = null!;

    /// <summary>Target number of cells.</summary>
    [Params(600, 1200, 2400)]
    public int Cells { get; set; }

    /// <summary>Reads the case and prints the step count at this mesh.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var loaded = BenchmarkCases.Load("stack-50");
        _case = loaded with { Numerics = loaded.Numerics with { Grid = new CellCountMesh(Cells) } };
        Console.WriteLine($"// stack-50 at {Cells} cells: {Simulator.Run(_case).Statistics}");
    }

    /// <summary>One solve.</summary>
    [Benchmark]
    public SimulationResult Solve() => Simulator.Run(_case);
}
