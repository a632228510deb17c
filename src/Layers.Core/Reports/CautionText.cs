namespace Layers.Core.Reports;

/// <summary>The caution printed with every result: these numbers can feed food-safety and dosing decisions.</summary>
public static class CautionText
{
    /// <summary>One paragraph, for console and files.</summary>
    public const string Paragraph =
        "Results are model estimates from the inputs and assumptions of this case (1-D diffusion, constant " +
        "coefficients, well-mixed compartments). They are not measurements and do not replace migration or " +
        "permeation testing, the applicable regulations, or review by a qualified person; they are not dosing advice.";
}
