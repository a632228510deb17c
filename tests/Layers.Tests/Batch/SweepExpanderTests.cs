using System.Globalization;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>Expanding a sweep: count, names, values substituted, errors with their JSON paths.</summary>
public sealed class SweepExpanderTests
{
    private static string Sweep(string parameters, string result = "\"steadyFlux\"") =>
        CaseJson.With(BatchCases.Membrane, ("$.sweep", $$"""{ "parameters": {{parameters}}, "result": {{result}} }"""));

    [Fact]
    public void A_list_and_a_log_range_expand_into_their_product_with_the_values_substituted()
    {
        var json = Sweep("""
            [ { "path": "$.layers[0].thickness", "values": ["20 um", "50 um"] },
              { "path": "$.layers[0].diffusionCoefficient", "from": "1e-10 cm2/s", "to": "1e-8 cm2/s", "count": 3, "spacing": "log" } ]
            """);

        var expansion = SweepExpander.Expand(json, Path.Combine("cases", "film.json"));

        Assert.True(expansion.IsValid, string.Join("\n", expansion.Errors));
        Assert.Equal(6, expansion.Variants.Count);
        Assert.Equal("film.01_thickness-20um_diffusionCoefficient-1E-10cm2_s", expansion.Variants[0].Name);
        Assert.Equal("film.06_thickness-50um_diffusionCoefficient-1E-08cm2_s", expansion.Variants[5].Name);
        // Log spacing from 1e-10 to 1e-8 in three points: the middle value is the geometric mean, 1e-9.
        var middle = JsonNode.Parse(expansion.Variants[1].Json)!;
        Assert.Equal("20 um", (string?)middle["layers"]![0]!["thickness"]);
        Assert.Equal("1E-09 cm2/s", (string?)middle["layers"]![0]!["diffusionCoefficient"]);
        Assert.Null(middle["sweep"]);
        Assert.All(expansion.Variants, variant => Assert.Matches("^[A-Za-z0-9._+-]+$", variant.Name));
        // Every sub-case is a valid case on its own.
        Assert.All(expansion.Variants, variant => Assert.True(CaseDocument.ReadText(variant.Json, "film.json").IsValid));
        Assert.Equal(1e-9 * 1e-4, CaseDocument.ReadText(expansion.Variants[1].Json, "film.json").Case!.Stack.Layers[0].DiffusivitySquareMetersPerSecond, 1e-22);
    }

    [Fact]
    public void A_linear_range_of_plain_numbers_stays_numbers()
    {
        var expansion = SweepExpander.Expand(Sweep("""[ { "path": "$.layers[0].partitionCoefficient", "from": 0.5, "to": 2, "count": 4 } ]"""), "k.json");

        var values = expansion.Variants.Select(variant => (double)JsonNode.Parse(variant.Json)!["layers"]![0]!["partitionCoefficient"]!);

        Assert.Equal([0.5, 1.0, 1.5, 2.0], values);
    }

