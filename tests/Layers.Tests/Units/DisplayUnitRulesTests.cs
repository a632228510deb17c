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

    [Theory]
    [InlineData(10 * 86400, new[] { 2 * 3600.0, 86400, 10 * 86400 }, "h")] // 2 h would read 0.08333 d: hours, 240 h
    [InlineData(10 * 86400, new[] { 86400.0, 10 * 86400 }, "d")] // 1 d reads well in days
    [InlineData(12 * 3600, new[] { 0.12 * 3600, 12 * 3600 }, "h")] // 0.12 h is not 0.0x: hours stay
    [InlineData(180 * 86400, new[] { 2 * 3600.0, 30 * 86400 }, "h")] // 4320 h is within 10^4 of it
    [InlineData(10 * 365.25 * 86400, new[] { 60.0, 86400 }, "y")] // no unit keeps 10 y within 10^4 and 1 min at 0.1: the duration rule
    [InlineData(5 * 86400, new[] { 0.05 * 86400, 86400 }, "h")] // 0.05 d is 1.2 h
    [InlineData(5 * 86400, new double[0], "d")] // no report times written: the duration rule
    public void One_time_unit_per_run_also_reads_the_shortest_report_time(double duration, double[] reportTimes, string unit)
    {
        Assert.Equal(unit, DisplayUnitRules.Time(duration, reportTimes).Symbol);
    }

    [Theory]
    [InlineData(0.2, "d", "s")] // a time to 50 % of 0.2 s in a days run: seconds, not 2.3E-06 d
    [InlineData(30.74, "h", "s")]
    [InlineData(500, "d", "min")]
    [InlineData(0.02 * 86400, "d", "d")] // 0.02 d still reads in the run's unit
    [InlineData(9999 * 3600.0, "h", "h")]
    [InlineData(5335 * 86400.0, "h", "y")] // 1.28E+05 h: the duration rule gives 14.61 y
    [InlineData(500 * 86400.0, "min", "d")]
    [InlineData(0, "d", "d")]
    public void A_figure_far_from_the_run_unit_is_shown_in_its_own(double seconds, string runUnit, string unit)
    {
        Assert.Equal(unit, DisplayUnitRules.TimeFigure(seconds, UnitTable.Get(runUnit)).Symbol);
    }

    [Fact]
    public void A_case_with_a_display_time_keeps_it_whatever_its_report_times()
    {
        var read = CaseReader.ReadText(CaseJson.MinimalWith(("$.duration", "\"10 d\""), ("$.reportTimes", "[\"2 h\", \"10 d\"]"), ("$.display", "{ \"time\": \"d\" }")), "case.json");

        Assert.True(read.IsValid, read.FormatErrors());
        Assert.Equal("d", read.Case!.Display.Time.Symbol);
    }
}
