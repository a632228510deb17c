using Layers.Core.Domain;

namespace Layers.Core.Permeation;

/// <summary>
/// Stratum corneum permeability from lipophilicity and size, and the D and K of a stratum corneum layer that give
/// it. Potts and Guy, Pharm. Res. 9 (1992) 663-669 (constants from memory, not checked against the paper):
/// log10 k_p [cm/s] = -6.3 + 0.71 log10 K_ow - 0.0061 MW, MW in g/mol, aqueous vehicle, human epidermis.
/// </summary>
/// <remarks>
/// Turning k_p into a layer needs one more assumption, since k_p = K D / h fixes only the product K D. This tool
/// takes the stratum corneum / water partition coefficient as K = K_ow^0.7 (a scaling recalled from the skin
/// literature, memory, unverified) and then D = k_p h / K. The alternative, fixing D from a measured lag time
/// (D = h^2 / (6 t_lag)), is open to users who have a lag time: they give D and K directly. Either way the layer
/// is marked as estimated in the reports.
/// </remarks>
public static class PottsGuy
{
    /// <summary>Intercept of log10 k_p [cm/s] (memory, unverified).</summary>
    public const double Intercept = -6.3;

    /// <summary>Coefficient of log10 K_ow (memory, unverified).</summary>
    public const double LogKowCoefficient = 0.71;

    /// <summary>Coefficient of the molar mass in g/mol (memory, unverified).</summary>
    public const double MolarMassCoefficient = 0.0061;

    /// <summary>Exponent of K_ow in the assumed stratum corneum / water partition coefficient (memory, unverified).</summary>
    public const double PartitionExponent = 0.7;

    /// <summary>k_p, m/s.</summary>
    /// <param name="logKow">log10 of the octanol/water partition coefficient.</param>
    /// <param name="molarMassGramsPerMole">Molar mass, g/mol.</param>
    public static double PermeabilityCoefficientMetersPerSecond(double logKow, double molarMassGramsPerMole)
        => 1e-2 * Math.Pow(10, Intercept + (LogKowCoefficient * logKow) - (MolarMassCoefficient * molarMassGramsPerMole));

    /// <summary>The layer parameters for a stratum corneum of the given thickness.</summary>
    public static SkinEstimate Estimate(double logKow, double molarMassGramsPerMole, double thicknessMeters)
    {
        var kp = PermeabilityCoefficientMetersPerSecond(logKow, molarMassGramsPerMole);
        var k = Math.Pow(10, PartitionExponent * logKow);
        return new SkinEstimate(logKow, molarMassGramsPerMole, kp, k, kp * thicknessMeters / k);
    }
}
