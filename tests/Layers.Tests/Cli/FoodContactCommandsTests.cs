using System.Globalization;
using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using Layers.Cli;
using Layers.Cli.Commands;
using Layers.Core.Reports;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// Every command on a food-contact case: the list of docs/food-contact.md ("Commands on a food-contact case") is the
/// list of commands that take a case, each listed command works on one, and the results carry the food-contact
/// caution and the notes on unverified constants that <c>layers run</c> gives.
/// </summary>
public sealed partial class FoodContactCommandsTests
{
    private const string Section = "## Commands on a food-contact case";

    // Invented: a 500 um film holding 1000 mg/kg (0.92 kg/m3) on 1 kg of food per 6 dm2, with an unloaded PET outer
    // layer whose D is the upper-bound estimate from the (unverified) polymer table.
    private static string Case(string extra = "") => $$"""
        {
          "title": "Film on food with an estimated outer layer",
          "layers": [
            { "name": "outer", "thickness": "12 um", "density": "1.38 g/cm3" },
            { "name": "film", "thickness": "500 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "1000 mg/kg", "density": "0.92 g/cm3" }
          ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "food", "mass": "1 kg", "density": "1 kg/L", "area": "6 dm2" },
          "reportTimes": ["1 d", "5 d", "10 d"],
          "numerics": { "cells": 40 },
          "foodContact": {
            "stages": [ { "name": "storage", "duration": "10 d", "temperature": "40 degC" } ],
            "layerDiffusion": { "outer": { "polymer": "PET", "relativeMolarMass": 300 } },
            "specificMigrationLimit": "30 mg/kg"
          }{{extra}}
        }
        """;

    private const string Design = """
        ,
          "design": { "input": { "path": "$.layers[1].diffusionCoefficient", "from": "1e-13 cm2/s", "to": "1e-8 cm2/s" }, "result": "foodConcentration", "target": "1.5 mg/kg" }
        """;

    private const string Uncertainty = """
        ,
          "uncertainty": { "inputs": [ { "path": "$.layers[1].diffusionCoefficient", "distribution": "logNormal", "median": "1e-9 cm2/s", "factor": 2 } ], "samples": 6, "seed": 3 }
        """;

    private const string Sweep = """
        ,
          "sweep": { "parameters": [ { "path": "$.layers[1].thickness", "values": ["300 um", "500 um"] } ], "result": "rightReceived" }
        """;

    /// <summary>
    /// Concentrations in the food while it is still a near sink and the film semi-infinite: released mass per area
    /// 2 c0 sqrt(D t / pi) (Crank, The Mathematics of Diffusion, 2nd ed., eq. 2.45 integrated, from memory), over the
    /// food's volume per area 1 L / 6 dm2; c0 = 0.92 kg/m3, D = 1e-13 m2/s, up to D t / l^2 = 0.07.
    /// </summary>
    private static string FoodData()
    {
        var text = new StringBuilder("time [h],concentration [mg/L]\n");
        foreach (var hours in new[] { 2.0, 4, 8, 12, 18, 24, 36, 48 })
        {
            var released = 2 * 0.92 * Math.Sqrt(1e-13 * hours * 3600 / Math.PI);
            text.Append(CultureInfo.InvariantCulture, $"{hours},{released / (1e-3 / 0.06) * 1e3:R}\n");
        }

        return text.ToString();
    }

