using BenchmarkDotNet.Attributes;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Benchmarks;

/// <summary>One warm solve of each fixed case in cases/, at the case's own settings (defaults), through Simulator.Run.</summary>
[Config(typeof(SolveConfig))]
public class SolveBenchmarks
{
    private SimulationCase _case = null!;

    /// <summary>The case file name without .json.</summary>
    [ParamsSource(nameof(CaseNames))]
    public string Case { get; set; } = "laminate";

    /// <summary>The cases benchmarked.</summary>
    public static IEnumerable<string> CaseNames => BenchmarkCases.Names;

    /// <summary>Reads the case once; reading is not timed.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _case = BenchmarkCases.Load(Case);
        var result = Simulator.Run(_case);
        Console.WriteLine($"// {Case}: {result.Statistics}");
    }

    /// <summary>Mesh, assemble, integrate and collect results.</summary>
    [Benchmark]
    public SimulationResult Solve() => Simulator.Run(_case);
}
