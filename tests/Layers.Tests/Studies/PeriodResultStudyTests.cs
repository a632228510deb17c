using System.Globalization;
using Layers.Core.Analytics;
using Layers.Core.Batch;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Studies;

/// <summary>
/// Studies that read a figure of one period of a schedule: each reads what the run's own per-period outcomes report
/// for the same case, and the amount a renewed limited volume receives in each contact is what the eigenfunction
/// expansion restarted at each renewal gives (Crank, The Mathematics of Diffusion, 2nd ed. 1975, ch. 4, eq. 4.37 and
/// its derivation, from memory; Analytics.SheetIntoRenewedVolume).
/// </summary>
public sealed class PeriodResultStudyTests
{
    // A sheet of 100 um, D = 1e-13 m2/s, 400 kg/m3, sealed on the left, into 5 uL on 1 cm2 (V/A = half the thickness,
    // K = 1) renewed at each of three contacts of 0.2 L^2/D: invented numbers, chosen so that every contact matters.
    private const double Thickness = 1e-4, Diffusivity = 1e-13, InitialConcentration = 400, VolumePerArea = 5e-5, ContactSeconds = 20000;

    private static string RenewedSheet(string study, string diffusion = "1e-9 cm2/s") => $$"""
        {
          "layers": [ { "name": "sheet", "thickness": "100 um", "diffusionCoefficient": "{{diffusion}}", "initialConcentration": "400 mg/mL" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "solution", "volume": "5 uL", "area": "1 cm2" },
          "schedule": [ { "name": "contact", "duration": "20000 s", "renew": ["right"], "repeat": 3 } ],
          {{study}}
        }
        """;

    [Fact]
    public void An_uncertainty_study_of_the_repeated_dose_cell_reads_each_period_figure_the_single_run_reports()
    {
        var json = CaseJson.With(
            File.ReadAllText(RepoRoot.File("cases", "repeated-dose-diffusion-cell.json")),
            ("$.uncertainty", """
                {
                  "inputs": [ { "path": "$.layers[0].diffusionCoefficient", "distribution": "logNormal", "median": "5e-9 cm2/s", "factor": 1.5 } ],
                  "samples": 2,
                  "seed": 3,
                  "results": [
                    "rightPeriodReceived",
                    { "name": "rightPeriodLowestFlux", "period": "dose 3 of 7" },
                    { "name": "rightPeriodHighestFlux", "period": "dose 1 of 7" },
                    { "name": "rightPeriodEndConcentration", "period": "dose 7 of 7" },
                    { "name": "leftPeriodReceived", "period": "dose 2 of 7" }
                  ]
                }
                """));
        var (document, baseCase, study) = StudyCases.Uncertainty(json);

        var outcome = UncertaintyRunner.Run(document, "dose.json", baseCase, study, jobs: 2);

        Assert.Equal(StudyStatus.Done, outcome.Status);
        Assert.Equal(
            [
                "mass per area received by the right medium in the last period",
                "lowest flux into the right medium in 'dose 3 of 7'",
                "highest flux into the right medium in 'dose 1 of 7'",
                "concentration in the right medium at the end of 'dose 7 of 7'",
                "mass per area received by the left medium in 'dose 2 of 7'",
            ],
            outcome.Results.Select(result => result.Result.Label));
        for (var i = 0; i < outcome.InputValues.Count; i++)
        {
            // The same sample solved on its own, with the outputs a study adds, and its periods found by position.
            var read = CaseVariation.Read(document, "dose.json", [(study.Inputs[0].Input, outcome.InputValues[i][0])], OutputSchedule.For(baseCase));
            var periods = Simulator.Run(read.Case!, checkExactByFiniteVolumes: false).Schedule!.Periods;
            var expected = new[]
            {
                Medium(periods[6], Side.Right).ReceivedKgPerSquareMeter,
                Medium(periods[2], Side.Right).LowestFluxKgPerSquareMeterSecond,
                Medium(periods[0], Side.Right).HighestFluxKgPerSquareMeterSecond,
                Medium(periods[6], Side.Right).ConcentrationAtEndKgPerCubicMeter,
                Medium(periods[1], Side.Left).ReceivedKgPerSquareMeter,
            };
            for (var k = 0; k < expected.Length; k++)
            {
                Tolerance.Relative(expected[k], outcome.Results[k].Values[i], 1e-12, $"sample {i + 1}, {outcome.Results[k].Result.Label}");
            }

            // The dose gives mass up: what its medium "received" is negative, and the peak lies above the trough.
            Assert.True(outcome.Results[4].Values[i] < 0);
            Assert.True(Medium(periods[2], Side.Right).HighestFluxKgPerSquareMeterSecond > outcome.Results[1].Values[i]);
        }
    }

