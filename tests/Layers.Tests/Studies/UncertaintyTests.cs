using Layers.Core.Studies;
using Layers.Tests.TestSupport;
using MathNet.Numerics.Distributions;

namespace Layers.Tests.Studies;

/// <summary>Monte Carlo over uncertain inputs: percentiles against the analytic transform of the input distribution.</summary>
public sealed class UncertaintyTests
{
    // 99.9 % two-sided normal quantile, for the distribution-free interval of a sample percentile.
    private const double Z = 3.29;

    [Fact]
    public void With_a_log_normal_D_the_percentiles_of_the_early_release_are_the_square_root_law_applied_to_the_percentiles_of_D()
    {
        // Early desorption from a plane sheet into a sink: M_t = 2 C0 sqrt(D t / pi) per face while D t / l^2 is
        // small (Crank, The Mathematics of Diffusion, 2nd ed., eq. 4.20, leading term, from memory); here
        // C0 = 1 kg/m3, l = 200 um, t = 15 min, and D t / l^2 < 0.03 for every D below the 99.99th percentile, where
        // the next term of the series (2 ierfc(l / sqrt(D t)) relative) is below 1e-15. M is increasing in D, so its p-th percentile is the law
        // applied to the p-th percentile of D: D_p = median * factor^z_p for the log-normal.
        const int samples = 400;
        var (document, baseCase, study) = StudyCases.Uncertainty(StudyCases.Sheet($$"""
            "uncertainty": { "inputs": [ { "path": "$.layers[0].diffusionCoefficient", "distribution": "logNormal", "median": "1e-9 cm2/s", "factor": 2 } ], "samples": {{samples}}, "seed": 11, "results": [ { "name": "rightReceived", "at": "15 min" } ] }
            """, diffusion: "1e-9 cm2/s", cells: "\"numerics\": { \"cells\": 60 },"));
        static double Released(double diffusionCm2PerSecond) => 2 * 1.0 * Math.Sqrt(diffusionCm2PerSecond * 1e-4 * 900 / Math.PI);

        var outcome = UncertaintyRunner.Run(document, "study.json", baseCase, study, jobs: 2);

        Assert.Equal(StudyStatus.Done, outcome.Status);
        var spread = Assert.Single(outcome.Results);
        var inputPercentiles = Percentile.Of(outcome.InputValues.Select(row => row[0]), study.Percentiles);
        for (var i = 0; i < study.Percentiles.Count; i++)
        {
            var p = study.Percentiles[i] / 100;
            var found = spread.Percentiles[i];
            // 1. Same samples: the percentile of M is the law at the percentile of D, to the solver's accuracy
            //    (under 1 % with 60 cells) and the interpolation between order statistics.
            Tolerance.Relative(Released(inputPercentiles[i]), found, 0.01, $"p{study.Percentiles[i]} against the sampled D");
            // 2. Against the distribution itself: the sample p-quantile lies between the population quantiles at
            //    p -+ z sqrt(p (1-p) / N) (+1/N for the interpolation) with probability 99.9 % (order-statistic
            //    interval from the binomial count below a quantile, normal approximation; David and Nagaraja, Order
            //    Statistics, 3rd ed., section 7.1, from memory), widened by the solver's 0.5 %.
            var half = (Z * Math.Sqrt(p * (1 - p) / samples)) + (1.0 / samples);
            var low = Released(1e-9 * Math.Pow(2, Normal.InvCDF(0, 1, Math.Max(1e-9, p - half))));
            var high = Released(1e-9 * Math.Pow(2, Normal.InvCDF(0, 1, Math.Min(1 - 1e-9, p + half))));
            Assert.InRange(found, low * 0.995, high * 1.005);
        }

        // The median lies much closer than the tails: its interval is +-8.7 % in D, +-4.4 % in M.
        Tolerance.Relative(Released(1e-9), spread.Percentiles[1], 0.05, "median release");
    }

