using Layers.Core.Cases;
using Layers.Core.Studies;

namespace Layers.Core.Fitting;

/// <summary>How a fit ended (<see cref="CaseFitter.Run"/>): its result, or why there is none.</summary>
/// <param name="Status">Done, solver failed or cancelled.</param>
/// <param name="Result">The fit; null unless done.</param>
public sealed record FitOutcome(StudyStatus Status, FitResult? Result) : IStudyOutcome
{
    /// <inheritdoc/>
    public string? Message { get; init; }

    /// <inheritdoc/>
    public IReadOnlyList<CaseError> Errors => [];
}
