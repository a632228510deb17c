using Layers.Core.Cases;

namespace Layers.Core.Studies;

/// <summary>How a study ended, as the pipeline that writes its files reads it (design, uncertainty, fit).</summary>
public interface IStudyOutcome
{
    /// <summary>How it ended: its files are written when <see cref="StudyStatus.Done"/> or <see cref="StudyStatus.NotReached"/>.</summary>
    StudyStatus Status { get; }

    /// <summary>For anything but <see cref="StudyStatus.Done"/>, what went wrong in plain words.</summary>
    string? Message { get; }

    /// <summary>The errors of an invalid value tried, with their JSON paths.</summary>
    IReadOnlyList<CaseError> Errors { get; }
}
