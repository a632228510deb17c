using Layers.Core.Batch;
using Layers.Core.Cases;

namespace Layers.Cli.Commands;

/// <summary>
/// How <c>run</c> and the study commands report a case that did not succeed: the pipeline's words
/// (<see cref="CaseRunOutcome.Heading"/> and the errors below it) on stderr, and the exit code of its status.
/// </summary>
internal static class CaseOutcomeReport
{
    /// <summary>Reports why the case did not succeed and returns its exit code; null when it succeeded.</summary>
    public static int? Failure(string casePath, CaseRunOutcome outcome, TextWriter error)
    {
        if (outcome.Status == CaseRunStatus.Succeeded)
        {
            return null;
        }

        error.WriteLine($"{casePath}: {outcome.Heading}");
        if (outcome.Errors.Count > 0)
        {
            error.WriteLine(new CaseReadResult(casePath, null, outcome.Errors).FormatErrors());
        }

        return outcome.Status switch
        {
            CaseRunStatus.Invalid => ExitCodes.InvalidInput,
            CaseRunStatus.SolverFailed => ExitCodes.SolverFailed,
            CaseRunStatus.OutputFailed => ExitCodes.OutputFailed,
            CaseRunStatus.Cancelled => ExitCodes.Cancelled,
            _ => throw new ArgumentOutOfRangeException(nameof(outcome), outcome.Status, "unknown status"),
        };
    }
}
