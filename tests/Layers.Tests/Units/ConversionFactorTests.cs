using Layers.Core.Units;

namespace Layers.Tests.Units;

/// <summary>
/// Each expected SI value is written from the SI definitions (BIPM SI Brochure, 9th ed., 2019), not read
/// from the unit table, so a wrong factor in the table fails here.
/// </summary>
public class ConversionFactorTests
{
    [Theory]
    // SI Brochure, Table 7 (prefixes).
    [InlineData("1 m", 1.0)]
    [InlineData("1 dm", 1e-1)]
    [InlineData("1 cm", 1e-2)]
    [InlineData("1 mm", 1e-3)]
    [InlineData("1 um", 1e-6)]
    [InlineData("1 nm", 1e-9)]
    [InlineData("50 um", 5e-5)]
    // Film gauge, common practice, no source: 1 mil = 0.001 inch, with the inch fixed at 25.4 mm.
    [InlineData("1 mil", 0.001 * 25.4e-3)]
    public void Lengths_convert_to_metres(string text, double expectedMetres) =>
        AssertSiValue(text, Dimension.Length, expectedMetres);

    [Theory]
    // SI Brochure, Table 7 (prefixes), squared.
    [InlineData("1 m2", 1.0)]
    [InlineData("1 dm2", 1e-2)]
    [InlineData("1 cm2", 1e-4)]
    [InlineData("1 mm2", 1e-6)]
    [InlineData("1 um2", 1e-12)]
    public void Areas_convert_to_square_metres(string text, double expectedSquareMetres) =>
        AssertSiValue(text, Dimension.Area, expectedSquareMetres);

    [Theory]
    // SI Brochure, Table 7 (prefixes), cubed; Table 8: 1 L = 1 dm3 = 1e-3 m3.
    [InlineData("1 m3", 1.0)]
    [InlineData("1 dm3", 1e-3)]
    [InlineData("1 cm3", 1e-6)]
    [InlineData("1 mm3", 1e-9)]
    [InlineData("1 L", 1e-3)]
    [InlineData("1 dL", 1e-4)]
    [InlineData("1 mL", 1e-6)]
    [InlineData("1 uL", 1e-9)]
    public void Volumes_convert_to_cubic_metres(string text, double expectedCubicMetres) =>
        AssertSiValue(text, Dimension.Volume, expectedCubicMetres);

    [Theory]
    // SI Brochure, Table 8: 1 min = 60 s, 1 h = 3600 s, 1 d = 86400 s.
    [InlineData("1 s", 1.0)]
    [InlineData("1 min", 60.0)]
    [InlineData("1 h", 3600.0)]
    [InlineData("1 d", 86400.0)]
    [InlineData("10 d", 864000.0)]
    // Common practice, no source: a week is 7 d, a year is the Julian year of 365.25 d.
    [InlineData("1 wk", 7 * 86400.0)]
    [InlineData("1 y", 365.25 * 86400.0)]
    public void Times_convert_to_seconds(string text, double expectedSeconds) =>
        AssertSiValue(text, Dimension.Time, expectedSeconds);

    [Theory]
    // The kilogram is the SI base unit; Table 7 prefixes apply to the gram.
    [InlineData("1 kg", 1.0)]
    [InlineData("1 g", 1e-3)]
    [InlineData("1 mg", 1e-6)]
    [InlineData("1 ug", 1e-9)]
    [InlineData("1 ng", 1e-12)]
    public void Masses_convert_to_kilograms(string text, double expectedKilograms) =>
        AssertSiValue(text, Dimension.Mass, expectedKilograms);

    [Theory]
    // Table 7 prefixes over Table 8 time units.
    [InlineData("1 m2/s", 1.0)]
    [InlineData("1 cm2/s", 1e-4)]
    [InlineData("1 mm2/s", 1e-6)]
    [InlineData("1 um2/s", 1e-12)]
    [InlineData("1e-9 cm2/s", 1e-13)]
    [InlineData("1 cm2/h", 1e-4 / 3600)]
    [InlineData("1 cm2/d", 1e-4 / 86400)]
    [InlineData("1 mm2/min", 1e-6 / 60)]
    public void Diffusivities_convert_to_square_metres_per_second(string text, double expected) =>
        AssertSiValue(text, Dimension.Diffusivity, expected);

