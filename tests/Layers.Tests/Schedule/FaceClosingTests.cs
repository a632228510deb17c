using Layers.Core.Analytics;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Faces a schedule closes and opens again (<c>close</c>, <c>open</c>): a film kept in a reel before it is filled keeps
/// its loading, so once the food touches it the food takes what Crank's sheet into a limited volume gives from that
/// moment (The Mathematics of Diffusion, 2nd ed. 1975, ch. 4, eq. 4.37, from memory); mistakes are reported at their
/// paths. The scenario is invented.
/// </summary>
public sealed class FaceClosingTests
{
    [Fact]
    public void A_film_kept_closed_before_filling_then_releases_as_Crank_gives_from_the_filling_on()
    {
        // 100 um at 1e-9 cm2/s (L^2/D = 1e5 s) loaded at 400 mg/L = 0.4 kg/m3, closed for 2 d, then 10 h of contact with
        // 0.5 mL of simulant on 1 dm2, 50 um per area (alpha 0.5).
        var result = Run(
            """[ { "name": "in the reel", "duration": "48 h", "close": ["right"] }, { "name": "filled", "duration": "10 h", "open": ["right"] } ]""");

        Assert.Equal(0, result.Schedule!.Periods[0].Media.Single().ReceivedKgPerSquareMeter);
        var expected = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(1e-13, 1e-4, 0.4, 0.5e-4, 1, 10 * 3600);
        Tolerance.Relative(expected, result.Schedule.Periods[1].Media.Single().ReceivedKgPerSquareMeter, 1e-3, "after filling (Crank eq. 4.37)");
    }

    [Theory]
    [InlineData("""[ { "duration": "1 d", "open": ["right"] } ]""", "$.schedule[0].open[0]: every face with a medium is open at the start")]
    [InlineData("""[ { "duration": "1 d", "close": ["left"] } ]""", "$.schedule[0].close[0]: the left face is closed; only a face with a medium can be closed")]
    [InlineData("""[ { "duration": "1 d" }, { "duration": "1 d", "open": ["right"] } ]""", "$.schedule[1].open[0]: the right face is open at the start of period 2")]
    [InlineData("""[ { "duration": "1 d", "close": ["right"] } ]""", "$.schedule[0].close[0]: leaves the right face closed at the end of the schedule")]
    public void Mistakes_are_reported_at_their_path(string schedule, string expected)
    {
        var read = CaseJson.Read(Case(schedule));

        Assert.Contains(CaseJson.ErrorLines(read), line => line.StartsWith(expected, StringComparison.Ordinal));
    }

    private static Layers.Core.Results.SimulationResult Run(string schedule)
    {
        var read = CaseJson.Read(Case(schedule));
        Assert.Empty(CaseJson.ErrorLines(read));
        var result = Simulator.Run(read.Case!);
        Assert.True(result.Completed, result.FailureReason);
        return result;
    }

    private static string Case(string schedule) => $$"""
        {
          "layers": [ { "name": "film", "thickness": "100 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "400 mg/L" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "simulant", "volume": "0.5 mL", "area": "1 dm2" },
          "schedule": {{schedule}}
        }
        """;
}