    [Fact]
    public void The_same_seed_gives_the_same_samples_and_percentiles_with_any_number_of_jobs()
    {
        var (document, baseCase, study) = StudyCases.Uncertainty(StudyCases.Sheet("""
            "uncertainty": { "inputs": [ { "path": "$.layers[0].diffusionCoefficient", "distribution": "logUniform", "min": "1e-10 cm2/s", "max": "1e-8 cm2/s" } ], "samples": 6, "seed": 3, "sampling": "latinHypercube" }
            """, cells: "\"numerics\": { \"cells\": 30 },"));

        var one = UncertaintyRunner.Run(document, "study.json", baseCase, study, jobs: 1);
        var two = UncertaintyRunner.Run(document, "study.json", baseCase, study, jobs: 2);
        var other = UncertaintyRunner.Run(document, "study.json", baseCase, study with { Seed = 4 }, jobs: 2);

        Assert.Equal(Core.Reports.UncertaintyReport.SamplesCsv(one), Core.Reports.UncertaintyReport.SamplesCsv(two));
        Assert.Equal(Core.Reports.UncertaintyReport.PercentilesCsv(one), Core.Reports.UncertaintyReport.PercentilesCsv(two));
        Assert.NotEqual(one.InputValues.Select(row => row[0]), other.InputValues.Select(row => row[0]));
    }

    [Fact]
    public void Latin_hypercube_puts_one_sample_in_each_equal_stratum_of_every_input()
    {
        const int samples = 37;
        var rows = SampleDesign.Draw(samples, 3, SamplingMethod.LatinHypercube, seed: 5);

        for (var column = 0; column < 3; column++)
        {
            var strata = rows.Select(row => (int)Math.Floor(row[column] * samples)).Order();
            Assert.Equal(Enumerable.Range(0, samples), strata);
        }

        // The columns are shuffled independently, not in step.
        Assert.NotEqual(rows.Select(row => (int)(row[0] * samples)), rows.Select(row => (int)(row[1] * samples)));
    }

    [Theory]
    [InlineData(0.05)]
    [InlineData(0.5)]
    [InlineData(0.975)]
    public void The_distributions_invert_to_the_quantiles_of_the_reference_library(double probability)
    {
        // Math.NET Numerics' own distributions as the reference: log-normal with mu = ln(median) and
        // sigma = ln(factor), normal, continuous uniform; uniform in log = exp of uniform in ln.
        Assert.Equal(LogNormal.InvCDF(Math.Log(3e-9), Math.Log(2.5), probability), new LogNormalDistribution(3e-9, 2.5).Quantile(probability), 1e-20);
        Assert.Equal(Normal.InvCDF(20, 2, probability), new NormalDistribution(20, 2).Quantile(probability), 1e-12);
        Assert.Equal(ContinuousUniform.InvCDF(10, 30, probability), new UniformDistribution(10, 30).Quantile(probability), 1e-12);
        Assert.Equal(Math.Exp(ContinuousUniform.InvCDF(Math.Log(1e-3), Math.Log(10), probability)), new LogUniformDistribution(1e-3, 10).Quantile(probability), 1e-12);
    }

    [Fact]
    public void Percentiles_follow_the_linear_interpolation_of_order_statistics()
    {
        // Hyndman and Fan (1996), definition 7, as implemented by Math.NET Numerics (QuantileDefinition.R7).
        var random = new Random(9);
        var values = Enumerable.Range(0, 23).Select(_ => random.NextDouble() * 100).ToArray();
        foreach (var percent in new[] { 1.0, 5, 37.5, 50, 95, 99 })
        {
            var reference = MathNet.Numerics.Statistics.Statistics.QuantileCustom(values, percent / 100, MathNet.Numerics.Statistics.QuantileDefinition.R7);
            Assert.Equal(reference, Percentile.Of(values, [percent])[0], 1e-12);
        }
    }

    [Theory]
    [InlineData(81, 263, 0.2553, 0.3662)]
    [InlineData(15, 148, 0.0624, 0.1605)]
    [InlineData(0, 20, 0.0000, 0.1611)]
    [InlineData(1, 29, 0.0061, 0.1718)]
    public void The_chance_of_exceeding_carries_the_Wilson_score_interval(int above, int counted, double low, double high)
    {
        // Newcombe, Statistics in Medicine 17 (1998) 857-872, Table I, method 3 (score interval), from memory.
        var (foundLow, foundHigh) = UncertaintyRunner.Wilson(above, counted);

        Assert.Equal(low, foundLow, 4);
        Assert.Equal(high, foundHigh, 4);
    }

