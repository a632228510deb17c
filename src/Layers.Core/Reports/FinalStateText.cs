using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// What "final state" means for a run, in one plain sentence without numbers: the same words in the console,
/// summary.json and report.html, so that a reader never has to guess it where sampling or removal takes mass out.
/// </summary>
public static class FinalStateText
{
    /// <summary>The meaning of the final state of a run.</summary>
    public static string Describe(FinalStateSummary final)
    {
        ArgumentNullException.ThrowIfNull(final);
        return final.Kind switch
        {
            FinalStateKind.ClosedEquilibrium when final.MassLeftAfterSamplingPerArea is not null
                => "equilibrium of the closed system holding the mass left after the last sample (what the samples took out never comes back)",
            FinalStateKind.ClosedEquilibrium => "equilibrium of the closed system",
            FinalStateKind.BathEquilibrium => "equilibrium with the bath",
            FinalStateKind.AllRemoved
                => "everything ends in the first-order removal: nothing is left in the system, and the progress toward it is the fraction of the initial mass removed",
            _ => "steady permeation between the baths",
        };
    }
}
