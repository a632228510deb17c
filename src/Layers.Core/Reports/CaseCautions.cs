using Layers.Core.Domain;

namespace Layers.Core.Reports;

/// <summary>
/// The cautions and notes a case carries into every output made from it, so that a fit or a Monte Carlo on a case
/// says what a run of it says: the caution of its field and which of its constants were recalled and not checked.
/// </summary>
public static class CaseCautions
{
    /// <summary>
    /// The caution paragraphs beyond <see cref="CautionText.Paragraph"/> that apply to a case: the drug-delivery one
    /// where a layer was estimated from a skin correlation, the food-contact one where the case has food-contact
    /// settings.
    /// </summary>
    public static IReadOnlyList<string> Specific(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var cautions = new List<string>();
        if (simulation.Stack.Layers.Any(layer => layer.Estimate is not null))
        {
            cautions.Add(CautionText.DrugDelivery);
        }

        if (simulation.FoodContact is not null)
        {
            cautions.Add(FoodContactTables.Caution);
        }

        return cautions;
    }

    /// <summary>The general caution followed by every specific one, as one paragraph.</summary>
    public static string Paragraph(SimulationCase simulation, params string[] extra)
        => string.Join(" ", new[] { CautionText.Paragraph }.Concat(extra).Concat(Specific(simulation)));

    /// <summary>
    /// One note per layer whose parameters rest on constants recalled from memory and not checked: a skin estimate
    /// (<see cref="EstimateNotes"/>), or an upper-bound diffusion estimate from a polymer row flagged unverified.
    /// </summary>
    public static IReadOnlyList<string> UnverifiedConstants(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var notes = new List<string>(EstimateNotes.For(simulation));
        if (simulation.FoodContact is not null)
        {
            foreach (var layer in simulation.Stack.Layers)
            {
                if (layer.Diffusivity is EstimatedDiffusivity { Polymer.Verified: false } estimated)
                {
                    notes.Add($"note: {layer.Name}: D is an upper-bound estimate for {estimated.Polymer.Name} from polymer constants that are UNVERIFIED, from memory ({estimated.Polymer.Source})");
                }
            }
        }

        return notes;
    }
}
