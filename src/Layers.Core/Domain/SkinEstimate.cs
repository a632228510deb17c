namespace Layers.Core.Domain;

/// <summary>Layer parameters estimated with the Potts-Guy equation.</summary>
/// <param name="LogKow">log10 K_ow as given.</param>
/// <param name="MolarMassGramsPerMole">Molar mass as given, g/mol.</param>
/// <param name="PermeabilityCoefficientMetersPerSecond">k_p from the equation, m/s.</param>
/// <param name="PartitionCoefficient">K = K_ow^0.7 relative to water (assumed).</param>
/// <param name="DiffusivitySquareMetersPerSecond">D = k_p h / K, m2/s.</param>
public sealed record SkinEstimate(
    double LogKow,
    double MolarMassGramsPerMole,
    double PermeabilityCoefficientMetersPerSecond,
    double PartitionCoefficient,
    double DiffusivitySquareMetersPerSecond);
