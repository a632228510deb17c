namespace Layers.Core.Batch;

/// <summary>How one case of a batch ended. Written in lower case in the summary files.</summary>
public enum BatchStatus
{
    /// <summary>Solved and written.</summary>
    Succeeded,

    /// <summary>The case file could not be read or breaks a rule of the case format; not solved.</summary>
    Invalid,

    /// <summary>The solver stopped early, the results could not be written, or an unexpected error; nothing written.</summary>
    Failed,

    /// <summary>The run was interrupted before this case finished; nothing written for it.</summary>
    Cancelled,
}
