using Layers.Core.Batch;
using Layers.Core.Cases;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>What <c>layers run</c> was asked to do.</summary>
/// <param name="CasePath">The case file as given.</param>
/// <param name="OutputRoot">Folder that receives the case folder.</param>
internal sealed record RunSettings(string CasePath, string OutputRoot)
{
    /// <summary>Print nothing on success.</summary>
    public bool Quiet { get; init; }

    /// <summary>Print summary.json on stdout instead of tables.</summary>
    public bool Json { get; init; }

    /// <summary>Report the solve time, step counts and the time spent outside the solve, on stderr.</summary>
    public bool Timing { get; init; }

    /// <summary>Write the PNG plots (and embed them in report.html).</summary>
    public bool Plots { get; init; } = true;

    /// <summary>Size and axis choices of the plots.</summary>
    public PlotOptions PlotOptions { get; init; } = new();

    /// <summary>Every case file and folder given; <see cref="CasePath"/> is the first.</summary>
    public IReadOnlyList<string> CasePaths { get; init; } = [];

    /// <summary>How many cases run at once.</summary>
    public int Jobs { get; init; } = Environment.ProcessorCount;

    /// <summary>Look into sub-folders of the folders given.</summary>
    public bool Recursive { get; init; }

    /// <summary>Which files a case may name: by default only those in its own folder (<c>--allow-outside-files</c>).</summary>
    public CaseFileAccess Access { get; init; } = CaseFileAccess.InsideCaseFolder;

    /// <summary>The part of the batch to run; null for all of it.</summary>
    public ShardSpec? Shard { get; init; }

    /// <summary>In a batch, also solve each case the exact method served by the finite volumes and compare (a single case always is).</summary>
    public bool CheckEveryCase { get; init; }
}
