using Layers.Core.Cases;
using Layers.Core.Domain;

namespace Layers.Benchmarks;

/// <summary>The fixed benchmark cases in cases/ beside the executable, read through the tool's own case reader.</summary>
public static class BenchmarkCases
{
    /// <summary>The names of the single-case benchmarks, in the order of docs/performance.md.</summary>
    public static IReadOnlyList<string> Names { get; } = ["laminate", "patch", "stiff-stack", "stack-50"];

    /// <summary>Reads cases/NAME.json; a broken file stops the benchmark with the reader's messages.</summary>
    public static SimulationCase Load(string name)
    {
        var path = Path.Combine(AppContext.BaseDirectory, "cases", name + ".json");
        var read = CaseReader.ReadFile(path);
        return read.Case ?? throw new InvalidOperationException(read.FormatErrors());
    }
}