    [Fact]
    public void Mistakes_in_the_uncertainty_section_are_reported_at_their_paths_when_the_case_is_read()
    {
        var errors = StudyCases.Errors(StudyCases.Sheet("""
            "uncertainty": { "inputs": [
              { "path": "$.layers[0].diffusionCoefficient", "distribution": "logNormal", "median": "1e-9 cm2/s", "factor": 0.5 },
              { "path": "$.layers[0].thickness", "distribution": "normal", "mean": "200 um", "standardDeviation": "100 um" },
              { "path": "$.left.concentration", "distribution": "uniform", "min": "1 mg/L", "max": "2 g/L" },
              { "path": "$.right.concentration", "distribution": "triangle", "min": "1 mg/L", "max": "2 mg/L" }
            ], "samples": 1, "percentiles": [50, 5] }
            """));

        Assert.Contains(errors, error => error.StartsWith("$.uncertainty.inputs[0].factor: is required: a plain number > 1", StringComparison.Ordinal));
        Assert.Contains(errors, error => error.StartsWith("$.uncertainty.inputs[1].mean: ", StringComparison.Ordinal) && error.Contains("at $.layers[0].thickness: must be > 0", StringComparison.Ordinal));
        Assert.Contains("$.uncertainty.inputs[2].path: '$.left.concentration' is not in this case; a varied value must be written in the case", errors);
        Assert.Contains(errors, error => error.StartsWith("$.uncertainty.inputs[3].distribution: must be one of \"logNormal\"", StringComparison.Ordinal));
        Assert.Contains("$.uncertainty.samples: must be a number from 2 to 100000; got 1", errors);
        Assert.Contains(errors, error => error.StartsWith("$.uncertainty.percentiles: expected ascending numbers between 0 and 100", StringComparison.Ordinal));
    }

    [Fact]
    public void The_uncertainty_command_writes_its_files_and_the_seed_option_changes_the_samples()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("spread.json", StudyCases.Sheet("""
            "uncertainty": { "inputs": [ { "path": "$.layers[0].diffusionCoefficient", "distribution": "logNormal", "median": "1e-9 cm2/s", "factor": 3 } ], "samples": 4, "limit": { "result": { "name": "rightReceived", "at": "1 h" }, "value": "1 ug/cm2" } }
            """, cells: "\"numerics\": { \"cells\": 30 },"));

        var first = CliRun.Invoke("uncertainty", file, "--out", temp.Combine("a"), "--plot-width", "400", "--plot-height", "300");
        var second = CliRun.Invoke("uncertainty", file, "--out", temp.Combine("b"), "--seed", "2", "--samples", "5", "--no-plots");

        Assert.True(first.ExitCode == Layers.Cli.ExitCodes.Success, first.Error);
        Assert.True(second.ExitCode == Layers.Cli.ExitCodes.Success, second.Error);
        var folder = temp.Combine("a", "spread.uncertainty");
        Assert.True(Plotting.PngImage.HasSignature(File.ReadAllBytes(Path.Combine(folder, "spread.png"))));
        Assert.Equal(5, File.ReadAllLines(Path.Combine(folder, "samples.csv")).Length);
        Assert.Equal(6, File.ReadAllLines(temp.Combine("b", "spread.uncertainty", "samples.csv")).Length);
        Assert.StartsWith("time [s],rightReceived p5 [kg/m2],rightReceived p50 [kg/m2],rightReceived p95 [kg/m2]", File.ReadAllText(Path.Combine(folder, "percentiles.csv")), StringComparison.Ordinal);
        Assert.Contains("chance that mass per area received by the right medium at 1 h exceeds 1 µg/cm2", first.Output, StringComparison.Ordinal);
        Assert.Contains("not dosing advice", first.Output, StringComparison.Ordinal);
        Assert.NotEqual(
            File.ReadAllLines(Path.Combine(folder, "samples.csv"))[1],
            File.ReadAllLines(temp.Combine("b", "spread.uncertainty", "samples.csv"))[1]);
    }
}
