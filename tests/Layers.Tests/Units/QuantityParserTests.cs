using System.Globalization;
using Layers.Core.Units;

namespace Layers.Tests.Units;

public class QuantityParserTests
{
    private static readonly Dimension[] DiffusivityOnly = [Dimension.Diffusivity];

    [Theory]
    [InlineData("50 um", 50.0, "um")]
    [InlineData("50um", 50.0, "um")]
    [InlineData("  50 \t um  ", 50.0, "um")]
    [InlineData("1e-9 cm2/s", 1e-9, "cm2/s")]
    [InlineData("1.5E+3 um", 1500.0, "um")]
    [InlineData("2e3m", 2000.0, "m")]
    [InlineData("+2 mm", 2.0, "mm")]
    [InlineData("-40 degC", -40.0, "degC")]
    [InlineData(".5 mm", 0.5, "mm")]
    [InlineData("3. h", 3.0, "h")]
    [InlineData("0.92 g/cm3", 0.92, "g/cm3")]
    [InlineData("1000 mg/kg", 1000.0, "mg/kg")]
    public void Reads_a_number_then_optional_whitespace_then_a_unit(string text, double value, string symbol)
    {
        Assert.True(QuantityParser.TryParse(text, out var quantity, out var error), error);
        Assert.Null(error);
        Assert.Equal(value, quantity.Value);
        Assert.Equal(symbol, quantity.Unit.Symbol);
    }

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("   ")]
    public void Empty_text_is_rejected_with_an_example(string? text)
    {
        AssertRejected(text, out var error);
        Assert.Contains("e.g. '50 um'", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("50")]
    [InlineData("1e-9")]
    [InlineData("  7  ")]
    public void A_number_without_unit_is_rejected(string text)
    {
        AssertRejected(text, out var error);
        Assert.Contains("a unit is required, e.g. '50 um'", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("abc mm")]
    [InlineData("mm")]
    [InlineData("five mm")]
    [InlineData("- 5 mm")]
    [InlineData("e5 mm")]
    [InlineData(". mm")]
    public void Text_that_does_not_start_with_a_number_is_rejected(string text)
    {
        AssertRejected(text, out var error);
        Assert.Contains("does not start with a number", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("NaN mm")]
    [InlineData("nan mm")]
    [InlineData("Infinity mm")]
    [InlineData("-Infinity mm")]
    [InlineData("\u221E mm")]
    [InlineData("1e999 mm")]
    [InlineData("-1e400 m")]
    public void Values_that_are_not_finite_are_rejected(string text)
    {
        AssertRejected(text, out var error);
        Assert.Contains("finite", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("1,5 mm")]
    [InlineData("1,000 mg/kg")]
    public void A_comma_in_the_number_is_rejected_with_a_hint_about_the_decimal_point(string text)
    {
        AssertRejected(text, out var error);
        Assert.Contains("use '.' as the decimal separator", error, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_unit_suggests_the_closest_symbols()
    {
        AssertRejected("5 umm", out var error);
        Assert.Contains("unknown unit 'umm'", error, StringComparison.Ordinal);
        Assert.Contains("'um'", error, StringComparison.Ordinal);
        Assert.Contains("'mm'", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("1e-9 cm2/ss", "'cm2/s'")]
    [InlineData("1e-9 cm2 / s", "'cm2/s'")]
    [InlineData("5 ML", "'mL'")]
    [InlineData("5 Kg", "'kg'")]
    [InlineData("5 mils", "'mil'")]
    [InlineData("10 dyas", "'d'")]
    [InlineData("1000 mg/kgg", "'mg/kg'")]
    public void Suggestions_name_the_canonical_symbol_of_the_nearest_spelling(string text, string suggestion)
    {
        AssertRejected(text, out var error);
        Assert.Contains("did you mean", error, StringComparison.Ordinal);
        Assert.Contains(suggestion, error, StringComparison.Ordinal);
    }

    [Fact]
    public void Suggestions_prefer_units_of_the_expected_dimension()
    {
        // "um2/" is one edit from both "um2" (an area) and "um2/s" (a diffusivity).
        Assert.False(QuantityParser.TryParse("1 um2/", DiffusivityOnly, out _, out var error));
        Assert.Contains("did you mean 'um2/s'", error, StringComparison.Ordinal);

        Assert.False(QuantityParser.TryParse("1 um2/", out _, out var unconstrained));
        Assert.Contains("did you mean 'um2'", unconstrained, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("5 furlongs")]
    [InlineData("5 %")]
    [InlineData("5 1")]
    public void A_unit_far_from_any_known_symbol_gets_examples_instead_of_suggestions(string text)
    {
        AssertRejected(text, out var error);
        Assert.Contains("unknown unit", error, StringComparison.Ordinal);
        Assert.DoesNotContain("did you mean", error, StringComparison.Ordinal);
        Assert.Contains("cm2/s", error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_quantity_of_the_wrong_dimension_names_both_dimensions_and_example_units()
    {
        Assert.False(QuantityParser.TryParse("2 mm", DiffusivityOnly, out var quantity, out var error));
        Assert.Equal(default, quantity);
        Assert.NotNull(error);
        Assert.StartsWith("'2 mm' is a length; expected a diffusion coefficient", error, StringComparison.Ordinal);
        Assert.Contains("1e-9 cm2/s", error, StringComparison.Ordinal);
        foreach (var example in UnitTable.ExamplesFor(Dimension.Diffusivity))
        {
            Assert.Contains(example, error, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void A_quantity_of_one_of_several_expected_dimensions_is_accepted()
    {
        Dimension[] expected = [Dimension.MassFraction, Dimension.MassConcentration];
        Assert.True(QuantityParser.TryParse("0.92 g/cm3", expected, out var quantity, out var error), error);
        Assert.Null(error);
        Assert.Equal(Dimension.MassConcentration, quantity.Dimension);
    }

    [Fact]
    public void The_message_for_several_expected_dimensions_names_each_of_them()
    {
        Dimension[] expected = [Dimension.MassFraction, Dimension.MassConcentration];
        Assert.False(QuantityParser.TryParse("3 h", expected, out _, out var error));
        Assert.Contains("is a time", error, StringComparison.Ordinal);
        Assert.Contains(QuantityParser.Describe(Dimension.MassFraction), error, StringComparison.Ordinal);
        Assert.Contains(QuantityParser.Describe(Dimension.MassConcentration), error, StringComparison.Ordinal);
    }

    [Fact]
    public void Errors_found_before_the_dimension_check_still_show_the_expected_dimension()
    {
        Assert.False(QuantityParser.TryParse("1e-9", DiffusivityOnly, out _, out var missingUnit));
        Assert.Contains("a unit is required, e.g. '1e-9 cm2/s'", missingUnit, StringComparison.Ordinal);

        Assert.False(QuantityParser.TryParse("1e-9 cm2/ss", DiffusivityOnly, out _, out var unknownUnit));
        Assert.Contains("expected a diffusion coefficient", unknownUnit, StringComparison.Ordinal);
    }

    [Fact]
    public void An_empty_expected_set_is_a_programming_error() =>
        Assert.Throws<ArgumentException>(() => QuantityParser.TryParse("2 mm", [], out _, out _));

    [Fact]
    public void Parsing_ignores_a_comma_decimal_current_culture()
    {
        using var scope = new CultureScope(CultureScope.German());
        // Guard: this culture would misread "1.5", so passing below proves the parser ignores it.
        Assert.False(double.TryParse("1.5", NumberStyles.Float, CultureInfo.CurrentCulture, out _));

        Assert.True(QuantityParser.TryParse("1.5 mm", out var quantity, out var error), error);
        SiReference.AssertClose(1.5 * SiReference.Milli, quantity.SiValue);
        Assert.False(QuantityParser.TryParse("1,5 mm", out _, out _));
    }

    [Fact]
    public void Describe_gives_distinct_plain_words_with_an_article_for_every_dimension()
    {
        var descriptions = Enum.GetValues<Dimension>().Select(QuantityParser.Describe).ToList();
        Assert.All(descriptions, text => Assert.Matches("^an? [a-z]", text));
        Assert.Equal(descriptions.Count, descriptions.Distinct().Count());
        Assert.Equal("a diffusion coefficient (area per time)", QuantityParser.Describe(Dimension.Diffusivity));
    }

    [Fact]
    public void Describe_of_an_undefined_dimension_throws() =>
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityParser.Describe((Dimension)999));

    [Fact]
    public void The_sample_shown_for_each_dimension_parses_as_that_dimension()
    {
        foreach (var dimension in Enum.GetValues<Dimension>().Where(d => d != Dimension.Dimensionless))
        {
            var sample = QuantityParser.SampleFor(dimension);
            Assert.True(QuantityParser.TryParse(sample, [dimension], out _, out var error), error);
        }
    }

    private static void AssertRejected(string? text, out string error)
    {
        Assert.False(QuantityParser.TryParse(text, out var quantity, out var message));
        Assert.Equal(default, quantity);
        Assert.False(string.IsNullOrWhiteSpace(message));
        error = message;
    }
}
