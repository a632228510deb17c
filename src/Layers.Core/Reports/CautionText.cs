namespace Layers.Core.Reports;

/// <summary>The caution printed with every result: these numbers can feed food-safety and dosing decisions.</summary>
public static class CautionText
{
    /// <summary>One paragraph, for console and files.</summary>
    public const string Paragraph =
        "Results are model estimates from the inputs and assumptions of this case (1-D diffusion, constant " +
        "coefficients, well-mixed compartments). They are not measurements and do not replace migration or " +
        "permeation testing, the applicable regulations, or review by a qualified person; they are not dosing advice.";

    /// <summary>Added for diffusion-cell, patch and skin cases, and wherever parameters were estimated.</summary>
    public const string DrugDelivery =
        "Permeation, delivery and skin figures here are research estimates, not dosing advice; clinical or " +
        "regulatory use needs validated studies and review by qualified people.";

    /// <summary>Added to the results of a fit.</summary>
    public const string FittedInputs =
        "Estimated inputs hold for this model and these measurements only: check the residuals and the findings on " +
        "identifiability before using them elsewhere.";

    /// <summary>The caution for one result: the general paragraph, plus the drug-delivery one where it applies.</summary>
    public static string For(Results.SimulationResult result)
        => result.DiffusionCell is not null || result.Case.Stack.Layers.Any(layer => layer.Estimate is not null)
            ? Paragraph + " " + DrugDelivery
            : Paragraph;
}
