namespace Layers.Core.TimeStepping;

/// <summary>When the loop reports and when it stops.</summary>
/// <param name="OutputTimesSeconds">Ascending output times, all in (0, end]; the loop lands on each exactly.</param>
/// <param name="EndSeconds">End of the simulated duration.</param>
/// <param name="HorizonSeconds">Latest time the loop may run to after the end while an observer wants more time.</param>
/// <param name="InitialStepSeconds">First trial step.</param>
public sealed record TimeLoopPlan(
    IReadOnlyList<double> OutputTimesSeconds,
    double EndSeconds,
    double HorizonSeconds,
    double InitialStepSeconds);
