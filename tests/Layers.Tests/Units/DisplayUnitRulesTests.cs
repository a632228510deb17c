using Layers.Core.Cases;
using Layers.Core.Units;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Units;

/// <summary>
/// The one rule that picks the unit times and depths are shown in, for the console, the tables and the plots alike
/// (common practice, no source: the largest unit that keeps the duration at two or more, hours up to three days).
/// </summary>
public sealed class DisplayUnitRulesTests
{
    [Theory]
    [InlineData(60, "s")]
    [InlineData(119, "s")]
    [InlineData(120, "min")]
    [InlineData(600, "min")]
    [InlineData(7199, "min")]
    [InlineData(7200, "h")]
    [InlineData(3 * 86400, "h")]
    [InlineData(3 * 86400 + 1, "d")]
    [InlineData(10 * 86400, "d")]
    [InlineData(2 * 365.25 * 86400, "y")]
    public void Times_use_the_largest_unit_that_keeps_the_duration_at_two_or_more_with_hours_up_to_three_days(double duration, string unit)
    {
        Assert.Equal(unit, DisplayUnitRules.Time(duration).Symbol);
    }

    [Theory]
    [InlineData(65e-6, "um")]
    [InlineData(1.999e-3, "um")]
    [InlineData(2e-3, "mm")]
    [InlineData(0.05, "mm")]
    public void Depth_is_in_micrometres_below_two_millimetres_and_millimetres_above(double thickness, string unit)
    {
        Assert.Equal(unit, DisplayUnitRules.Depth(thickness).Symbol);
    }

    [Theory]
    [InlineData("2 h", "h")]
    [InlineData("2 min", "min")]
    [InlineData("3 y", "y")]
    public void A_case_read_from_a_file_shows_its_times_in_the_unit_of_the_rule(string duration, string unit)
    {
        var read = CaseReader.ReadText(CaseJson.MinimalWith(("$.duration", $"\"{duration}\"")), "case.json");

        Assert.True(read.IsValid, read.FormatErrors());
        Assert.Equal(unit, read.Case!.Display.Time.Symbol);
        Assert.Equal(read.Case.Display.Time, DisplayUnitRules.Time(read.Case.DurationSeconds));
    }
}
