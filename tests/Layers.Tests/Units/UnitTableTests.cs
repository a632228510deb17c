using Layers.Core.Units;

namespace Layers.Tests.Units;

public class UnitTableTests
{
    [Theory]
    // Micro sign U+00B5, Greek mu U+03BC and plain u.
    [InlineData("\u00B5m", "um")]
    [InlineData("\u03BCm", "um")]
    [InlineData("\u00B5g/kg", "ug/kg")]
    [InlineData("\u03BCL", "uL")]
    // Superscripts and carets.
    [InlineData("cm\u00B2/s", "cm2/s")]
    [InlineData("cm^2/s", "cm2/s")]
    [InlineData("\u03BCm\u00B2/s", "um2/s")]
    [InlineData("um^2/s", "um2/s")]
    [InlineData("g/cm\u00B3", "g/cm3")]
    [InlineData("g/cm^3", "g/cm3")]
    [InlineData("m\u00B3", "m3")]
    [InlineData("mg/dm\u00B2", "mg/dm2")]
    // Lower-case litre.
    [InlineData("l", "L")]
    [InlineData("ml", "mL")]
    [InlineData("mg/ml", "mg/mL")]
    [InlineData("g/l", "g/L")]
    // Long time forms.
    [InlineData("sec", "s")]
    [InlineData("seconds", "s")]
    [InlineData("minutes", "min")]
    [InlineData("hr", "h")]
    [InlineData("hour", "h")]
    [InlineData("hours", "h")]
    [InlineData("day", "d")]
    [InlineData("days", "d")]
    [InlineData("week", "wk")]
    [InlineData("weeks", "wk")]
    [InlineData("year", "y")]
    [InlineData("years", "y")]
    [InlineData("cm2/day", "cm2/d")]
    [InlineData("cm/hr", "cm/h")]
    // Mass fractions and temperatures.
    [InlineData("%w/w", "% w/w")]
    [InlineData("wt%", "% w/w")]
    [InlineData("C", "degC")]
    [InlineData("\u00B0C", "degC")]
    // Mass flux with a bracketed denominator.
    [InlineData("ug/(cm2 h)", "ug/cm2/h")]
    [InlineData("mg/(dm2 d)", "mg/dm2/d")]
    // Surrounding whitespace.
    [InlineData("  um \t", "um")]
    public void Alias_spellings_resolve_to_the_canonical_unit(string alias, string canonical)
    {
        Assert.True(UnitTable.TryFind(alias, out var viaAlias));
        Assert.Same(UnitTable.Get(canonical), viaAlias);
        Assert.Equal(canonical, viaAlias.Symbol);
    }

    [Theory]
    [InlineData("3 \u00B5m", "3 um")]
    [InlineData("2e-9 cm\u00B2/s", "2e-9 cm2/s")]
    [InlineData("2e-9 cm^2/s", "2e-9 cm2/s")]
    [InlineData("4 hours", "4 h")]
    [InlineData("4 hr", "4 h")]
    [InlineData("5 days", "5 d")]
    [InlineData("2 weeks", "2 wk")]
    [InlineData("1 year", "1 y")]
    [InlineData("0.5 mg/ml", "0.5 mg/mL")]
    [InlineData("25 \u00B0C", "25 degC")]
    [InlineData("25 C", "25 degC")]
    [InlineData("2 wt%", "2 % w/w")]
    [InlineData("2 %w/w", "2 % w/w")]
    [InlineData("7 ug/(cm2 h)", "7 ug/cm2/h")]
    public void Alias_spellings_parse_to_the_same_SI_value(string alias, string canonical)
    {
        Assert.True(QuantityParser.TryParse(alias, out var viaAlias, out var aliasError), aliasError);
        Assert.True(QuantityParser.TryParse(canonical, out var viaCanonical, out var canonicalError), canonicalError);
        Assert.Equal(viaCanonical.SiValue, viaAlias.SiValue);
        Assert.Equal(viaCanonical.Unit, viaAlias.Unit);
    }

    [Theory]
    [InlineData("ML")]
    [InlineData("Mm")]
    [InlineData("KG")]
    [InlineData("k")]
    [InlineData("CM2/S")]
    public void Lookup_is_case_sensitive(string symbol) => Assert.False(UnitTable.TryFind(symbol, out _));

    [Theory]
    [InlineData("")]
    [InlineData("   ")]
    [InlineData("1")]
    [InlineData("%")]
    [InlineData("cm2 / s")]
    [InlineData("cm2/s/s")]
    [InlineData("mil/s")]
    [InlineData("cm2/wk")]
    public void Symbols_outside_the_table_are_not_found(string symbol) =>
        Assert.False(UnitTable.TryFind(symbol, out _));

    [Fact]
    public void A_null_symbol_is_not_found() => Assert.False(UnitTable.TryFind(null!, out _));

    [Fact]
    public void Get_of_an_unknown_symbol_lists_the_accepted_units()
    {
        var exception = Assert.Throws<ArgumentException>(() => UnitTable.Get("furlong"));
        Assert.Contains("furlong", exception.Message, StringComparison.Ordinal);
        Assert.Contains("um2/s", exception.Message, StringComparison.Ordinal);
        Assert.Contains("mg/kg", exception.Message, StringComparison.Ordinal);
        Assert.Contains("degC", exception.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_canonical_entry_is_found_under_its_own_symbol()
    {
        foreach (var unit in UnitTable.All)
        {
            Assert.True(UnitTable.TryFind(unit.Symbol, out var found), unit.Symbol);
            Assert.Same(unit, found);
        }
    }

    [Fact]
    public void Canonical_symbols_are_unique() =>
        Assert.Equal(UnitTable.All.Count, UnitTable.All.Select(unit => unit.Symbol).Distinct().Count());

    [Fact]
    public void Every_dimension_with_a_unit_written_has_units_and_dimensionless_has_none()
    {
        foreach (var dimension in Enum.GetValues<Dimension>())
        {
            var count = UnitTable.All.Count(unit => unit.Dimension == dimension);
            Assert.True(dimension == Dimension.Dimensionless ? count == 0 : count > 0, dimension.ToString());
        }
    }

    [Fact]
    public void Only_celsius_has_an_offset()
    {
        var offset = Assert.Single(UnitTable.All, unit => unit.OffsetToSi != 0);
        Assert.Equal("degC", offset.Symbol);
    }

    [Fact]
    public void Examples_are_canonical_symbols_of_the_requested_dimension()
    {
        foreach (var dimension in Enum.GetValues<Dimension>())
        {
            var examples = UnitTable.ExamplesFor(dimension);
            Assert.InRange(examples.Count, dimension == Dimension.Dimensionless ? 0 : 2, 8);
            foreach (var symbol in examples)
            {
                Assert.True(UnitTable.TryFind(symbol, out var unit), symbol);
                Assert.Equal(symbol, unit.Symbol);
                Assert.Equal(dimension, unit.Dimension);
            }
        }
    }

    [Fact]
    public void Length_examples_are_the_common_packaging_lengths() =>
        Assert.Equal(["um", "mm", "cm", "m"], UnitTable.ExamplesFor(Dimension.Length));

    [Fact]
    public void Examples_for_an_undefined_dimension_throw() =>
        Assert.Throws<ArgumentOutOfRangeException>(() => UnitTable.ExamplesFor((Dimension)999));
}
