using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Reading <c>$.schedule</c> (docs/case-format.md, "Schedule"): periods and repeated blocks unrolled onto one clock,
/// the duration they give, and a clear error at the JSON path of each mistake.
/// </summary>
public sealed class ScheduleReaderTests
{
    [Fact]
    public void Periods_and_blocks_unroll_onto_one_clock_and_give_the_duration()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(
            ("$.duration", null),
            ("$.schedule", """
                [
                  { "name": "first use", "duration": "2 d" },
                  { "name": "week", "repeat": 2, "periods": [
                      { "name": "use", "duration": "1 d", "renew": ["right"] },
                      { "name": "rest", "duration": "6 d" } ] }
                ]
                """)));

        Assert.Empty(CaseJson.ErrorLines(read));
        var periods = read.Case!.Schedule!.Periods;
        Assert.Equal(["first use", "use 1 of 2", "rest 1 of 2", "use 2 of 2", "rest 2 of 2"], periods.Select(period => period.Label));
        Assert.Equal([0, 2, 3, 9, 10], periods.Select(period => period.StartSeconds / 86400));
        Assert.Equal(16 * 86400, read.Case.DurationSeconds, 6);
        Assert.Equal([2 * 86400.0, 9 * 86400.0], read.Case.Schedule.RenewalTimes(Side.Right));
        Assert.Equal(periods[1].Slot, periods[3].Slot);
        Assert.NotEqual(periods[1].Slot, periods[2].Slot);
    }

    [Theory]
    [InlineData("""[ { "duration": "10 d", "repeat": 2 } ]""", "$.duration: is 10 d but the schedule's periods last 20 d in all; they must agree")]
    [InlineData("""[ { "duration": "5 d", "renew": ["right", "middle"] } ]""", "$.schedule[0].renew[1]: expected \"left\" or \"right\"; found the string \"middle\"")]
    [InlineData("""[ { "repeat": 2, "periods": [ { "repeat": 2, "periods": [ { "duration": "1 d" } ] } ] } ]""", "$.schedule[0].periods[0]: a block's periods cannot hold another block; repeat the inner periods in the outer block instead")]
    [InlineData("""[ { "duration": "1 h", "repeat": 600 }, { "duration": "1 h", "repeat": 600 } ]""", "$.schedule[1]: the schedule would run more than 1000 periods (repetitions counted); shorten it or run it in parts")]
    [InlineData("""[]""", "$.schedule: expected a non-empty array of periods such as [ { \"name\": \"contact\", \"duration\": \"10 d\", \"renew\": [\"right\"], \"repeat\": 3 } ]; found an empty array")]
    [InlineData("""[ { "duration": "10 d", "refresh": ["right"] } ]""", "$.schedule[0].refresh")]
    public void A_mistake_is_reported_at_its_path(string schedule, string expected)
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(("$.schedule", schedule)));

        Assert.Null(read.Case);
        Assert.Contains(CaseJson.ErrorLines(read), line => line.StartsWith(expected, StringComparison.Ordinal));
    }

    [Fact]
    public void Only_a_compartment_can_be_renewed()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(
            ("$.left", """{ "kind": "bath", "concentration": "0 mg/L" }"""),
            ("$.schedule", """[ { "duration": "10 d", "renew": ["left", "right"] } ]""")));

        Assert.Equal(
            ["$.schedule[0].renew[0]: cannot renew the left face: it is a bath, whose concentration never changes unless the renewal gives it another, e.g. { \"face\": \"left\", \"concentration\": \"2 mg/mL\" }"],
            CaseJson.ErrorLines(read));
    }
}
