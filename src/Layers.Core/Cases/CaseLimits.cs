namespace Layers.Core.Cases;

/// <summary>
/// The largest counts a case may ask for, checked when it is read. They keep every run, file and plot of bounded
/// size and time whatever the input (a typo of a few extra zeros must not keep a batch busy for hours); each is far
/// above what a real stack or measurement plan needs. Documented in docs/case-format.md and the schema.
/// </summary>
public static class CaseLimits
{
    /// <summary>Most layers in a stack (<c>$.layers</c>).</summary>
    public const int MaxLayers = 1000;

    /// <summary>
    /// Most report times (<c>$.reportTimes</c>): each writes a full profile of every cell into profiles.csv.
    /// </summary>
    public const int MaxReportTimes = 1000;

    /// <summary>
    /// Most extra output times (<c>$.extraOutputTimes</c>) and sampling times (<c>sampling.times</c>): each adds one
    /// row of amounts to timeseries.csv.
    /// </summary>
    public const int MaxOutputTimes = 10_000;

    /// <summary>
    /// Most depths (<c>$.depths</c>): each adds a row per report time to depths.csv and an entry to summary.json.
    /// </summary>
    public const int MaxDepths = 100;
}
