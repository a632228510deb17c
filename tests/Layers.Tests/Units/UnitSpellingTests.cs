using Layers.Core.Units;

namespace Layers.Tests.Units;

/// <summary>
/// One spelling of the micro prefix in texts for people (issue #20, point 2): the SI prefix symbol µ (BIPM, The
/// International System of Units, 9th edition 2019, Table 7), while inputs keep accepting the ASCII u.
/// </summary>
public sealed class UnitSpellingTests
{
    [Theory]
    [InlineData("ug/cm2", "\u00B5g/cm2")]
    [InlineData("ug/cm2/h", "\u00B5g/cm2/h")]
    [InlineData("mg/kg", "mg/kg")]
    [InlineData("um", "\u00B5m")]
    [InlineData("ug/mL", "\u00B5g/mL")]
    [InlineData("h", "h")]
    [InlineData("mg/dm2/d", "mg/dm2/d")]
    public void The_micro_prefix_is_written_as_the_micro_sign(string symbol, string expected)
    {
        Assert.Equal(expected, UnitSpelling.ForPeople(symbol));
        Assert.Equal(expected, UnitTable.Get(symbol).ForPeople);
    }

    [Fact]
    public void The_people_spelling_reads_back_as_the_same_unit() =>
        Assert.Equal(UnitTable.Get("ug/cm2"), UnitTable.Get(UnitSpelling.ForPeople("ug/cm2")));
}
