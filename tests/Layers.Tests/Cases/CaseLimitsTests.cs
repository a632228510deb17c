using Layers.Core.Cases;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>
/// The counts a case may ask for are bounded when it is read (docs/case-format.md, "Limits"): one past each limit
/// is refused with the JSON path and the limit, the limit itself is accepted.
/// </summary>
public sealed class CaseLimitsTests
{
    private const string OneLayer = """
        {
          "title": "Invented gel",
          "layers": [ { "name": "gel", "thickness": "1 mm", "diffusionCoefficient": "5e-7 cm2/s", "partitionCoefficient": 1, "initialConcentration": "1 mg/mL" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "receptor", "volume": "20 mL", "area": "2 cm2" },
          "duration": "20000 s"
        }
        """;

    [Theory]
    [InlineData(1000, true)]
    [InlineData(1001, false)]
    public void A_stack_of_more_than_1000_layers_is_refused_at_reading(int count, bool valid)
    {
        var layers = string.Join(", ", Enumerable.Range(0, count).Select(i =>
            $$"""{ "name": "l{{i}}", "thickness": "1 um", "diffusionCoefficient": "1e-8 cm2/s", "partitionCoefficient": 1 }"""));

        var read = CaseDocument.ReadText(CaseJson.With(OneLayer, ("$.layers", $"[{layers}]")), "many.json");

        Assert.Equal(valid, read.IsValid);
        if (!valid)
        {
            var error = Assert.Single(read.Errors);
            Assert.Equal("$.layers", error.JsonPath);
            Assert.Equal("at most 1000 layers are allowed; got 1001", error.Message);
        }
    }

    [Theory]
    [InlineData(100, true)]
    [InlineData(101, false)]
    public void Depths_beyond_100_are_refused_at_reading(int count, bool valid)
    {
        var depths = string.Join(", ", Enumerable.Range(1, count).Select(nanometres => $"\"{nanometres} nm\""));

        var read = CaseDocument.ReadText(CaseJson.With(OneLayer, ("$.depths", $"[{depths}]")), "depths.json");

        Assert.Equal(valid, read.IsValid);
        if (!valid)
        {
            var error = Assert.Single(read.Errors);
            Assert.Equal("$.depths", error.JsonPath);
            Assert.Equal("at most 100 depths are allowed; got 101", error.Message);
        }
    }

    [Theory]
    [InlineData("$.reportTimes", 1000, true)]
    [InlineData("$.reportTimes", 1001, false)]
    [InlineData("$.extraOutputTimes", 10000, true)]
    [InlineData("$.extraOutputTimes", 10001, false)]
    public void Report_times_beyond_1000_and_output_times_beyond_10000_are_refused_at_reading(string path, int count, bool valid)
    {
        var times = string.Join(", ", Enumerable.Range(1, count).Select(second => $"\"{second} s\""));

        var read = CaseDocument.ReadText(CaseJson.With(OneLayer, (path, $"[{times}]")), "times.json");

        Assert.Equal(valid, read.IsValid);
        if (!valid)
        {
            var error = Assert.Single(read.Errors);
            Assert.Equal(path, error.JsonPath);
            Assert.Equal($"at most {count - 1} times are allowed; got {count}", error.Message);
        }
    }
}
