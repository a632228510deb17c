namespace Layers.Core.FoodContact;

/// <summary>
/// The published upper-bound correlation for the diffusion coefficient of an additive in a polymer, designed to
/// over-predict migration:
/// D_P = 1e4 exp(A_P' - tau/T - 0.1351 Mr^(2/3) + 0.003 Mr - 10454/T) cm2/s, with A_P = A_P' - tau/T.
/// </summary>
/// <remarks>
/// Form of the equation: Begley et al., Food Addit. Contam. 22 (2005) 73-90 (citation checked; the numerical
/// constants of the equation are recalled from memory and match the form quoted in the EU modelling guidance,
/// JRC EUR 27529 EN (2015)). The polymer constants live in <c>FoodContact/polymer-constants.json</c> with their
/// source; see <see cref="PolymerTable"/>.
/// </remarks>
public static class UpperBoundDiffusivity
{
    /// <summary>Coefficient of Mr^(2/3).</summary>
    public const double MolarMassTwoThirdsCoefficient = 0.1351;

    /// <summary>Coefficient of Mr.</summary>
    public const double MolarMassCoefficient = 0.003;

    /// <summary>Temperature term, K.</summary>
    public const double TemperatureTermKelvin = 10454;

    /// <summary>D_P in m2/s.</summary>
    /// <param name="polymer">A_P' and tau of the polymer.</param>
    /// <param name="relativeMolarMass">Mr of the migrant (g/mol as a plain number), &gt; 0.</param>
    /// <param name="temperatureKelvin">T, K, &gt; 0.</param>
    public static double SquareMetersPerSecond(PolymerConstants polymer, double relativeMolarMass, double temperatureKelvin)
    {
        ArgumentNullException.ThrowIfNull(polymer);
        var exponent = polymer.APrime - (polymer.TauKelvin / temperatureKelvin)
            - (MolarMassTwoThirdsCoefficient * Math.Pow(relativeMolarMass, 2.0 / 3.0))
            + (MolarMassCoefficient * relativeMolarMass)
            - (TemperatureTermKelvin / temperatureKelvin);
        const double squareCentimeter = 1e-4;
        return 1e4 * Math.Exp(exponent) * squareCentimeter;
    }
}
