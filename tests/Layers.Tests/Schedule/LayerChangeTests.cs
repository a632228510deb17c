using Layers.Core.Analytics;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Layers taken off (<c>remove</c>) and put on fresh (<c>apply</c>) by a schedule: a sheet replaced by a fresh one
/// releases each time what Crank's sheet into a perfect sink gives (The Mathematics of Diffusion, 2nd ed. 1975, ch. 4,
/// eq. 4.18, from memory), the mass balance closes across every change, and a layer taken off is left empty and
/// exchanges with nothing. The scenarios are invented.
/// </summary>
public sealed class LayerChangeTests
{
    private const double Hour = 3600;

    [Fact]
    public void A_sheet_replaced_by_a_fresh_one_each_period_releases_what_Crank_gives_each_time()
    {
        // Thickness 100 um, D 1e-9 cm2/s = 1e-13 m2/s: L^2/D = 1e5 s; periods of 10 h = 0.36 L^2/D.
        var result = Run("""[ { "name": "sheet", "thickness": "100 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "400 mg/L" } ]""",
            """[ { "name": "use", "duration": "10 h" }, { "name": "use", "duration": "10 h", "apply": ["sheet"], "repeat": 2 } ]""");

        var expected = PlaneSheetIntoSink.FractionReleased(1e-13, 1e-4, 10 * Hour) * 0.4 * 1e-4;
        foreach (var outcome in result.Schedule!.Periods)
        {
            Tolerance.Relative(expected, outcome.Media.Single().ReceivedKgPerSquareMeter, 1e-3, $"{outcome.Period.Label} (Crank eq. 4.18)");
        }

        var moves = result.Schedule.LayerMoves;
        Assert.Equal(2, moves.Count);
        Tolerance.Relative(0.4 * 1e-4 - expected, moves[0].TakenAwayKgPerSquareMeter, 1e-3, "what the first sheet still held");
        Assert.Equal(0.4 * 1e-4, moves[0].BroughtKgPerSquareMeter, 15);
    }

    [Fact]
    public void A_patch_taken_off_leaves_the_skin_to_release_its_depot_and_the_mass_balance_closes()
    {
        var result = Run(
            """
            [
              { "name": "patch", "thickness": "80 um", "diffusionCoefficient": "3e-9 cm2/s", "partitionCoefficient": 10, "initialConcentration": "5 mg/mL" },
              { "name": "skin", "thickness": "20 um", "diffusionCoefficient": "1e-10 cm2/s", "partitionCoefficient": 5 }
            ]
            """,
            """[ { "name": "wear", "duration": "24 h" }, { "name": "after removal", "duration": "240 h", "remove": ["patch"] } ]""");

        var end = result.TimeSeries.Last(sample => sample.TimeSeconds <= result.Case.DurationSeconds * (1 + 1e-12));
        var move = result.Schedule!.LayerMoves.Single();
        Assert.Equal(["patch"], move.TakenOff);

        // Fick's law conserves mass: the loading is what the sink received, what the skin holds and what left with the patch.
        var loading = 5.0 * 80e-6;
        Tolerance.Relative(loading, end.Right!.TransferredIntoMediumPerArea + end.LayerMassPerArea.Sum() + move.TakenAwayKgPerSquareMeter, 1e-10, "mass balance");
        Assert.Equal(0, end.LayerMassPerArea[0]);

        // The skin's depot, 20 um at 1e-10 cm2/s (L^2/D ~ 11 h), is gone after ten days: what the skin held at removal reached the sink.
        var depot = result.Schedule.Periods[1].Media.Single().ReceivedKgPerSquareMeter;
        var atRemoval = result.TimeSeries.Single(sample => Math.Abs(sample.TimeSeconds - (24 * Hour)) <= 1e-6).LayerMassPerArea[1];
        Tolerance.Relative(atRemoval, depot, 1e-4, "depot released after removal");

        // A layer that is off shows empty, and the skin's outer edge is its own value, not a mean with the empty patch.
        var last = result.Reports[^1];
        Assert.All(last.Profiles[0].ConcentrationsKgPerCubicMeter, value => Assert.Equal(0, value));
        Assert.True(last.Profiles[1].ConcentrationsKgPerCubicMeter[0] >= last.Profiles[1].ConcentrationsKgPerCubicMeter[1] * (1 - 1e-9));
    }

    [Theory]
    [InlineData("""[ { "duration": "1 d", "remove": ["patch"] } ]""", "$.schedule[0].remove[0]: every layer is on at the start")]
    [InlineData("""[ { "duration": "1 d" }, { "duration": "1 d", "remove": ["skin"] } ]""", "$.schedule[1].remove[0]: only outer layers can be taken off or put on")]
    [InlineData("""[ { "duration": "1 d" }, { "duration": "1 d", "remove": ["glue"] } ]""", "$.schedule[1].remove[0]: no layer is named 'glue'")]
    [InlineData("""[ { "duration": "1 d" }, { "duration": "1 d", "remove": ["patch"] }, { "duration": "1 d", "remove": ["patch"] } ]""", "$.schedule[2].remove[0]: 'patch' is off already")]
    public void Mistakes_are_reported_at_their_path(string schedule, string expected)
    {
        var read = CaseJson.Read(Case(Layers3, schedule, left: """{ "kind": "closed" }"""));

        Assert.Contains(CaseJson.ErrorLines(read), line => line.StartsWith(expected, StringComparison.Ordinal));
    }

    [Fact]
    public void Layers_come_off_only_at_a_closed_face()
    {
        var read = CaseJson.Read(Case(Layers3, """[ { "duration": "1 d" }, { "duration": "1 d", "remove": ["patch"] } ]""", left: """{ "kind": "bath", "concentration": "0 mg/L" }"""));

        Assert.Contains(CaseJson.ErrorLines(read), line => line.StartsWith("$.schedule[1].remove[0]: layers can be taken off or put on at the left face only when it is closed", StringComparison.Ordinal));
    }

    private const string Layers3 = """
        [
          { "name": "patch", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "1 mg/mL" },
          { "name": "skin", "thickness": "20 um", "diffusionCoefficient": "1e-10 cm2/s" },
          { "name": "tissue", "thickness": "100 um", "diffusionCoefficient": "1e-7 cm2/s" }
        ]
        """;

    private static Layers.Core.Results.SimulationResult Run(string layers, string schedule)
    {
        var read = CaseJson.Read(Case(layers, schedule, left: """{ "kind": "closed" }"""));
        Assert.Empty(CaseJson.ErrorLines(read));
        var result = Simulator.Run(read.Case!);
        Assert.True(result.Completed, result.FailureReason);
        return result;
    }

    private static string Case(string layers, string schedule, string left) => $$"""
        {
          "layers": {{layers}},
          "left": {{left}},
          "right": { "kind": "bath", "name": "sink", "concentration": "0 mg/L" },
          "schedule": {{schedule}}
        }
        """;
}
