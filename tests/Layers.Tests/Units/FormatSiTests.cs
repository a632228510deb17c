using Layers.Core.Units;

namespace Layers.Tests.Units;

public class FormatSiTests
{
    [Theory]
    [InlineData(5e-5, "um")]
    [InlineData(1e-13, "cm2/s")]
    [InlineData(2.5e-14, "um2/s")]
    [InlineData(920.0, "g/cm3")]
    [InlineData(1e-3, "mg/kg")]
    [InlineData(310.15, "degC")]
    [InlineData(-7.5e-9, "ug/cm2/h")]
    [InlineData(864000.0, "d")]
    [InlineData(0.0, "mm")]
    public void Formatted_values_parse_back_to_the_same_SI_value(double siValue, string symbol)
    {
        var unit = UnitTable.Get(symbol);
        AssertRoundTrip(siValue, unit, 4, 5e-4);
        AssertRoundTrip(siValue, unit, 15, 1e-13);
    }

    [Fact]
    public void Fifty_micrometres_are_shown_as_50_um() =>
        Assert.Equal("50 um", QuantityParser.FormatSi(50 * SiReference.Micro, UnitTable.Get("um")));

    [Fact]
    public void Significant_digits_round_the_displayed_value()
    {
        var millimetre = UnitTable.Get("mm");
        Assert.Equal("1.235 mm", QuantityParser.FormatSi(1.23456e-3, millimetre));
        Assert.Equal("1.2 mm", QuantityParser.FormatSi(1.23456e-3, millimetre, 2));
    }

    [Fact]
    public void Celsius_display_subtracts_the_offset() =>
        Assert.Equal("25 degC", QuantityParser.FormatSi(298.15, UnitTable.Get("\u00B0C")));

    [Fact]
    public void The_canonical_symbol_is_shown_for_a_unit_found_by_alias() =>
        Assert.Equal("1 uL", QuantityParser.FormatSi(1e-9, UnitTable.Get("\u03BCl")));

    [Fact]
    public void Formatting_uses_invariant_culture_under_a_comma_decimal_culture()
    {
        using var scope = new CultureScope(CultureScope.German());
        Assert.Equal("1.5 mm", QuantityParser.FormatSi(1.5e-3, UnitTable.Get("mm")));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(18)]
    public void Significant_digits_outside_1_to_17_are_refused(int digits) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityParser.FormatSi(1, UnitTable.Get("m"), digits));

    private static void AssertRoundTrip(double siValue, UnitDefinition unit, int digits, double relativeTolerance)
    {
        var text = QuantityParser.FormatSi(siValue, unit, digits);
        Assert.True(QuantityParser.TryParse(text, out var parsed, out var error), error);
        Assert.Equal(unit, parsed.Unit);
        Assert.Equal(siValue, parsed.SiValue, Math.Max(Math.Abs(siValue) * relativeTolerance, 1e-300));
    }
}
