using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Fitting;

/// <summary>What to fit: a case, its measured data, the face they were measured on, and the inputs to estimate.</summary>
/// <param name="CasePath">The case file; the values at <paramref name="Paths"/> are the starting values.</param>
/// <param name="Data">The measurements.</param>
/// <param name="Face">The face whose medium was measured.</param>
/// <param name="Paths">JSON paths of the inputs to estimate, e.g. <c>$.layers[0].diffusionCoefficient</c>.</param>
public sealed record FitRequest(string CasePath, MeasuredSeries Data, Side Face, IReadOnlyList<string> Paths)
{
    /// <summary>Two-sided confidence level of the intervals. Default 0.95.</summary>
    public double Confidence { get; init; } = 0.95;

    /// <summary>
    /// Minimiser settings. The defaults stop when no log10 value moves by more than 1e-5 (relative) or the sum of
    /// squares falls by less than 1e-8 in a step, and limit a step to a factor of ten in any input.
    /// </summary>
    public LeastSquaresOptions Options { get; init; } = new()
    {
        StepTolerance = 1e-5,
        CostTolerance = 1e-8,
        MaximumStep = 1,
        DifferenceStep = 1e-3,
    };

    /// <summary>The named result the measurements are: the amount received by, or the concentration in, the measured face's medium.</summary>
    public NamedResult Measured => (Data.Quantity, Face) switch
    {
        (MeasuredQuantity.Concentration, Side.Left) => NamedResult.LeftConcentration,
        (MeasuredQuantity.Concentration, Side.Right) => NamedResult.RightConcentration,
        (MeasuredQuantity.AmountPerArea, Side.Left) => NamedResult.LeftReceived,
        (MeasuredQuantity.AmountPerArea, Side.Right) => NamedResult.RightReceived,

        // A mass fraction in the medium: the catalogue's mass-fraction result, for its SI unit kg/kg.
        (MeasuredQuantity.MassFraction, _) => NamedResult.FoodConcentration,
    };
}
