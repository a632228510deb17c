using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// What "final state" means for a run, in one plain sentence without numbers: the same words in the console,
/// summary.json and report.html, so that a reader never has to guess it where sampling or removal takes mass out.
/// </summary>
public static class FinalStateText
{
    /// <summary>The meaning of the final state of a run of <paramref name="simulation"/>.</summary>
    public static string Describe(FinalStateSummary final, SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(final);
        return final.Kind switch
        {
            FinalStateKind.ClosedEquilibrium when final.MassLeftAfterSamplingPerArea is not null
                => $"equilibrium of the closed system holding the mass left after the last {Withdrawal(simulation)} ({Consequence(simulation)})",
            FinalStateKind.ClosedEquilibrium => "equilibrium of the closed system",
            FinalStateKind.BathEquilibrium => "equilibrium with the bath",
            FinalStateKind.AllRemoved
                => "everything ends in the first-order removal: nothing is left in the system, and the progress toward it is the fraction of the initial mass removed",
            _ => "steady permeation between the baths",
        };
    }

    /// <summary>
    /// What takes mass out of a closed system (or brings it) at given times: "sample", "renewal" (of a medium or, by a
    /// schedule, of the stack: layers taken off or put on fresh) or "sample or renewal".
    /// </summary>
    public static string Withdrawal(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var sampled = new[] { simulation.Left, simulation.Right }.Any(face => face is CompartmentFace { Sampling: not null });
        var renewed = simulation.Schedule is { ChangesMass: true };
        return (sampled, renewed) switch
        {
            (true, true) => "sample or renewal",
            (false, true) => "renewal",
            _ => "sample",
        };
    }

    private static string Consequence(SimulationCase simulation) => Withdrawal(simulation) switch
    {
        "renewal" => "what the renewals took out or brought in stays so",
        "sample" => "what the samples took out never comes back",
        _ => "what the samples took out, and what the renewals took out or brought in, stays so",
    };
}
