using Layers.Core.Domain;

namespace Layers.Core.Results;

/// <summary>The food-contact figures of a run, in SI units (concentrations in the food as mass fractions, kg/kg).</summary>
public sealed record FoodContactResult
{
    /// <summary>Name of the food compartment.</summary>
    public required string FoodName { get; init; }

    /// <summary>The face the food touches.</summary>
    public required Side FoodSide { get; init; }

    /// <summary>Density used to turn the food's concentration into a mass fraction, kg/m3.</summary>
    public required double FoodDensityKgPerCubicMeter { get; init; }

    /// <summary>True when the density was not given and the 1 kg/L convention was used.</summary>
    public required bool FoodDensityAssumed { get; init; }

    /// <summary>Contact area per mass of food, m2/kg (the EU convention is 6 dm2/kg = 0.06 m2/kg).</summary>
    public required double AreaPerFoodMassSquareMetersPerKilogram { get; init; }

    /// <summary>Each stage with its layers' D and the food's concentration at its end.</summary>
    public required IReadOnlyList<StageReport> Stages { get; init; }

    /// <summary>Where each layer's D comes from, by layer, in stack order.</summary>
    public required IReadOnlyList<(string Layer, string Origin)> DiffusivityOrigins { get; init; }

    /// <summary>Concentration in the food at the end of the history, kg/kg.</summary>
    public required double FinalConcentration { get; init; }

    /// <summary>Mass that reached the food per contact area at the end, kg/m2 (from the food's initial content on).</summary>
    public required double FinalMigrationPerArea { get; init; }

    /// <summary>The specific migration limit, kg/kg, or null.</summary>
    public double? SpecificMigrationLimit { get; init; }

    /// <summary>True when the final concentration is at most the limit (null without a limit).</summary>
    public bool? MeetsLimit => SpecificMigrationLimit is { } limit ? FinalConcentration <= limit : null;

    /// <summary>Limit minus final concentration, kg/kg (negative when exceeded), or null.</summary>
    public double? LimitMargin => SpecificMigrationLimit - FinalConcentration;

    /// <summary>When the food first reached the limit within the history, s, or null.</summary>
    public double? LimitReachedSeconds { get; init; }

    /// <summary>Detection threshold of the functional-barrier check, kg/kg.</summary>
    public required double DetectionLimit { get; init; }

    /// <summary>When the food first reached the detection threshold within the history, s, or null.</summary>
    public double? DetectionReachedSeconds { get; init; }

    /// <summary>Lag time d^2/(6D) of each layer between the loaded layers and the food, in each stage.</summary>
    public required IReadOnlyList<BarrierLag> BarrierLags { get; init; }

    /// <summary>The comparison of a standard test with the history, or null without a test condition.</summary>
    public TestComparison? Test { get; init; }

    /// <summary>The highest initial loadings that still meet the limit at the end, or null without a limit.</summary>
    public MaximumLoading? MaximumLoading { get; init; }

    /// <summary>The worst-case partition convention applied, or null.</summary>
    public string? PartitionConvention { get; init; }

    /// <summary>The model's assumptions, for reports.</summary>
    public static IReadOnlyList<string> Assumptions { get; } =
    [
        "one-dimensional diffusion through the thickness (edges and seals ignored)",
        "no swelling of the layers by the food or simulant, and no reaction or loss of the substance",
        "the food or simulant is well mixed (no resistance on its side unless a film coefficient is given)",
        "partition coefficients constant over the whole history unless a stage gives its own; diffusion and partition coefficients constant within each stage, with concentrations carried over unchanged at a stage boundary",
        "the substance starts uniformly distributed in each layer",
    ];
}

/// <summary>One stage of the history as reported.</summary>
/// <param name="Name">Stage name.</param>
/// <param name="StartSeconds">Start, s.</param>
/// <param name="EndSeconds">End, s.</param>
/// <param name="TemperatureKelvin">Temperature, K.</param>
/// <param name="Diffusivities">Each layer's D in the stage, m2/s, with where it comes from.</param>
/// <param name="FoodConcentrationAtEnd">Concentration in the food at the stage end, kg/kg.</param>
public sealed record StageReport(
    string Name,
    double StartSeconds,
    double EndSeconds,
    double TemperatureKelvin,
    IReadOnlyList<(string Layer, double Value, string Origin)> Diffusivities,
    double FoodConcentrationAtEnd)
{
    /// <summary>Each layer's and then the food's partition coefficient in the stage (volume basis, relative to the reference medium).</summary>
    public IReadOnlyList<(string Medium, double PartitionCoefficient)> Partitions { get; init; } = [];
}

/// <summary>Lag time d^2/(6D) of a barrier layer in one stage.</summary>
/// <param name="Layer">Layer name.</param>
/// <param name="Stage">Stage name.</param>
/// <param name="Seconds">d^2 / (6 D), s.</param>
public sealed record BarrierLag(string Layer, string Stage, double Seconds);

/// <summary>A standard test compared with the shelf-life history.</summary>
/// <param name="Condition">The test condition.</param>
/// <param name="FoodConcentration">Concentration in the food at the end of the test, by the model, kg/kg.</param>
/// <param name="RegulatoryEquivalentSeconds">
/// The history converted to time at the test temperature with the regulatory Arrhenius rule, s.
/// </param>
/// <param name="ActivationEnergy">Ea of that rule, J/mol.</param>
public sealed record TestComparison(
    TemperatureStage Condition,
    double FoodConcentration,
    double RegulatoryEquivalentSeconds,
    double ActivationEnergy)
{
    /// <summary>True when the test gives at least the history's migration under the model.</summary>
    public bool CoversByModel(double historyConcentration) => FoodConcentration >= historyConcentration;

    /// <summary>True when the test lasts at least the regulatory equivalent of the history.</summary>
    public bool CoversByRule => Condition.DurationSeconds >= RegulatoryEquivalentSeconds * (1 - 1e-12);
}

/// <summary>
/// The affine relation c_food(end) = offset + slope s between the food's final concentration and a factor s applied
/// to the initial concentration of every loaded layer, and the largest s that meets the limit.
/// </summary>
/// <param name="OffsetConcentration">c_food(end) with the loaded layers empty, kg/kg (0 when everything else starts empty).</param>
/// <param name="SlopeConcentration">Increase of c_food(end) per unit of s, kg/kg.</param>
/// <param name="Factor">Largest s that meets the limit (0 when even s = 0 exceeds it).</param>
/// <param name="Layers">Each loaded layer with its largest initial concentration, kg/m3, and as a mass fraction when it has a density.</param>
public sealed record MaximumLoading(
    double OffsetConcentration,
    double SlopeConcentration,
    double Factor,
    IReadOnlyList<(string Layer, double KgPerCubicMeter, double? MassFraction)> Layers);
