namespace Layers.Core.TimeStepping;

/// <summary>Why the time loop ended.</summary>
public enum StopReason
{
    /// <summary>Reached the end time (and, where asked, the extension beyond it).</summary>
    Completed,

    /// <summary>Took the maximum number of steps.</summary>
    MaximumStepsExceeded,

    /// <summary>The step size fell below the smallest meaningful step without meeting the tolerance.</summary>
    StepSizeUnderflow,

    /// <summary>A value became NaN or infinite.</summary>
    NonFiniteValues,

    /// <summary>The caller cancelled the run.</summary>
    Cancelled,

    /// <summary>The loop reached the end, but the mass balance did not close (see <c>SelfChecks</c>).</summary>
    MassBalanceNotClosed,

    /// <summary>The loop reached the end, but some layer or compartment held a negative amount (see <c>SelfChecks</c>).</summary>
    NegativeAmount,
}
