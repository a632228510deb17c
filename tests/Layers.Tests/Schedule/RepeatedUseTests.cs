using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// The repeated-use verdict: for an article intended for repeated use, tested with a fresh portion of simulant each
/// time, the third contact is judged against the specific migration limit and migration must not rise from one contact
/// to the next (Regulation (EU) No 10/2011, Article 17; recalled from memory). The scenarios are invented.
/// </summary>
public sealed class RepeatedUseTests
{
    [Fact]
    public void A_directly_exposed_source_migrates_less_at_each_contact_and_the_third_is_judged()
    {
        var result = Run(barrier: null, limit: "1 mg/kg");

        var verdict = result.Schedule!.RepeatedUse!;
        Assert.Equal(3, verdict.Contacts.Count);
        Assert.Equal(3, verdict.JudgedContact);
        Assert.Empty(verdict.RisingFrom);
        Assert.True(verdict.Contacts[0] > verdict.Contacts[1] && verdict.Contacts[1] > verdict.Contacts[2]);

        // The judged value is the food's concentration at the end of the third contact, as the periods report it.
        var third = result.Schedule.Periods[2].Media.Single();
        Tolerance.Relative(third.MassFractionAtEnd!.Value, verdict.JudgedValue, 1e-12, "judged contact");
        Assert.Equal(verdict.JudgedValue > 1e-6, verdict.LimitExceeded);
    }

    [Fact]
    public void Behind_a_functional_barrier_migration_rises_from_contact_to_contact_and_the_article_does_not_comply()
    {
        // The barrier's lag d^2/(6D) (Crank 1975, ch. 4, eq. 4.24a, from memory) is about 7.7 d: longer than a contact.
        var result = Run(barrier: """{ "name": "barrier", "thickness": "20 um", "diffusionCoefficient": "1e-12 cm2/s" }""", limit: "1000 mg/kg");

        var verdict = result.Schedule!.RepeatedUse!;
        Assert.Equal([1, 2], verdict.RisingFrom);
        Assert.False(verdict.LimitExceeded);
        Assert.False(verdict.Complies);
    }

    [Fact]
    public void With_more_than_three_contacts_the_limit_check_and_the_batch_row_read_the_third()
    {
        var result = Run(barrier: null, limit: "1 mg/kg", contacts: 5);

        var verdict = result.Schedule!.RepeatedUse!;
        Assert.Equal(3, verdict.JudgedContact);
        var check = Layers.Core.Batch.LimitCheck.Of(result)!;
        Assert.Equal(verdict.Contacts[2], check.ValueSi);
        Assert.NotEqual(result.FoodContact!.FinalConcentration, check.ValueSi);
        var row = Layers.Core.Batch.BatchKeyResults.From(result);
        Assert.Equal(verdict.Contacts[2], row.FoodConcentrationKgPerKg);
        Assert.Equal(verdict.JudgedMigrationKgPerSquareMeter, row.FoodMigrationKgPerSquareMeter);
    }

    [Fact]
    public void The_food_contact_table_gives_the_verdict_of_the_judged_contact_and_where_the_limit_was_first_reached()
    {
        var result = Run(barrier: null, limit: "1 mg/kg", contacts: 5);

        var verdict = result.Schedule!.RepeatedUse!;
        var rows = Layers.Core.Reports.FoodContactTables.For(result).SelectMany(table => table.Rows).ToDictionary(row => row[0], row => row[1]);
        var judged = rows["verdict (model, contact 3)"];
        Assert.StartsWith(verdict.LimitExceeded ? "EXCEEDS" : "below", judged, StringComparison.Ordinal);
        Assert.DoesNotContain("verdict (model)", rows.Keys);

        // The first contact starts from the loaded wall and reaches the limit first, within its own contact.
        var first = result.FoodContact!.LimitReachedSeconds!.Value;
        Assert.True(first < result.Case.Schedule!.Periods[0].EndSeconds);
        Assert.EndsWith("in contact 1", rows["limit first reached at"], StringComparison.Ordinal);
    }

    private static SimulationResult Run(string? barrier, string limit, int contacts = 3)
    {
        var layers = barrier is null
            ? """[ { "name": "source", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "500 mg/kg", "density": "0.9 g/cm3" } ]"""
            : $$"""[ { "name": "source", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "500 mg/kg", "density": "0.9 g/cm3" }, {{barrier}} ]""";
        var json = $$"""
            {
              "layers": {{layers}},
              "left": { "kind": "closed" },
              "right": { "kind": "compartment", "name": "simulant", "mass": "1 kg", "density": "1 g/cm3", "area": "6 dm2" },
              "schedule": [ { "name": "contact", "duration": "5 d", "renew": ["right"], "repeat": {{contacts}} } ],
              "foodContact": {
                "stages": [ { "name": "test", "duration": "{{5 * contacts}} d", "temperature": "40 degC" } ],
                "specificMigrationLimit": "{{limit}}"
              }
            }
            """;
        var read = CaseJson.Read(json);
        Assert.Empty(CaseJson.ErrorLines(read));
        var result = Simulator.Run(read.Case!);
        Assert.True(result.Completed, result.FailureReason);
        return result;
    }
}