    [Theory]
    [InlineData("""[ { "path": "$.layers[3].thickness", "values": ["1 um"] } ]""", "$.sweep.parameters[0].path", "is not in this case")]
    [InlineData("""[ { "path": "$.layers[0].thickness", "values": [] } ]""", "$.sweep.parameters[0].values", "non-empty array")]
    [InlineData("""[ { "path": "$.layers[0].thickness", "from": "1 um", "to": "1 mm", "count": 3 } ]""", "$.sweep.parameters[0].to", "same unit")]
    [InlineData("""[ { "path": "$.layers[0].thickness", "from": "1 um", "to": "5 um", "count": 1 } ]""", "$.sweep.parameters[0].count", "from 2 to")]
    [InlineData("""[ { "path": "$.layers[0].thickness", "values": ["1 um"], "count": 2 } ]""", "$.sweep.parameters[0]", "not both")]
    public void A_broken_sweep_is_reported_at_its_json_path(string parameters, string path, string message)
    {
        var expansion = SweepExpander.Expand(Sweep(parameters), "s.json");

        var error = Assert.Single(expansion.Errors);
        Assert.Equal(path, error.JsonPath);
        Assert.Contains(message, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_result_is_named_with_the_choices()
    {
        var expansion = SweepExpander.Expand(Sweep("""[ { "path": "$.duration", "values": ["1 h"] } ]""", "\"flux\""), "s.json");

        var error = Assert.Single(expansion.Errors);
        Assert.Equal("$.sweep.result", error.JsonPath);
        Assert.Contains("steadyFlux", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_substituted_value_that_breaks_a_rule_is_caught_by_the_case_reader_at_its_usual_path()
    {
        var expansion = SweepExpander.Expand(Sweep("""[ { "path": "$.layers[0].thickness", "values": ["-1 um"] } ]"""), "s.json");

        var read = CaseDocument.ReadText(Assert.Single(expansion.Variants).Json, "s.json");

        Assert.Equal("$.layers[0].thickness", Assert.Single(read.Errors).JsonPath);
        Assert.Equal("s.01_thickness--1um", expansion.Variants[0].Name.ToString(CultureInfo.InvariantCulture));
    }
}

/// <summary>The example messages of docs/case-format.md, section "Sweeps", are what the expander says.</summary>
public sealed class SweepFormatReferenceTests
{
    private static readonly Dictionary<string, string> Situations = new(StringComparer.Ordinal)
    {
        ["$.sweep.parameters[0].path"] = """{ "parameters": [ { "path": "$.layers[3].thickness", "values": ["1 um"] } ], "result": "lagTime" }""",
        ["$.sweep.parameters[0].to"] = """{ "parameters": [ { "path": "$.layers[0].thickness", "from": "1 um", "to": "1 mm", "count": 3 } ], "result": "lagTime" }""",
        ["$.sweep.result"] = """{ "parameters": [ { "path": "$.duration", "values": ["1 h"] } ], "result": "flux" }""",
    };

    public static TheoryData<string> DocumentedMessages => new(
        FormatReference.Blocks("text", "Sweeps").SelectMany(block => block.Split('\n')).Where(line => line.StartsWith("sweep.json: ", StringComparison.Ordinal)));

    [Theory]
    [MemberData(nameof(DocumentedMessages))]
    public void Each_documented_sweep_message_is_what_the_expander_says(string documentedLine)
    {
        var path = documentedLine["sweep.json: ".Length..documentedLine.IndexOf(": ", "sweep.json: ".Length, StringComparison.Ordinal)];
        Assert.True(Situations.TryGetValue(path, out var sweep), $"No situation for the documented path {path}");

        var expansion = SweepExpander.Expand(CaseJson.With(BatchCases.Membrane, ("$.sweep", sweep)), "sweep.json");

        Assert.Equal([documentedLine], expansion.Errors.Select(error => error.Format("sweep.json")));
    }

    [Fact]
    public void The_sweep_section_shows_three_example_messages()
    {
        Assert.Equal(3, DocumentedMessages.Count);
    }
}

/// <summary>Keys written twice are reported at their path, never as a crash of the sweep expansion.</summary>
public sealed class SweepDuplicateKeyTests
{
    [Theory]
    [InlineData("""{ "title": "a", "title": "b", "layers": [], "sweep": { "parameters": [], "result": "lagTime" } }""", "$.title")]
    [InlineData("""{ "layers": [ { "name": "x", "name": "y" } ], "sweep": { "parameters": [], "result": "lagTime" } }""", "$.layers[0].name")]
    [InlineData("""{ "sweep": { "result": "lagTime", "result": "steadyFlux" } }""", "$.sweep.result")]
    public void A_repeated_key_is_an_error_at_its_path(string json, string path)
    {
        var expansion = SweepExpander.Expand(json, "d.json");

        Assert.Equal(path, Assert.Single(expansion.Errors).JsonPath);
    }

    [Fact]
    public void Check_of_a_sweep_with_a_repeated_key_reports_it_once()
    {
        var read = CaseDocument.ReadText(CaseJson.With(BatchCases.ThicknessSweep("1 um"), ("$.sweep.result", "\"lagTime\"")).Replace("\"title\"", "\"title\": \"x\", \"title\"", StringComparison.Ordinal), "d.json");

        Assert.Equal(["$.title"], read.Errors.Select(error => error.JsonPath));
    }
}
