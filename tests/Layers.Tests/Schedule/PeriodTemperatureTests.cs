using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Temperatures given by the periods of a schedule stand for <c>foodContact.stages</c> (docs/case-format.md,
/// "Schedule"): consecutive periods at one temperature make one stage, a period without one keeps the one before, and
/// the run equals the same case written with stages. The scenario is invented.
/// </summary>
public sealed class PeriodTemperatureTests
{
    private const string Layers = """[ { "name": "wall", "thickness": "200 um", "initialConcentration": "300 mg/kg", "density": "0.9 g/cm3" } ]""";
    private const string Diffusion = """{ "wall": { "polymer": "LDPE", "relativeMolarMass": 350 } }""";

    [Fact]
    public void Periods_at_one_temperature_make_one_stage_and_a_period_without_one_keeps_the_one_before()
    {
        var read = CaseJson.Read(Case(
            """
            [
              { "name": "hot fill", "duration": "2 h", "temperature": "70 degC" },
              { "name": "contact", "duration": "10 d", "renew": ["right"], "temperature": "40 degC", "repeat": 2 },
              { "name": "rest", "duration": "1 d" }
            ]
            """,
            stages: null));

        Assert.Empty(CaseJson.ErrorLines(read));
        var stages = read.Case!.FoodContact!.Stages;
        Assert.Equal(["hot fill", "contact 1 of 2 to rest"], stages.Select(stage => stage.Name));
        Assert.Equal([2 * 3600.0, 21 * 86400.0], stages.Select(stage => stage.DurationSeconds));
        Assert.Equal([343.15, 313.15], stages.Select(stage => stage.TemperatureKelvin), new ToleranceComparer(1e-9));
    }

    [Fact]
    public void A_run_with_period_temperatures_equals_the_same_case_written_with_stages()
    {
        const string periods = """[ { "name": "contact", "duration": "5 d", "renew": ["right"], "temperature": "40 degC", "repeat": 3 } ]""";
        const string plain = """[ { "name": "contact", "duration": "5 d", "renew": ["right"], "repeat": 3 } ]""";
        var byPeriods = Simulator.Run(CaseJson.Read(Case(periods, stages: null)).Case!);
        var byStages = Simulator.Run(CaseJson.Read(Case(plain, stages: """[ { "name": "test", "duration": "15 d", "temperature": "40 degC" } ]""")).Case!);

        Assert.Equal(byStages.Schedule!.RepeatedUse!.Contacts, byPeriods.Schedule!.RepeatedUse!.Contacts);
        Assert.Equal(byStages.FoodContact!.FinalConcentration, byPeriods.FoodContact!.FinalConcentration);
    }

    [Fact]
    public void A_renewal_where_the_temperature_changes_empties_the_medium_the_next_stage_starts_with()
    {
        // The renewal at 2 h falls on the boundary between the two stages: the mass balance closes only if the next
        // stage starts from the emptied medium (Fick's law conserves mass; what the renewal took is accounted for).
        var read = CaseJson.Read(Case(
            """
            [
              { "name": "hot fill", "duration": "2 h", "temperature": "70 degC" },
              { "name": "contact", "duration": "10 d", "renew": ["right"], "temperature": "40 degC", "repeat": 2 }
            ]
            """,
            stages: null));
        var result = Simulator.Run(read.Case!);

        Assert.True(result.Completed, result.FailureReason);
        var schedule = result.Schedule!;
        var hotFill = schedule.Periods[0].Media.Single();
        var carried = schedule.Periods.SkipLast(1).Sum(period => period.Media.Single().ConcentrationAtEndKgPerCubicMeter) * 1e-3 / 0.06;
        Tolerance.Relative(carried, schedule.Renewed.Single().CarriedAwayKgPerSquareMeter, 1e-12, "carried away by the two renewals");
        Assert.True(schedule.Periods[1].Media.Single().ReceivedKgPerSquareMeter < hotFill.ReceivedKgPerSquareMeter);
        Assert.True(result.WorstMassBalanceError < 1e-9);
    }

    [Theory]
    [InlineData("""[ { "duration": "1 d" }, { "duration": "1 d", "temperature": "40 degC" } ]""", null, "$.schedule[0].temperature: is required in the first period")]
    [InlineData("""[ { "duration": "1 d", "temperature": "40 degC" } ]""", """[ { "duration": "1 d", "temperature": "40 degC" } ]""", "$.foodContact.stages: must be left out: the periods of $.schedule give the temperatures")]
    public void Mistakes_are_reported_at_their_path(string schedule, string? stages, string expected)
    {
        var read = CaseJson.Read(Case(schedule, stages));

        Assert.Contains(CaseJson.ErrorLines(read), line => line.StartsWith(expected, StringComparison.Ordinal));
    }

    [Fact]
    public void A_period_temperature_outside_food_contact_is_an_error()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(("$.duration", null), ("$.schedule", """[ { "duration": "10 d", "temperature": "40 degC" } ]""")));

        Assert.Contains(CaseJson.ErrorLines(read), line => line.StartsWith("$.schedule: gives temperatures, which only a case with foodContact uses", StringComparison.Ordinal));
    }

    private static string Case(string schedule, string? stages) => $$"""
        {
          "layers": {{Layers}},
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "simulant", "mass": "1 kg", "density": "1 g/cm3", "area": "6 dm2" },
          "schedule": {{schedule}},
          "foodContact": {
            {{(stages is null ? string.Empty : $"\"stages\": {stages},")}}
            "layerDiffusion": {{Diffusion}}
          }
        }
        """;

    private sealed class ToleranceComparer(double tolerance) : IEqualityComparer<double>
    {
        public bool Equals(double x, double y) => Math.Abs(x - y) <= tolerance;

        public int GetHashCode(double obj) => 0;
    }
}
