using System.Globalization;
using System.Text.Json;
using Layers.Cli;
using Layers.Core.Batch;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// A batch of food-contact cases answers its question: the verdict per case with the food's concentration and the
/// limit in mg/kg, the migration in mg/dm2, the varied input as its own column, the count of exceeded limits in the
/// console and in summary.md, and the exit code explained.
/// </summary>
public sealed class BatchFoodContactSummaryTests
{
    // Invented: a 50 um film holding 1000 mg/kg at 0.92 g/cm3 on 1 kg of food (1 kg/L) per 6 dm2, 10 d. It holds
    // 0.92 kg/m3 x 6e-2 m2 x 50e-6 m = 2.76e-6 kg of substance. With K = 1 on both sides the closed system ends
    // with one concentration in film and food (mass balance, Crank, The Mathematics of Diffusion, 2nd ed., ch. 4,
    // the long-time limit of a sheet in a stirred solution of limited volume): 2.76e-6 kg / (1e-3 + 3e-6) m3 in the
    // food, i.e. 2.7517 mg/kg and, over 6 dm2, 2.7517 mg / 6 dm2 = 0.45862 mg/dm2.
    private static string Film(string diffusionCoefficient, string limit) => $$"""
        {
          "title": "Invented film at D = {{diffusionCoefficient}}",
          "layers": [ { "name": "sealant", "thickness": "50 um", "diffusionCoefficient": "{{diffusionCoefficient}}", "partitionCoefficient": 1, "initialConcentration": "1000 mg/kg", "density": "0.92 g/cm3" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "food", "mass": "1 kg", "density": "1 kg/L", "area": "6 dm2", "partitionCoefficient": 1 },
          "foodContact": { "stages": [ { "duration": "10 d", "temperature": "40 degC" } ], "specificMigrationLimit": "{{limit}}" },
          "numerics": { "cells": 40 }
        }
        """;

    private const double EquilibriumMgPerKg = 2.76e-6 / 1.003e-3 * 1e6 / 1000;

    [Fact]
    public void Each_case_gets_its_verdict_value_and_limit_in_mg_per_kg_and_the_count_of_exceeded_limits()
    {
        using var temp = new TempFolder();
        // Dt/L^2 = 1e-13 x 864000 / 2.5e-9 = 35: at equilibrium; 1e-16 cm2/s: Dt/L^2 = 3.5e-6, almost nothing out.
        temp.WriteFile(Path.Combine("in", "fast.json"), Film("1e-9 cm2/s", "1.5 mg/kg"));
        temp.WriteFile(Path.Combine("in", "slow.json"), Film("1e-16 cm2/s", "1.5 mg/kg"));

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots");

        Assert.Equal(ExitCodes.LimitExceeded, outcome.ExitCode);
        Assert.Contains("Batch: 2 cases, 2 succeeded, 1 exceeded the specific migration limit", outcome.Output, StringComparison.Ordinal);
        Assert.Contains("exit code 1: 1 case exceeded the specific migration limit", outcome.Output, StringComparison.Ordinal);
        Assert.Contains("2 cases, 2 succeeded, 1 exceeded the specific migration limit.", File.ReadAllText(temp.Combine("out", "summary.md")), StringComparison.Ordinal);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal(["fast", "slow"], rows.Select(row => row["case"]));
        Assert.Equal(["exceeded", "within"], rows.Select(row => row["limitVerdict"]));
        Assert.Equal(["1.5", "1.5"], rows.Select(row => row["specificMigrationLimitMgPerKg"]));
        var fast = rows[0];
        Tolerance.Relative(EquilibriumMgPerKg, Number(fast["foodConcentrationMgPerKg"]), 2e-3, "food concentration at equilibrium");
        // The trade columns are the SI columns in other units: 1 mg/kg = 1e-6 kg/kg, 1 mg/dm2 = 1e-4 kg/m2 (SI prefixes).
        Assert.Equal(Number(fast["foodConcentrationKgPerKg"]) * 1e6, Number(fast["foodConcentrationMgPerKg"]), 1e-9);
        Assert.Equal(Number(fast["foodMigrationKgPerSquareMeter"]) * 1e4, Number(fast["foodMigrationMgPerSquareDecimeter"]), 1e-9);
        // 1 kg of food per 6 dm2: the migration per area is the concentration times 1 kg / 6 dm2.
        Assert.Equal(Number(fast["foodConcentrationMgPerKg"]) / 6, Number(fast["foodMigrationMgPerSquareDecimeter"]), 1e-6);
        // The varied input, named by its layer and quantity, in the unit it is written in.
        Assert.Equal(["1E-09", "1E-16"], rows.Select(row => row["sealant diffusion coefficient [cm2/s]"]));
        Assert.Contains("sealant diffusion coefficient [cm2/s]", outcome.Output.ReplaceLineEndings(" "), StringComparison.Ordinal);
    }

