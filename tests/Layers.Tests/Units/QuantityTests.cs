using Layers.Core.Units;

namespace Layers.Tests.Units;

public class QuantityTests
{
    [Fact]
    public void SiValue_and_Dimension_come_from_the_unit()
    {
        var quantity = new Quantity(50, UnitTable.Get("um"));
        SiReference.AssertClose(50 * SiReference.Micro, quantity.SiValue);
        Assert.Equal(Dimension.Length, quantity.Dimension);
    }

    [Fact]
    public void ToString_writes_value_space_canonical_symbol()
    {
        var quantity = new Quantity(50, UnitTable.Get("\u00B5m"));
        Assert.Equal("50 um", quantity.ToString());
    }

    [Fact]
    public void ToString_uses_invariant_culture_under_a_comma_decimal_culture()
    {
        using var scope = new CultureScope(CultureScope.German());
        var quantity = new Quantity(1.5, UnitTable.Get("mm"));
        Assert.Equal("1.5 mm", quantity.ToString());
    }

    [Theory]
    [InlineData(1e-9, "cm2/s")]
    [InlineData(-12.25, "degC")]
    [InlineData(0.1, "% w/w")]
    [InlineData(123456789.125, "ug/cm2/h")]
    public void ToString_parses_back_to_an_equal_quantity(double value, string symbol)
    {
        var quantity = new Quantity(value, UnitTable.Get(symbol));
        Assert.True(QuantityParser.TryParse(quantity.ToString(), out var parsed, out var error), error);
        Assert.Equal(quantity, parsed);
    }
}
