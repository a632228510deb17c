using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using Layers.Core.Batch;
using Layers.Core.Reports;
using Layers.Core.Results;

namespace Layers.Benchmarks;

/// <summary>
/// 1000 small cases as one batch through <see cref="BatchRunner"/>, two at a time, writing what `layers run
/// --no-plots` writes for each case (summary.json, timeseries.csv, profiles.csv, report.html) into a fresh
/// temporary folder per iteration. The cases are the invented two-layer films of tests/benchmarks/batch-throughput.sh,
/// made in memory.
/// </summary>
[Config(typeof(BatchConfig))]
public class BatchBenchmarks
{
    private const int CaseCount = 1000;
    private IReadOnlyList<BatchItem> _items = [];
    private string _output = string.Empty;

    /// <summary>Makes the 1000 documents.</summary>
    [GlobalSetup]
    public void Setup() => _items = [.. Enumerable.Range(0, CaseCount).Select(Film)];

    /// <summary>A fresh output folder for each iteration, since case folders are never overwritten.</summary>
    [IterationSetup]
    public void NewFolder() => _output = Directory.CreateTempSubdirectory("layers-batch-benchmark-").FullName;

    /// <summary>Removes the iteration's output.</summary>
    [IterationCleanup]
    public void RemoveFolder() => Directory.Delete(_output, recursive: true);

    /// <summary>Reads, solves and writes the 1000 cases; throws if any did not succeed.</summary>
    [Benchmark]
    public int Batch()
    {
        var rows = BatchRunner.Run(_items, new BatchRunOptions(_output, Environment.ProcessorCount), Files, progress: null, CancellationToken.None);
        var succeeded = rows.Count(row => row.Status == BatchStatus.Succeeded);
        return succeeded == CaseCount
            ? succeeded
            : throw new InvalidOperationException($"{CaseCount - succeeded} of {CaseCount} cases did not succeed: {rows.First(row => row.Status != BatchStatus.Succeeded).Message}");
    }

    private static Dictionary<string, byte[]> Files(SimulationResult result, BatchItem item) => new()
    {
        ["summary.json"] = Encoding.UTF8.GetBytes(SummaryJson.Write(result, item.File)),
        ["timeseries.csv"] = Encoding.UTF8.GetBytes(TimeSeriesCsv.Write(result)),
        ["profiles.csv"] = Encoding.UTF8.GetBytes(ProfilesCsv.Write(result)),
        ["report.html"] = Encoding.UTF8.GetBytes(HtmlReport.Write(result, item.File, new Dictionary<string, byte[]>())),
    };

    /// <summary>Case i: outer layer 10 to 49 um, inner 20 to 68 um, inner D cycling through 1e-9, 1e-10, 1e-11 cm2/s.</summary>
    private static BatchItem Film(int i)
    {
        var outer = 10 + (i % 40);
        var inner = 20 + (i / 40 % 25 * 2);
        var exponent = 9 + (i % 3);
        var json = string.Create(CultureInfo.InvariantCulture, $$"""
            {
              "title": "Invented benchmark film {{i}}",
              "layers": [
                { "name": "outer", "thickness": "{{outer}} um", "diffusionCoefficient": "1e-12 cm2/s", "partitionCoefficient": 1 },
                { "name": "inner", "thickness": "{{inner}} um", "diffusionCoefficient": "1e-{{exponent}} cm2/s", "partitionCoefficient": 1,
                  "initialConcentration": "500 mg/L" }
              ],
              "left": { "kind": "closed" },
              "right": { "kind": "compartment", "name": "simulant", "volume": "100 mL", "area": "1 dm2", "partitionCoefficient": 0.1 },
              "duration": "10 d"
            }
            """);
        var name = $"film-{i:D4}";
        return new BatchItem(name, name + ".json", json, [], []);
    }
}
