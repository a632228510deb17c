using Layers.Core.Studies;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.RootFinding;

namespace Layers.Tests.Studies;

/// <summary>The studies on a food-contact case: the specific migration limit as a design target and as the limit of a Monte Carlo.</summary>
public sealed class FoodLimitStudyTests
{
    // Invented: a 50 um film holding 1000 mg/kg (0.92 kg/m3) on 1 kg of food per 6 dm2, 10 d at 40 degC; the film
    // can give at most 0.46 mg/dm2, 2.76 mg/kg in the food, and the limit of 1.5 mg/kg is 54 % of that.
    private static string Film(string study) => $$"""
        {
          "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-11 cm2/s", "initialConcentration": "1000 mg/kg", "density": "0.92 g/cm3" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "food", "mass": "1 kg", "density": "1 kg/L", "area": "6 dm2" },
          "foodContact": { "stages": [ { "duration": "10 d", "temperature": "40 degC" } ], "specificMigrationLimit": "1.5 mg/kg" },
          "numerics": { "cells": 40 },
          {{study}}
        }
        """;

    [Fact]
    public void The_chance_of_exceeding_the_limit_is_the_log_normal_tail_beyond_the_D_that_just_reaches_it()
    {
        // Step 1, the design: the D at which the food reaches the limit at the end. The food is 333 times the
        // film's volume, so it acts nearly as a sink and the plane-sheet series into a sink (Crank, The Mathematics
        // of Diffusion, 2nd ed., eq. 4.18, from memory; sheet of half-thickness l = 50 um sealed on one face)
        // gives the same D to within the 0.3 % the finite volume holds back, plus the solver's accuracy.
        var (designDocument, designCase, design) = StudyCases.Design(Film("""
            "design": { "input": { "path": "$.layers[0].diffusionCoefficient", "from": "1e-14 cm2/s", "to": "1e-8 cm2/s" }, "result": "foodConcentration", "target": "1.5 mg/kg" }
            """));
        var found = DesignSolver.Solve(designDocument, "study.json", design, jobs: 2);
        Assert.Equal(StudyStatus.Done, found.Status);
        const double l = 50e-6;
        const double t = 10 * 86400;
        var fraction = 1.5 / 2.76;
        var series = Brent.FindRoot(d => Released(d * 1e-4) - fraction, 1e-16, 1e-8, 1e-22);
        Assert.Equal(series, found.Answer!.Value, series * 0.02);
        Assert.NotNull(designCase.FoodContact);

        // Step 2, the Monte Carlo: food concentration rises with D, so it exceeds the limit exactly when D > D*;
        // for a log-normal D that happens with probability 1 - Phi(ln(D*/median) / ln(factor)) (Math.NET's
        // log-normal as the reference). The sample fraction is within 3.29 binomial standard deviations (99.9 %).
        const int samples = 150;
        var (document, baseCase, study) = StudyCases.Uncertainty(Film($$"""
            "uncertainty": { "inputs": [ { "path": "$.layers[0].diffusionCoefficient", "distribution": "logNormal", "median": "1e-11 cm2/s", "factor": 3 } ], "samples": {{samples}}, "seed": 5, "results": ["timeToLimit"] }
            """));
        var outcome = UncertaintyRunner.Run(document, "study.json", baseCase, study, jobs: 2);

        Assert.Equal(StudyStatus.Done, outcome.Status);
        var exceedance = outcome.Exceedance!;
        Assert.Equal("$.foodContact.specificMigrationLimit", exceedance.Limit.Origin);
        var expected = 1 - LogNormal.CDF(Math.Log(1e-11), Math.Log(3), found.Answer.Value);
        Assert.InRange(exceedance.Probability, expected - (3.29 * Math.Sqrt(expected * (1 - expected) / samples)), expected + (3.29 * Math.Sqrt(expected * (1 - expected) / samples)));
        // The samples that never reach the limit are those within it at the end: the same count both ways.
        Assert.Equal(samples - exceedance.Above, outcome.Results[0].Values.Count(double.IsPositiveInfinity));

        static double Released(double d)
        {
            var sum = 0.0;
            for (var n = 0; n < 200; n++)
            {
                var k = (2 * n) + 1;
                sum += 8 / (k * k * Math.PI * Math.PI) * Math.Exp(-d * k * k * Math.PI * Math.PI * t / (4 * l * l));
            }

            return 1 - sum;
        }
    }
}
