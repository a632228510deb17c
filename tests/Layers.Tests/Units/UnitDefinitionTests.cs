using Layers.Core.Units;

namespace Layers.Tests.Units;

public class UnitDefinitionTests
{
    [Fact]
    public void ToSi_scales_then_adds_the_offset()
    {
        var unit = new UnitDefinition("x", Dimension.Length, 2, 3);
        Assert.Equal(13, unit.ToSi(5));
    }

    [Fact]
    public void FromSi_removes_the_offset_then_unscales()
    {
        var unit = new UnitDefinition("x", Dimension.Length, 2, 3);
        Assert.Equal(5, unit.FromSi(13));
    }

    [Fact]
    public void The_offset_defaults_to_zero()
    {
        var unit = new UnitDefinition("x", Dimension.Mass, 4);
        Assert.Equal(0, unit.OffsetToSi);
        Assert.Equal(8, unit.ToSi(2));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void A_factor_that_is_not_finite_and_positive_is_refused(double factor) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => new UnitDefinition("x", Dimension.Length, factor));

    [Theory]
    [InlineData(-3.5)]
    [InlineData(0.0)]
    [InlineData(1.0)]
    [InlineData(1234.5)]
    public void FromSi_undoes_ToSi_for_every_unit_in_the_table(double value)
    {
        foreach (var unit in UnitTable.All)
        {
            var back = unit.FromSi(unit.ToSi(value));
            Assert.True(Math.Abs(back - value) <= 1e-12 * Math.Max(1, Math.Abs(value)), unit.Symbol);
        }
    }
}
