using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Results;
using Layers.Core.Units;
using Layers.Tests.Batch;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Studies;

/// <summary>
/// The one catalogue of named results: its SI units come from the unit table and are the coherent SI units, and the
/// names that sweeps, designs and uncertainty studies accept are the catalogue's.
/// </summary>
public sealed class NamedResultCatalogueTests
{
    // The coherent SI unit of each result, written out by hand from the SI base units kg, m and s (BIPM, The
    // International System of Units, 9th ed., 2019, section 2.3.4: coherent derived units are products of powers
    // of base units with factor 1).
    public static TheoryData<NamedResult, string> CoherentUnits => new()
    {
        { NamedResult.LeftReceived, "kg/m2" },
        { NamedResult.RightReceived, "kg/m2" },
        { NamedResult.LeftConcentration, "kg/m3" },
        { NamedResult.RightConcentration, "kg/m3" },
        { NamedResult.FoodConcentration, "kg/kg" },
        { NamedResult.SteadyFlux, "kg/(m2 s)" },
        { NamedResult.LagTime, "s" },
        { NamedResult.TimeTo90Percent, "s" },
        { NamedResult.TimeToLimit, "s" },
        { NamedResult.LeftPeriodReceived, "kg/m2" },
        { NamedResult.RightPeriodReceived, "kg/m2" },
        { NamedResult.LeftPeriodLowestFlux, "kg/(m2 s)" },
        { NamedResult.RightPeriodLowestFlux, "kg/(m2 s)" },
        { NamedResult.LeftPeriodHighestFlux, "kg/(m2 s)" },
        { NamedResult.RightPeriodHighestFlux, "kg/(m2 s)" },
        { NamedResult.LeftPeriodEndConcentration, "kg/m3" },
        { NamedResult.RightPeriodEndConcentration, "kg/m3" },
    };

    [Theory]
    [MemberData(nameof(CoherentUnits))]
    public void Every_named_result_has_a_unit_the_unit_table_knows_that_parses_back_to_si_factor_one(NamedResult result, string coherent)
    {
        var unit = NamedResults.SiUnit(result);

        Assert.True(UnitTable.TryFind(unit.Symbol, out var found), $"{unit.Symbol} is not in the unit table");
        Assert.Equal(unit, found);
        Assert.True(QuantityParser.TryParse($"1 {unit.Symbol}", [NamedResults.Dimension(result)], out var one, out var problem), problem);
        Assert.Equal(1.0, one.SiValue);
        Assert.Equal(UnitTable.Get(coherent), unit);
    }

    [Fact]
    public void The_coherent_unit_table_covers_every_named_result()
    {
        Assert.Equal(NamedResults.All.Order(), CoherentUnits.Select(row => (NamedResult)row[0]).Order());
    }

    [Fact]
    public void Designs_accept_exactly_the_names_of_the_catalogue()
    {
        var errors = StudyCases.Errors(StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[0].thickness", "from": "5 um", "to": "20 um" }, "result": "flux", "target": "1 h" }
            """));

        Assert.Equal(NamedResults.All.Select(NamedResults.Name), Listed(errors, "$.design.result: must be one of "));
    }

    [Fact]
    public void Uncertainty_studies_accept_exactly_the_names_of_the_catalogue()
    {
        var errors = StudyCases.Errors(StudyCases.Membrane("""
            "uncertainty": { "inputs": [ { "path": "$.layers[0].thickness", "distribution": "uniform", "min": "40 um", "max": "60 um" } ], "results": ["flux"] }
            """));

        Assert.Equal(NamedResults.All.Select(NamedResults.Name), Listed(errors, "$.uncertainty.results[0]: must be one of "));
    }

    [Fact]
    public void Sweeps_accept_exactly_the_names_of_the_catalogue_that_a_batch_summary_lists_and_the_figures_of_one_period()
    {
        var json = CaseJson.With(BatchCases.Membrane, ("$.sweep", """{ "parameters": [ { "path": "$.layers[0].thickness", "values": ["20 um"] } ], "result": "flux" }"""));

        var errors = SweepExpander.Expand(json, "sweep.json").Errors.Select(error => $"{error.JsonPath}: {error.Message}").ToList();

        Assert.Equal(
            NamedResults.InBatchSummary.Concat(NamedResults.All.Where(NamedResults.IsReadInPeriod)).Select(NamedResults.Name),
            Listed(errors, "$.sweep.result: must be one of "));
        Assert.Equal(
            [
                "leftReceivedKgPerSquareMeter", "rightReceivedKgPerSquareMeter", "steadyFluxKgPerSquareMeterSecond", "lagTimeSeconds", "timeTo90PercentSeconds",
                "leftConcentrationKgPerCubicMeter", "rightConcentrationKgPerCubicMeter", "foodConcentrationKgPerKg", "timeToLimitSeconds",
            ],
            NamedResults.InBatchSummary.Select(NamedResults.SummaryKey));
        // Every result but the figures of one period: a batch row names no period.
        Assert.Equal(NamedResults.All.Where(result => !NamedResults.IsReadInPeriod(result)).Order(), NamedResults.InBatchSummary.Order());
    }

    [Fact]
    public void The_schema_lists_the_names_of_the_catalogue_for_studies_and_sweeps()
    {
        var schema = JsonNode.Parse(File.ReadAllText(RepoRoot.File("docs", "case.schema.json")))!;
        static IEnumerable<string> Enum(JsonNode? node) => node!.AsArray().Select(item => (string)item!);

        Assert.Equal(NamedResults.All.Select(NamedResults.Name), Enum(schema["$defs"]!["studyResult"]!["oneOf"]![0]!["enum"]));
        Assert.Equal(NamedResults.All.Select(NamedResults.Name), Enum(schema["$defs"]!["studyResult"]!["oneOf"]![1]!["properties"]!["name"]!["enum"]));
        var periodFigures = NamedResults.All.Where(NamedResults.IsReadInPeriod).Select(NamedResults.Name).ToList();
        Assert.Equal(NamedResults.InBatchSummary.Select(NamedResults.Name).Concat(periodFigures), Enum(schema["properties"]!["sweep"]!["properties"]!["result"]!["oneOf"]![0]!["enum"]));
        Assert.Equal(periodFigures, Enum(schema["properties"]!["sweep"]!["properties"]!["result"]!["oneOf"]![1]!["properties"]!["name"]!["enum"]));
    }

    [Fact]
    public void No_switch_over_named_results_has_a_fallback_arm()
    {
        // A fallback arm would let a new result compile without each use saying what it does with it.
        var offenders = Directory.EnumerateFiles(RepoRoot.File("src"), "*.cs", SearchOption.AllDirectories)
            .Where(path => !path.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .Where(path => File.ReadAllText(path) is var text && text.Contains("NamedResult.", StringComparison.Ordinal)
                && (text.Contains("_ =>", StringComparison.Ordinal) || text.Contains("default:", StringComparison.Ordinal)))
            .Select(path => Path.GetRelativePath(RepoRoot.Path, path))
            .ToList();

        Assert.Empty(offenders);
    }

    /// <summary>The names an error message lists after <paramref name="prefix"/>, up to ", or {" or "; got".</summary>
    private static IReadOnlyList<string> Listed(IEnumerable<string> errors, string prefix)
    {
        var error = Assert.Single(errors, error => error.StartsWith(prefix, StringComparison.Ordinal));
        var list = error[prefix.Length..];
        var end = list.IndexOf(", or {", StringComparison.Ordinal) is var before and >= 0 ? before : list.IndexOf("; got", StringComparison.Ordinal);
        return [.. list[..end].Split(", ")];
    }
}