    [Fact]
    public void A_sweep_plots_the_food_concentration_against_its_parameter_and_judges_each_sub_case()
    {
        using var temp = new TempFolder();
        var sweep = CaseJson.With(
            Film("1e-12 cm2/s", "1.5 mg/kg"),
            ("$.sweep", """{ "parameters": [ { "path": "$.layers[0].diffusionCoefficient", "values": ["1e-16 cm2/s", "1e-12 cm2/s", "1e-9 cm2/s"] } ], "result": "foodConcentration" }"""));
        var file = temp.WriteFile("film.json", sweep);

        var outcome = CliRun.Invoke("run", file, "--out", temp.Combine("out"));

        Assert.Equal(ExitCodes.LimitExceeded, outcome.ExitCode);
        Assert.True(new FileInfo(temp.Combine("out", "film.sweep.png")).Length > 0);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal("exceeded", rows[^1]["limitVerdict"]);
        var column = Assert.Single(rows[0].Keys, key => key.EndsWith("[cm2/s]", StringComparison.Ordinal));
        Assert.Equal(["1E-16", "1E-12", "1E-09"], rows.Select(row => row[column]));
        // Every sub-case of one sweep: the sweep's name once in the header, the sub-case names whole on their rows.
        Assert.Contains("case (film.*)", outcome.Output, StringComparison.Ordinal);
        Assert.Contains($"  {rows[0]["case"]["film.".Length..]} ", outcome.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Merged_shards_keep_the_input_columns_and_the_food_columns_byte_for_byte()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "a.json"), Film("1e-9 cm2/s", "1.5 mg/kg"));
        temp.WriteFile(Path.Combine("in", "b.json"), Film("1e-12 cm2/s", "1.5 mg/kg"));
        temp.WriteFile(Path.Combine("in", "c.json"), Film("1e-16 cm2/s", "1.5 mg/kg"));

        CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("whole"), "--no-plots", "-q");
        CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("s1"), "--shard", "1/2", "--no-plots", "-q");
        CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("s2"), "--shard", "2/2", "--no-plots", "-q");
        var merged = CliRun.Invoke("merge", temp.Combine("s1"), temp.Combine("s2"), "--out", temp.Combine("merged"), "--no-plots");

        Assert.Equal(ExitCodes.LimitExceeded, merged.ExitCode);
        Assert.Contains("1 exceeded the specific migration limit", merged.Output, StringComparison.Ordinal);
        foreach (var name in new[] { "summary.csv", "summary.json" })
        {
            Assert.Equal(File.ReadAllBytes(temp.Combine("whole", name)), File.ReadAllBytes(temp.Combine("merged", name)));
        }

        // Shard 2 alone holds only b, yet its row has the column found over the whole batch.
        Assert.Contains("sealant diffusion coefficient [cm2/s]", File.ReadLines(temp.Combine("s2", "summary.csv")).First(), StringComparison.Ordinal);
        using var json = JsonDocument.Parse(File.ReadAllText(temp.Combine("merged", "summary.json")));
        var input = Assert.Single(json.RootElement.GetProperty("cases")[0].GetProperty("inputs").EnumerateArray());
        Assert.Equal("$.layers[0].diffusionCoefficient", input.GetProperty("path").GetString());
        Assert.Equal("1e-9 cm2/s", input.GetProperty("value").GetString());
    }

    private static double Number(string cell) => double.Parse(cell, CultureInfo.InvariantCulture);
}
