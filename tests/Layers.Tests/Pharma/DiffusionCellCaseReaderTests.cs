using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>The diffusion-cell keys of a case file: rules and messages as docs/case-format.md states them.</summary>
public sealed class DiffusionCellCaseReaderTests
{
    [Theory]
    [InlineData("$.right.sampling", """{ "volume": "1 L", "times": ["1 d"] }""", "$.right.sampling.volume: must be less than the compartment's volume; got '1 L'")]
    [InlineData("$.right.sampling", """{ "volume": "1 mL", "times": ["11 d"] }""", "$.right.sampling.times[0]: must be <= duration (10 d); got '11 d'")]
    [InlineData("$.right.sampling", """{ "volume": "1 mL" }""", "$.right.sampling.times: is required")]
    [InlineData("$.right.sinkFraction", "0.2", "$.right.sinkFraction: needs \"solubility\" beside it (the fraction is of the solubility)")]
    [InlineData("$.right.removalHalfLife", "\"0 h\"", "$.right.removalHalfLife: must be > 0; got '0 h'")]
    public void Diffusion_cell_mistakes_are_reported_at_their_path(string path, string value, string expected)
    {
        var result = CaseJson.Read(CaseJson.MinimalWith((path, value)));

        Assert.Equal([expected], CaseJson.ErrorLines(result));
    }

    [Fact]
    public void Permeation_test_needs_a_receiving_medium_on_the_right()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(("$.right", """{ "kind": "closed" }"""), ("$.permeationTest", "{}")));

        Assert.Equal(
            ["$.permeationTest: needs a medium on the right face that receives the permeant (a compartment or a bath); right is closed"],
            CaseJson.ErrorLines(result));
    }

    [Fact]
    public void Sampling_solubility_and_removal_are_read_in_SI()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(
            ("$.right.sampling", """{ "volume": "5 mL", "times": ["1 d", "2 d"] }"""),
            ("$.right.solubility", "\"0.2 mg/mL\""),
            ("$.right.removalHalfLife", "\"2 h\"")));

        Assert.True(result.IsValid, result.FormatErrors());
        var receptor = (Layers.Core.Domain.CompartmentFace)result.Case!.Right;
        Assert.Equal(5e-6, receptor.Sampling!.VolumeCubicMeters, 15);
        Assert.Equal([86400.0, 172800.0], receptor.Sampling.TimesSeconds);
        Assert.Equal(0.2, receptor.SolubilityKgPerCubicMeter!.Value, 12);
        Assert.Equal(0.1, receptor.SinkFraction);
        Assert.Equal(Math.Log(2) / 7200, receptor.RemovalRatePerSecond, 15);
    }
}
