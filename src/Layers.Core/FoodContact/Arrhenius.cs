namespace Layers.Core.FoodContact;

/// <summary>
/// Arrhenius temperature dependence, k(T) = k(T_ref) exp(-(Ea/R)(1/T - 1/T_ref)), and the regulatory test-time
/// equivalence built on it.
/// </summary>
public static class Arrhenius
{
    /// <summary>Molar gas constant, J/(mol K) (CODATA 2018, exact since the 2019 SI redefinition).</summary>
    public const double GasConstant = 8.314462618;

    /// <summary>
    /// Activation energy the EU rules on plastics for food contact use to convert a contact time into a test time,
    /// J/mol (80 kJ/mol, stated as a deliberate worst case).
    /// </summary>
    public const double RegulatoryActivationEnergy = 80e3;

    /// <summary>The factor k(T) / k(T_ref).</summary>
    /// <param name="activationEnergyJoulesPerMole">Ea, J/mol, &gt;= 0.</param>
    /// <param name="temperatureKelvin">T, K, &gt; 0.</param>
    /// <param name="referenceKelvin">T_ref, K, &gt; 0.</param>
    public static double Factor(double activationEnergyJoulesPerMole, double temperatureKelvin, double referenceKelvin)
        => Math.Exp(-activationEnergyJoulesPerMole / GasConstant * ((1 / temperatureKelvin) - (1 / referenceKelvin)));

    /// <summary>
    /// Test time t2 at T2 equivalent to a contact time t1 at T1: t2 = t1 exp(-(Ea/R)(1/T1 - 1/T2)).
    /// A hotter test (T2 &gt; T1) gives a shorter time.
    /// </summary>
    /// <param name="contactSeconds">t1, s.</param>
    /// <param name="contactKelvin">T1, K.</param>
    /// <param name="testKelvin">T2, K.</param>
    /// <param name="activationEnergyJoulesPerMole">Ea, J/mol; the regulation uses 80 kJ/mol.</param>
    public static double EquivalentTestSeconds(
        double contactSeconds, double contactKelvin, double testKelvin, double activationEnergyJoulesPerMole)
        => contactSeconds * Math.Exp(-activationEnergyJoulesPerMole / GasConstant * ((1 / contactKelvin) - (1 / testKelvin)));
}
