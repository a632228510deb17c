namespace Layers.Core.TimeStepping;

/// <summary>When the loop reports and when it stops.</summary>
/// <param name="OutputTimesSeconds">
/// Ascending output times, all in (0, end]. The loop does not shorten its steps for them: an output inside an accepted
/// step is interpolated from the step (an error of the order of the step's own local error, with the mass balance
/// still closed); the loop lands exactly only on the end and on the times of state events.
/// </param>
/// <param name="EndSeconds">End of the simulated duration.</param>
/// <param name="HorizonSeconds">Latest time the loop may run to after the end while an observer wants more time.</param>
/// <param name="InitialStepSeconds">First trial step.</param>
public sealed record TimeLoopPlan(
    IReadOnlyList<double> OutputTimesSeconds,
    double EndSeconds,
    double HorizonSeconds,
    double InitialStepSeconds);
