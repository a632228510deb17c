namespace Layers.Core.Studies;

/// <summary>How a study (design or uncertainty) ended.</summary>
public enum StudyStatus
{
    /// <summary>Done: a design found its answer, an uncertainty study solved every sample.</summary>
    Done,

    /// <summary>A design: no value in the range gives the target; the message names the results found.</summary>
    NotReached,

    /// <summary>A value tried gave an invalid case (the errors quote the reader); nothing was solved after it.</summary>
    Invalid,

    /// <summary>The solver stopped early for a value tried.</summary>
    SolverFailed,

    /// <summary>Interrupted.</summary>
    Cancelled,
}
