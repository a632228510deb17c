using Layers.Core.FoodContact;

namespace Layers.Core.Domain;

/// <summary>
/// The food-contact part of a case, in SI units: the time-temperature history, which face is the food, and the
/// limits to judge the result against. Where each layer's D comes from is the layer's own
/// <see cref="Layer.Diffusivity"/>.
/// </summary>
public sealed record FoodContactSettings
{
    /// <summary>Detection threshold used for a functional barrier when the case gives none: 0.01 mg/kg, as kg/kg.</summary>
    public const double DefaultDetectionLimit = 0.01e-6;

    /// <summary>Density assumed for a food or simulant whose density is not given, kg/m3 (simulant density taken as 1 kg/L).</summary>
    public const double DefaultFoodDensity = 1000;

    /// <summary>The stages, in order; the case's duration is their sum.</summary>
    public required IReadOnlyList<TemperatureStage> Stages { get; init; }

    /// <summary>The face whose compartment is the food.</summary>
    public required Side FoodSide { get; init; }

    /// <summary>Specific migration limit as a mass fraction in the food, kg/kg; null when the case gives none.</summary>
    public double? SpecificMigrationLimit { get; init; }

    /// <summary>Detection threshold for the functional-barrier check, kg/kg.</summary>
    public double DetectionLimit { get; init; } = DefaultDetectionLimit;

    /// <summary>A standard test condition to compare with the shelf life; null when none is given.</summary>
    public TemperatureStage? TestCondition { get; init; }

    /// <summary>Activation energy of the regulatory test-time equivalence, J/mol.</summary>
    public double EquivalenceActivationEnergy { get; init; } = Arrhenius.RegulatoryActivationEnergy;

    /// <summary>Name of the worst-case partition convention applied to the layers, or null when K were given.</summary>
    public string? PartitionConvention { get; init; }

    /// <summary>Total duration of the history, s.</summary>
    public double TotalSeconds => Stages.Sum(stage => stage.DurationSeconds);
}
