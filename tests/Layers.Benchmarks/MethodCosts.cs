using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Simulation;

namespace Layers.Benchmarks;

/// <summary>
/// `method-costs`: the warm cost of one run of each fixed case by each method of <c>numerics.method</c>, measured in
/// one process one after the other (median of repeated runs, <see cref="Timing.Median"/>), as a table of times and
/// ratios: the finite volumes with their error control, the exact method with its estimate, each without the other
/// method's check (a study's or a batch's run), and the exact method with the finite-volume check (a single run's).
/// </summary>
internal static class MethodCosts
{
    public static int Run(TextWriter output)
    {
        output.WriteLine("| case | finite volumes | exact | exact / finite volumes | exact with the finite-volume check |");
        output.WriteLine("| --- | ---: | ---: | ---: | ---: |");
        foreach (var name in BenchmarkCases.Names.Append("membrane").Append("barrier-bath"))
        {
            var loaded = BenchmarkCases.Load(name);
            var finiteVolumes = loaded with { Numerics = loaded.Numerics with { Method = SolutionMethod.FiniteVolume } };
            var auto = loaded with { Numerics = loaded.Numerics with { Method = SolutionMethod.Auto } };
            var method = Simulator.Run(auto, checkExactByFiniteVolumes: false).Method;
            var fv = Timing.Median(() => Simulator.Run(finiteVolumes, checkExactByFiniteVolumes: false)).MedianSeconds;
            var exact = Timing.Median(() => Simulator.Run(auto, checkExactByFiniteVolumes: false)).MedianSeconds;
            var checkedRun = Timing.Median(() => Simulator.Run(auto)).MedianSeconds;
            output.WriteLine(string.Create(
                CultureInfo.InvariantCulture,
                $"| {name}{(method == SolutionMethod.Laplace ? string.Empty : " (auto: finite volumes)")} | {fv * 1e3:F1} ms | {exact * 1e3:F1} ms | {exact / fv:F2} | {checkedRun * 1e3:F1} ms |"));
        }

        return 0;
    }
}