    [Theory]
    // Mass over volume: Table 7 prefixes, Table 8 litre.
    [InlineData("1 kg/m3", 1.0)]
    [InlineData("1 g/cm3", 1000.0)]
    [InlineData("0.92 g/cm3", 920.0)]
    [InlineData("1 g/L", 1.0)]
    [InlineData("1 g/mL", 1000.0)]
    [InlineData("1 mg/L", 1e-3)]
    [InlineData("1 ug/L", 1e-6)]
    [InlineData("1 mg/mL", 1.0)]
    [InlineData("1 ug/mL", 1e-3)]
    [InlineData("1 ng/mL", 1e-6)]
    [InlineData("1 mg/dm3", 1e-3)]
    [InlineData("1 mg/cm3", 1.0)]
    [InlineData("1 ug/cm3", 1e-3)]
    public void Mass_concentrations_convert_to_kilograms_per_cubic_metre(string text, double expected) =>
        AssertSiValue(text, Dimension.MassConcentration, expected);

    [Theory]
    // Mass over mass; ppm and ppb are the usual 1e-6 and 1e-9 by mass, % w/w is 1e-2.
    [InlineData("1 mg/kg", 1e-6)]
    [InlineData("1000 mg/kg", 1e-3)]
    [InlineData("1 ug/kg", 1e-9)]
    [InlineData("1 g/kg", 1e-3)]
    [InlineData("1 kg/kg", 1.0)]
    [InlineData("1 g/g", 1.0)]
    [InlineData("1 ug/g", 1e-6)]
    [InlineData("1 ppm", 1e-6)]
    [InlineData("1 ppb", 1e-9)]
    [InlineData("5 % w/w", 0.05)]
    [InlineData("5 wt%", 0.05)]
    public void Mass_fractions_convert_to_kilograms_per_kilogram(string text, double expected) =>
        AssertSiValue(text, Dimension.MassFraction, expected);

    [Theory]
    [InlineData("1 m/s", 1.0)]
    [InlineData("1 cm/s", 1e-2)]
    [InlineData("1 mm/s", 1e-3)]
    [InlineData("1 um/s", 1e-6)]
    [InlineData("1 cm/h", 1e-2 / 3600)]
    [InlineData("1 m/h", 1.0 / 3600)]
    [InlineData("1 cm/d", 1e-2 / 86400)]
    public void Velocities_convert_to_metres_per_second(string text, double expected) =>
        AssertSiValue(text, Dimension.Velocity, expected);

    [Theory]
    [InlineData("1 kg/m2", 1.0)]
    [InlineData("1 g/m2", 1e-3)]
    [InlineData("1 mg/dm2", 1e-4)]
    [InlineData("10 mg/dm2", 1e-3)]
    [InlineData("1 mg/cm2", 1e-2)]
    [InlineData("1 ug/cm2", 1e-5)]
    public void Masses_per_area_convert_to_kilograms_per_square_metre(string text, double expected) =>
        AssertSiValue(text, Dimension.MassPerArea, expected);

    [Theory]
    // 1 ug/cm2 = 1e-9 kg / 1e-4 m2 = 1e-5 kg/m2; then per hour or per day from Table 8.
    [InlineData("1 kg/m2/s", 1.0)]
    [InlineData("1 ug/cm2/h", 1e-5 / 3600)]
    [InlineData("1 mg/dm2/d", 1e-4 / 86400)]
    [InlineData("1 ug/(cm2 h)", 1e-5 / 3600)]
    public void Mass_fluxes_convert_to_kilograms_per_square_metre_second(string text, double expected) =>
        AssertSiValue(text, Dimension.MassFlux, expected);

    [Theory]
    // SI Brochure, section 2.3.1 and Table 4: T/K = t/°C + 273.15.
    [InlineData("300 K", 300.0)]
    [InlineData("25 C", 298.15)]
    [InlineData("0 degC", 273.15)]
    [InlineData("-273.15 degC", 0.0)]
    [InlineData("40 °C", 313.15)]
    public void Temperatures_convert_to_kelvin(string text, double expectedKelvin)
    {
        var quantity = Parse(text);
        Assert.Equal(Dimension.Temperature, quantity.Dimension);
        // Absolute tolerance: relative tolerance is meaningless at 0 K.
        Assert.Equal(expectedKelvin, quantity.SiValue, 1e-9);
    }

    [Theory]
    [InlineData("1 J/mol", 1.0)]
    [InlineData("1 kJ/mol", 1e3)]
    [InlineData("80 kJ/mol", 8e4)]
    // Thermochemical calorie, 4.184 J exactly (NIST Special Publication 811, 2008, appendix B).
    [InlineData("1 kcal/mol", 4184.0)]
    public void Molar_energies_convert_to_joules_per_mole(string text, double expected) =>
        AssertSiValue(text, Dimension.MolarEnergy, expected);

    private static void AssertSiValue(string text, Dimension dimension, double expectedSi)
    {
        var quantity = Parse(text);
        Assert.Equal(dimension, quantity.Dimension);
        SiReference.AssertClose(expectedSi, quantity.SiValue);
    }

    private static Quantity Parse(string text)
    {
        Assert.True(QuantityParser.TryParse(text, out var quantity, out var error), error);
        return quantity;
    }
}
