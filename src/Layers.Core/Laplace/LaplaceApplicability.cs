using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// Whether the exact method can serve a case, and if not, why. The method needs one set of constant coefficients
/// for the whole run, linear faces, and a uniform initial concentration in each layer and medium.
/// </summary>
public sealed class LaplaceApplicability
{
    private static readonly Side[] Sides = [Side.Left, Side.Right];

    private LaplaceApplicability(IReadOnlyList<string> reasons)
    {
        Reasons = reasons;
    }

    /// <summary>Why the case cannot be served, one sentence each; empty when it can.</summary>
    public IReadOnlyList<string> Reasons { get; }

    /// <summary>True when the exact method can serve the case.</summary>
    public bool IsApplicable => Reasons.Count == 0;

    /// <summary>Checks a case.</summary>
    public static LaplaceApplicability Of(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var reasons = new List<string>();
        if (simulation.FoodContact is not null)
        {
            // Each time-temperature stage puts its own D and K into the case: the coefficients change during the run.
            reasons.Add("the food-contact settings run the case in time-temperature stages, each with its own D and K");
        }

        foreach (var layer in simulation.Stack.Layers.Where(layer => layer.SolubilityKgPerCubicMeter is not null))
        {
            // Capping the dissolved concentration at the solubility makes the problem non-linear.
            reasons.Add($"layer '{layer.Name}' has a solubility (dispersed, undissolved substance is not linear)");
        }

        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (simulation.Face(side) is CompartmentFace { Sampling: not null } sampled)
            {
                // Each sample replaces medium by fresh medium: a jump in the medium at given times.
                reasons.Add($"compartment '{sampled.Name}' is sampled with replacement at given times");
            }
        }

        if (simulation.Schedule is { } schedule && Sides.Any(side => schedule.Renews(side) && simulation.Face(side) is CompartmentFace))
        {
            // A renewed medium is emptied at given times: a jump in the medium, as with sampling.
            reasons.Add("the schedule renews a compartment's medium at given times");
        }

        if (simulation.Schedule is { } levels && Sides.Any(side => levels.Renews(side) && simulation.Face(side) is BathFace))
        {
            // The transform holds one bath level for the whole run.
            reasons.Add("the schedule changes a bath at given times");
        }

        if (simulation.Schedule is { ChangesLayers: true })
        {
            // Taking a layer off or putting one on changes the stack itself during the run.
            reasons.Add("the schedule takes layers off or puts them on during the run");
        }

        if (simulation.Schedule is { } contacts && contacts.Periods.Any(period => period.ClosedFaces.Count > 0))
        {
            // A face taken out of contact and brought back changes the system during the run.
            reasons.Add("the schedule closes a face and opens it again during the run");
        }

        return new LaplaceApplicability(reasons);
    }
}
