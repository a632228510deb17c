using BenchmarkDotNet.Columns;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Diagnosers;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;

namespace Layers.Benchmarks;

/// <summary>
/// Warm solves: in process (no generated project to build, which also keeps the repository's analyzers out of the
/// way), 5 warm-up and 31 measured iterations, median and allocations reported.
/// </summary>
public sealed class SolveConfig : ManualConfig
{
    /// <summary>The configuration.</summary>
    public SolveConfig()
    {
        AddJob(Job.Default.WithToolchain(InProcessEmitToolchain.Instance).WithWarmupCount(5).WithIterationCount(31).WithId("warm-31"));
        AddDiagnoser(MemoryDiagnoser.Default);
        AddColumn(StatisticColumn.Median, StatisticColumn.Min, StatisticColumn.Max);
    }
}

/// <summary>
/// The 1000-case batch: one invocation per iteration (each writes its own output folder), 1 warm-up and 5 measured
/// iterations; the in-process run may take up to an hour on a loaded machine.
/// </summary>
public sealed class BatchConfig : ManualConfig
{
    /// <summary>The configuration.</summary>
    public BatchConfig()
    {
        AddJob(Job.Default.WithToolchain(new InProcessEmitToolchain(TimeSpan.FromHours(1), logOutput: true))
            .WithWarmupCount(1).WithIterationCount(5).WithInvocationCount(1).WithUnrollFactor(1).WithId("batch-5"));
        AddDiagnoser(MemoryDiagnoser.Default);
        AddColumn(StatisticColumn.Median, StatisticColumn.Min, StatisticColumn.Max);
    }
}