    [Fact]
    public void An_uncertainty_study_reads_each_contact_of_a_renewed_limited_volume_as_the_restarted_expansion_gives_it()
    {
        var (document, baseCase, study) = StudyCases.Uncertainty(RenewedSheet("""
            "uncertainty": {
              "inputs": [ { "path": "$.layers[0].diffusionCoefficient", "distribution": "logNormal", "median": "1e-9 cm2/s", "factor": 1.5 } ],
              "samples": 3,
              "seed": 11,
              "results": [
                { "name": "rightPeriodReceived", "period": "contact 1 of 3" },
                { "name": "rightPeriodReceived", "period": "contact 2 of 3" },
                { "name": "rightPeriodReceived", "period": "contact 3 of 3" },
                { "name": "rightPeriodEndConcentration", "period": "contact 2 of 3" }
              ]
            }
            """));

        var outcome = UncertaintyRunner.Run(document, "sheet.json", baseCase, study, jobs: 2);

        Assert.Equal(StudyStatus.Done, outcome.Status);
        for (var i = 0; i < outcome.InputValues.Count; i++)
        {
            var diffusivity = outcome.InputValues[i][0] * 1e-4;
            var amounts = SheetIntoRenewedVolume.AmountPerContact(diffusivity, Thickness, InitialConcentration, VolumePerArea, 1, ContactSeconds, 3);
            for (var k = 0; k < 3; k++)
            {
                Tolerance.Relative(amounts[k], outcome.Results[k].Values[i], 1e-3, $"sample {i + 1}, contact {k + 1} (Crank's expansion restarted at each renewal)");
            }

            // A fresh portion holds at the end of its contact what it received in it, over its depth V/A.
            Tolerance.Relative(amounts[1] / VolumePerArea, outcome.Results[3].Values[i], 1e-3, $"sample {i + 1}, concentration at the end of contact 2");
        }
    }

    [Fact]
    public void A_design_finds_the_diffusion_coefficient_at_which_the_second_contact_takes_what_the_restarted_expansion_gives()
    {
        // The target is the second contact's amount at D = 1e-13 m2/s by the expansion restarted at each renewal; the
        // design must find that D back. How closely follows from the same expansion: the amount grows as D^slope, so the
        // run's accuracy on it (the default 1e-4, relative) is accuracy / slope on D; three times that is allowed.
        static double SecondContact(double diffusivity) =>
            SheetIntoRenewedVolume.AmountPerContact(diffusivity, Thickness, InitialConcentration, VolumePerArea, 1, ContactSeconds, 3)[1];
        var target = SecondContact(Diffusivity);
        var slope = Math.Log(SecondContact(Diffusivity * 1.01) / target) / Math.Log(1.01);
        var (document, _, design) = StudyCases.Design(RenewedSheet(string.Create(CultureInfo.InvariantCulture, $$"""
            "design": {
              "input": { "path": "$.layers[0].diffusionCoefficient", "from": "3e-10 cm2/s", "to": "3e-9 cm2/s" },
              "result": { "name": "rightPeriodReceived", "period": "contact 2 of 3" },
              "target": "{{target:R}} kg/m2",
              "tolerance": 1e-6
            }
            """)));

        var found = DesignSolver.Solve(document, "sheet.json", design, jobs: 2);

        Assert.Equal(StudyStatus.Done, found.Status);
        Assert.Equal("contact 2 of 3", design.Result.Period);
        Assert.InRange(slope, 0.1, 1);
        Tolerance.Relative(Diffusivity * 1e4, found.Answer!.Value, 3 * 1e-4 / slope, "D in cm2/s at which contact 2 takes the expansion's amount");
        Tolerance.Relative(target, found.ResultAtAnswerSi!.Value, 3e-4, "contact 2's amount at the answer");
    }

