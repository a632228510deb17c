namespace Layers.Core.Batch;

/// <summary>How one run of a case ended (<see cref="CaseRun"/>), for a single run and a batch alike.</summary>
public enum CaseRunStatus
{
    /// <summary>Solved, checked and written.</summary>
    Succeeded,

    /// <summary>The case file could not be read or breaks a rule of the case format; not solved, nothing written.</summary>
    Invalid,

    /// <summary>The solver stopped before the end of the duration, or the run failed its own checks; nothing written.</summary>
    SolverFailed,

    /// <summary>The results could not be written; nothing of this case committed.</summary>
    OutputFailed,

    /// <summary>Cancelled while reading, solving, making or writing the files; nothing written.</summary>
    Cancelled,
}
