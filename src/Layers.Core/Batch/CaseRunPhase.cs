namespace Layers.Core.Batch;

/// <summary>The phases of one run of a case, in order, reported as each ends (for <c>--timing</c>).</summary>
public enum CaseRunPhase
{
    /// <summary>The case file read and checked.</summary>
    Read,

    /// <summary>The case solved (and checked by the run's own checks).</summary>
    Solve,

    /// <summary>The result files (and plots) made in memory.</summary>
    BuildFiles,

    /// <summary>The case folder written and committed.</summary>
    Write,
}