    [Fact]
    public void Food_concentration_without_a_time_is_the_judged_third_contact_as_the_verdict_and_the_batch_summary_read_it()
    {
        // Four contacts: the third is judged (Regulation (EU) No 10/2011, Article 17, from memory), not the last. The
        // time series holds a sample at each contact's end taken before the renewal, so reading at 30 d is independent.
        var json = CaseJson.With(
            File.ReadAllText(RepoRoot.File("cases", "reusable-container-three-contacts.json")),
            ("$.schedule[0].repeat", "4"),
            ("$.reportTimes", """["10 d", "20 d", "30 d", "40 d"]"""),
            ("$.design", """
                {
                  "input": { "path": "$.layers[0].initialConcentration", "from": "100 mg/kg", "to": "1000 mg/kg" },
                  "result": "foodConcentration",
                  "target": "1.5 mg/kg"
                }
                """));
        var (_, baseCase, design) = StudyCases.Design(json);
        var result = Simulator.Run(baseCase);
        Assert.True(result.Completed, result.FailureReason);

        var judged = design.Result.Read(result)!.Value;
        var third = new ResultMeasure(NamedResult.FoodConcentration, 30 * 86400.0, "30 d").Read(result)!.Value;
        var last = new ResultMeasure(NamedResult.FoodConcentration, 40 * 86400.0, "40 d").Read(result)!.Value;

        Assert.Equal("concentration in the food at the end of the judged contact", design.Result.Label);
        Tolerance.Relative(third, judged, 1e-12, "study's food concentration against the third contact's end");
        Assert.True(Tolerance.RelativeError(last, judged) > 1e-3, "the fourth contact differs from the third, so the test can tell them apart");
        Assert.Equal(judged, BatchKeyResults.From(result).FoodConcentrationKgPerKg);
        Assert.Equal(judged, LimitCheck.Of(result)!.ValueSi);
    }

    [Fact]
    public void Food_concentration_of_a_case_without_renewed_food_is_read_at_the_end_and_labelled_so()
    {
        var (_, _, design) = StudyCases.Design(File.ReadAllText(RepoRoot.File("cases", "reusable-container-three-contacts.json"))
            .Replace("\"renew\": [\"right\"], ", string.Empty, StringComparison.Ordinal)
            .Replace("\"reportTimes\"", """
                "design": { "input": { "path": "$.layers[0].initialConcentration", "from": "100 mg/kg", "to": "1000 mg/kg" }, "result": "foodConcentration", "target": "1.5 mg/kg" },
                "reportTimes"
                """, StringComparison.Ordinal));

        Assert.Equal("concentration in the food at the end", design.Result.Label);
        Assert.False(design.Result.AtJudgedContact);
    }

    [Fact]
    public void Whether_a_study_reads_the_judged_contact_agrees_with_whether_the_run_judges_contacts()
    {
        var renewed = File.ReadAllText(RepoRoot.File("cases", "reusable-container-three-contacts.json"));
        var kept = renewed.Replace("\"renew\": [\"right\"], ", string.Empty, StringComparison.Ordinal);

        foreach (var json in new[] { renewed, kept })
        {
            var simulation = CaseJson.Read(json).Case!;
            var result = Simulator.Run(simulation);
            Assert.True(result.Completed, result.FailureReason);
            Assert.Equal(result.Schedule!.RepeatedUse is not null, simulation.JudgesRepeatedUse);
        }

        Assert.True(CaseJson.Read(renewed).Case!.JudgesRepeatedUse);
    }

    [Fact]
    public void A_period_that_is_not_repeated_is_named_by_its_name_alone()
    {
        var json = CaseJson.With(
            File.ReadAllText(RepoRoot.File("cases", "daily-patch-week.json")),
            ("$.uncertainty", """
                { "inputs": [ { "path": "$.layers[1].thickness", "distribution": "uniform", "min": "40 um", "max": "60 um" } ],
                  "results": [ { "name": "rightPeriodReceived", "period": "first patch" }, { "name": "rightPeriodReceived", "period": "after removal" },
                               { "name": "rightPeriodLowestFlux", "period": "new patch 6 of 6" } ] }
                """));
        var (_, baseCase, study) = StudyCases.Uncertainty(json);

        var result = Simulator.Run(baseCase);

        Assert.True(result.Completed, result.FailureReason);
        var periods = result.Schedule!.Periods;
        Assert.Equal(8, periods.Count);
        Assert.Equal(Medium(periods[0], Side.Right).ReceivedKgPerSquareMeter, study.Results[0].Read(result));
        Assert.Equal(Medium(periods[7], Side.Right).ReceivedKgPerSquareMeter, study.Results[1].Read(result));
        Assert.Equal(Medium(periods[6], Side.Right).LowestFluxKgPerSquareMeterSecond, study.Results[2].Read(result));
        Assert.Equal("mass per area received by the right medium in 'after removal'", study.Results[1].Label);
    }

    private static MediumInPeriod Medium(PeriodOutcome period, Side side) => period.Media.Single(medium => medium.Side == side);
}
