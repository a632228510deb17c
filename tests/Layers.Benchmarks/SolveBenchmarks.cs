using BenchmarkDotNet.Attributes;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Benchmarks;

/// <summary>
/// One warm solve of each fixed case in cases/, through Simulator.Run: at the case's own settings (the defaults) and
/// at the accuracy settings of <c>numerics.accuracy</c> that issue #8's targets are stated for, by each method
/// (<c>numerics.method</c>), without the other method's independent check, so that each method's own cost shows.
/// </summary>
[Config(typeof(SolveConfig))]
public class SolveBenchmarks
{
    private SimulationCase _case = null!;

    /// <summary>The case file name without .json.</summary>
    [ParamsSource(nameof(CaseNames))]
    public string Case { get; set; } = "laminate";

    /// <summary><c>numerics.accuracy</c> of the run (1e-4 is also what a case without numerics gets).</summary>
    [Params("1e-3", "3e-4", "1e-4")]
    public string Accuracy { get; set; } = "default";

    /// <summary><c>numerics.method</c> of the run: "auto" takes the exact method where the case allows it.</summary>
    [Params("finiteVolume", "auto")]
    public string Method { get; set; } = "auto";

    /// <summary>The cases benchmarked.</summary>
    public static IEnumerable<string> CaseNames => BenchmarkCases.Names;

    /// <summary>Reads the case once; reading is not timed.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var loaded = BenchmarkCases.Load(Case, Accuracy);
        var method = Method == "auto" ? SolutionMethod.Auto : SolutionMethod.FiniteVolume;
        _case = loaded with { Numerics = loaded.Numerics with { Method = method } };
        var result = Simulator.Run(_case, checkExactByFiniteVolumes: false);
        Console.WriteLine($"// {Case} at accuracy {Accuracy}, {Method}: {result.Method} ({result.MethodReason}) {result.Statistics}");
    }

    /// <summary>Mesh, assemble, integrate and collect results: everything a run reports.</summary>
    [Benchmark]
    public SimulationResult Solve() => Simulator.Run(_case, checkExactByFiniteVolumes: false);

    /// <summary>
    /// The lean solve to the duration and no further (what sweeps and fits call): the amounts at the output times,
    /// without the search past the duration for the times to equilibrium and without the food-contact figures.
    /// </summary>
    [Benchmark]
    public int SolveToDuration() => Simulator.RunTimeSeries(_case).Samples.Count;
}
