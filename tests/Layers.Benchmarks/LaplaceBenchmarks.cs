using BenchmarkDotNet.Attributes;
using Layers.Core.Domain;
using Layers.Core.Laplace;

namespace Layers.Benchmarks;

/// <summary>
/// The exact method on a three-layer stack at six report times over two and a half decades (1 h to 10 d): one
/// inversion per time (<see cref="LaplaceSolution.At"/>, a Talbot contour each) against all six at once
/// (<see cref="LaplaceSolution.AtTimes"/>, one hyperbolic contour per window of times). The solution is built once;
/// what is timed is the inversion a caller pays for each set of report times.
/// </summary>
[Config(typeof(SolveConfig))]
public class LaplaceBenchmarks
{
    private static readonly double[] ReportTimesSeconds = [3600, 6 * 3600, 86400, 3 * 86400, 7 * 86400, 10 * 86400];

    private LaplaceSolution _solution = null!;

    /// <summary>The case: the laminate (closed face and a compartment) or a barrier between a bath and a closed face.</summary>
    [Params("laminate", "barrier-bath")]
    public string Case { get; set; } = "laminate";

    /// <summary>Builds the solution once; building is not timed.</summary>
    [GlobalSetup]
    public void Setup()
    {
        SimulationCase simulation = BenchmarkCases.Load(Case);
        _solution = LaplaceSolution.For(simulation);
    }

    /// <summary>Six calls of At, 16 solves each.</summary>
    [Benchmark(Baseline = true)]
    public LaplaceSnapshot[] AtEachTime() => [.. ReportTimesSeconds.Select(_solution.At)];

    /// <summary>One call of AtTimes for the six times.</summary>
    [Benchmark]
    public IReadOnlyList<LaplaceSnapshot> AtAllTimes() => _solution.AtTimes(ReportTimesSeconds);
}
