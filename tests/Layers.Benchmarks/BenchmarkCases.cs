using System.Globalization;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Studies;

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
        var read = CaseDocument.ReadFile(path);
        return read.Case ?? throw new InvalidOperationException(read.FormatErrors());
    }

    /// <summary>
    /// Reads cases/NAME.json with <c>numerics.accuracy</c> set to <paramref name="accuracy"/> ("default" leaves the
    /// case as it is), through the case reader, as a user would write it.
    /// </summary>
    public static SimulationCase Load(string name, string accuracy)
    {
        if (accuracy == "default")
        {
            return Load(name);
        }

        var path = Path.Combine(AppContext.BaseDirectory, "cases", name + ".json");
        var document = JsonNode.Parse(File.ReadAllText(path))!.AsObject();
        var numerics = document["numerics"] as JsonObject ?? new JsonObject();
        document.Remove("numerics");
        numerics["accuracy"] = double.Parse(accuracy, CultureInfo.InvariantCulture);
        document["numerics"] = numerics;
        var read = CaseDocument.ReadText(document.ToJsonString(), path);
        return read.Case ?? throw new InvalidOperationException(read.FormatErrors());
    }
}
