using Layers.Core.Units;
using Layers.Plotting;
using Layers.Tests.Units;

namespace Layers.Tests.Plotting;

/// <summary>How the plots write units, times and numbers (common practice, no source).</summary>
public sealed class DisplayTextTests
{
    [Theory]
    [InlineData("um", "\u00B5m")]
    [InlineData("mg/dm2", "mg/dm\u00B2")]
    [InlineData("ug/cm2", "\u00B5g/cm\u00B2")]
    [InlineData("kg/m3", "kg/m\u00B3")]
    [InlineData("mg/L", "mg/L")]
    [InlineData("uL", "\u00B5L")]
    [InlineData("degC", "\u00B0C")]
    [InlineData("min", "min")]
    public void Units_are_written_with_micro_sign_and_superscripts(string symbol, string expected)
    {
        Assert.Equal(expected, DisplayText.Unit(symbol));
    }

    [Theory]
    [InlineData(7200, "h", "2\u00A0h")]
    [InlineData(86400, "h", "24\u00A0h")] // a 24 h run says "after 24 h", not "after 1 d"
    [InlineData(129600, "d", "1.5\u00A0d")]
    [InlineData(90, "min", "1.5\u00A0min")]
    [InlineData(0.5, "d", "0.5\u00A0s")] // far below the run's unit: its own, named
    [InlineData(6538.6, "h", "1.82\u00A0h")]
    public void Times_are_written_in_the_run_unit_unless_far_from_it(double seconds, string runUnit, string expected)
    {
        Assert.Equal(expected, DisplayText.Time(seconds, UnitTable.Get(runUnit)));
    }

    [Theory]
    [InlineData(0.458, "0.458")]
    [InlineData(1115, "1120")]
    [InlineData(99940, "99900")]
    [InlineData(99960, "10\u2075")]
    [InlineData(-0.0123456, "-0.0123")]
    [InlineData(2.5e-5, "2.5\u00D710\u207B\u2075")]
    [InlineData(1e6, "10\u2076")]
    [InlineData(0, "0")]
    public void Numbers_keep_three_significant_digits_in_plain_or_power_of_ten_notation(double value, string expected)
    {
        using var _ = new CultureScope(CultureScope.German());
        Assert.Equal(expected, DisplayText.Number(value));
    }

    [Theory]
    [InlineData(0.30000000000000004, "0.3")]
    [InlineData(1e-5, "10\u207B\u2075")]
    [InlineData(2e-5, "2\u00D710\u207B\u2075")]
    [InlineData(100000, "10\u2075")]
    [InlineData(-0.5, "-0.5")]
    public void Tick_labels_drop_rounding_noise(double value, string expected)
    {
        Assert.Equal(expected, DisplayText.Tick(value));
    }
}