    [Fact]
    public void The_documented_list_of_commands_on_a_food_contact_case_is_every_command_that_takes_a_case()
    {
        var documented = DocumentedCommands();
        var takingACase = CliApp.Build(TextWriter.Null, TextWriter.Null).Subcommands
            .Where(command => command.Arguments.Any(argument => argument.Name is "case" or "cases"))
            .Select(command => command.Name)
            .Order(StringComparer.Ordinal);

        Assert.Equal(takingACase, documented.Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Every_documented_command_works_on_a_food_contact_case_and_its_results_carry_the_food_contact_caution()
    {
        using var temp = new TempFolder();
        var outer = new Regex("outer: D is an upper-bound estimate for PET from polymer constants that are UNVERIFIED");
        foreach (var command in DocumentedCommands())
        {
            var outcome = command switch
            {
                "check" => CliRun.Invoke("check", temp.WriteFile("check.json", Case())),
                "run" => CliRun.Invoke("run", temp.WriteFile("run.json", Case()), "--no-plots", "--out", temp.Combine("out")),
                "design" => CliRun.Invoke("design", temp.WriteFile("design.json", Case(Design)), "--no-plots", "--jobs", "1", "--out", temp.Combine("out")),
                "uncertainty" => CliRun.Invoke("uncertainty", temp.WriteFile("uncertainty.json", Case(Uncertainty)), "--no-plots", "--jobs", "1", "--out", temp.Combine("out")),
                "fit" => CliRun.Invoke("fit", temp.WriteFile("fit.json", Case()), "--data", temp.WriteFile("food.csv", FoodData()), "-e", "$.layers[1].diffusionCoefficient", "--no-plots", "--out", temp.Combine("out")),
                _ => throw new InvalidOperationException($"docs/food-contact.md lists '{command}', which this test does not know how to run"),
            };

            Assert.True(outcome.ExitCode == ExitCodes.Success, $"{command}: exit {outcome.ExitCode}\n{outcome.Error}");
            if (command != "check")
            {
                Assert.Contains(FoodContactTables.Caution, outcome.Output, StringComparison.Ordinal);
            }

            if (command is "run" or "uncertainty" or "fit")
            {
                Assert.Matches(outer, outcome.Output);
            }
        }

        // The report of the run names the layer too, as its console does.
        Assert.Matches(outer, File.ReadAllText(temp.Combine("out", "run", "report.html")));

        // "A sweep in the case runs under run like any other sweep."
        var sweep = CliRun.Invoke("run", temp.WriteFile("sweep.json", Case(Sweep)), "--no-plots", "--jobs", "1", "--out", temp.Combine("sweep"));
        Assert.True(sweep.ExitCode == ExitCodes.Success, sweep.Error);
    }

    [Fact]
    public void Uncertainty_json_and_fit_json_of_a_food_contact_case_carry_its_caution_and_the_note_on_unverified_constants()
    {
        using var temp = new TempFolder();
        var uncertainty = CliRun.Invoke("uncertainty", temp.WriteFile("food-study.json", Case(Uncertainty)), "--no-plots", "--jobs", "1", "--out", temp.Path);
        var fit = CliRun.Invoke("fit", temp.WriteFile("food-fit.json", Case()), "--data", temp.WriteFile("food.csv", FoodData()), "-e", "$.layers[1].diffusionCoefficient", "--no-plots", "--out", temp.Path);
        Assert.Equal(ExitCodes.Success, uncertainty.ExitCode);
        Assert.Equal(ExitCodes.Success, fit.ExitCode);

        foreach (var file in new[] { temp.Combine("food-study.uncertainty", "uncertainty.json"), temp.Combine("food-fit.fit", "fit.json") })
        {
            using var json = JsonDocument.Parse(File.ReadAllText(file));
            Assert.Contains(FoodContactTables.Caution, json.RootElement.GetProperty("caution").GetString(), StringComparison.Ordinal);
            Assert.Contains(CautionText.Paragraph, json.RootElement.GetProperty("caution").GetString(), StringComparison.Ordinal);
            var note = Assert.Single(json.RootElement.GetProperty("notes").EnumerateArray());
            Assert.StartsWith("note: outer: D is an upper-bound estimate for PET", note.GetString(), StringComparison.Ordinal);
            Assert.Contains("UNVERIFIED", note.GetString(), StringComparison.Ordinal);
        }
    }

    [Fact]
    public void A_case_without_food_contact_or_estimates_gets_no_food_caution_and_no_notes_in_fit_json()
    {
        using var temp = new TempFolder();
        var outcome = CliRun.Invoke(
            "fit", RepoRoot.File("cases", "membrane-time-lag.json"), "--data", RepoRoot.File("cases", "membrane-time-lag-measured.csv"),
            "-e", "$.layers[0].diffusionCoefficient", "--no-plots", "--out", temp.Path);

        Assert.DoesNotContain(FoodContactTables.Caution, outcome.Output, StringComparison.Ordinal);
        using var json = JsonDocument.Parse(File.ReadAllText(temp.Combine("membrane-time-lag.fit", "fit.json")));
        Assert.Empty(json.RootElement.GetProperty("notes").EnumerateArray());
    }

    /// <summary>The commands in the first column of the table of the section, in backticks.</summary>
    private static List<string> DocumentedCommands()
    {
        var text = File.ReadAllText(RepoRoot.File("docs", "food-contact.md"));
        var start = text.IndexOf(Section, StringComparison.Ordinal);
        Assert.True(start >= 0, $"docs/food-contact.md has no section '{Section}'");
        var end = text.IndexOf("\n## ", start + Section.Length, StringComparison.Ordinal);
        var section = end < 0 ? text[start..] : text[start..end];
        return FirstCell().Matches(section).Select(match => match.Groups[1].Value).ToList();
    }

    [GeneratedRegex(@"^\| `([a-z]+)` \|", RegexOptions.Multiline)]
    private static partial Regex FirstCell();
}
