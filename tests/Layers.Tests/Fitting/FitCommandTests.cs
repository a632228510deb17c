using System.Text.Json;
using Layers.Cli;
using Layers.Core.Fitting;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Fitting;

public sealed class FitCommandTests
{
    private static readonly string Case = RepoRoot.File("cases", "membrane-time-lag.json");
    private static readonly string Data = RepoRoot.File("cases", "membrane-time-lag-measured.csv");

    [Fact]
    public void Fits_the_demo_membrane_and_writes_every_file_with_documented_keys()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("fit", Case, "--data", Data, "-e", "$.layers[0].diffusionCoefficient", "-e", "$.layers[0].partitionCoefficient", "--out", temp.Path);

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        var folder = temp.Combine("membrane-time-lag.fit");
        Assert.All(new[] { "fit.json", "fit-points.csv", "fit-curve.csv", "fitted-case.json", "fit.png" }, name => Assert.True(File.Exists(Path.Combine(folder, name)), name));
        Assert.Contains("95 % interval", outcome.Output);
        Assert.Contains("Estimated inputs hold for this model", outcome.Output);

        // The fitted case is a valid case that carries the estimates (the same rules as any case file).
        var fitted = CaseDocument.ReadFile(Path.Combine(folder, "fitted-case.json"));
        Assert.True(fitted.IsValid, fitted.FormatErrors());
        Assert.Equal("fitted", fitted.Case!.Stack.Layers[0].DiffusivityOrigin);

        // Every key of fit.json is in the table of docs/outputs.md, section "Fit" (common practice of the project).
        var documented = File.ReadAllText(RepoRoot.File("docs", "outputs.md"));
        documented = documented[documented.IndexOf("## Fit", StringComparison.Ordinal)..];
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "fit.json")));
        foreach (var key in Keys(json.RootElement))
        {
            Assert.Contains($"`{key}", documented, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData("time,Q\n1,2\n2,3\n", "line 1: expected two or three columns with units in brackets")]
    [InlineData("time [h],Q [ug/cm2],sd [ug/cm2]\n1,2,0.1\n2,3\n", "line 3: expected three numbers separated by commas")]
    [InlineData("time [h],Q [ug/cm2],sd [ug/cm2]\n1,2,0.1\n2,3,0\n", "line 3: the standard deviation must be > 0")]
    [InlineData("time [h],Q [ug/cm2]\n2,2\n1,3\n", "line 3: times must be >= 0 and ascending")]
    [InlineData("time [h],Q [mm]\n1,2\n2,3\n", "line 1: expected two or three columns")]
    [InlineData("time [h],Q [ug/cm2],sd [mg/L]\n1,2,0.1\n", "line 1: expected two or three columns")]
    public void A_bad_data_file_is_refused_naming_the_file_the_line_and_what_was_expected(string csv, string expected)
    {
        using var temp = new TempFolder();
        var path = temp.WriteFile("q.csv", csv);

        var outcome = CliRun.Invoke("fit", Case, "--data", path, "-e", "$.layers[0].diffusionCoefficient", "--out", temp.Combine("out"));

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Contains($"'{path}' {expected}", outcome.Error);
        Assert.False(Directory.Exists(temp.Combine("out")));
    }

    [Theory]
    [InlineData("$.layers[0].color", "'$.layers[0].color' is not in the case")]
    [InlineData("$.layers[0].name", "'$.layers[0].name' is not a quantity or a number")]
    [InlineData("layers[0]", "'layers[0]' is not a path of the form")]
    public void A_path_that_cannot_be_estimated_is_refused(string path, string expected)
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("fit", Case, "--data", Data, "-e", path, "--out", temp.Combine("out"));

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Contains(expected, outcome.Error);
        Assert.False(Directory.Exists(temp.Combine("out")));
    }

    [Fact]
    public void Concentrations_need_a_compartment_and_data_must_lie_within_the_duration()
    {
        using var temp = new TempFolder();
        var path = temp.WriteFile("c.csv", "time [h],concentration [mg/L]\n1,2\n2,3\n24,4\n");

        var outcome = CliRun.Invoke("fit", Case, "--data", path, "-e", "$.layers[0].diffusionCoefficient", "--out", temp.Combine("out"));

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Contains("$.right: '", outcome.Error);
        Assert.Contains("holds concentrations, which need a compartment on the right face", outcome.Error);
        Assert.Contains("$.duration: the data run to 24 h, beyond the duration of the case", outcome.Error);
    }

    [Fact]
    public void Measured_series_reads_units_and_standard_deviations_into_SI()
    {
        using var temp = new TempFolder();
        var path = temp.WriteFile("c.csv", "time [min],concentration [mg/L],sd [ug/mL]\n0,0,0.5\n30,2.5,0.25\n");

        var series = MeasuredSeries.Read(path, out var problem)!;

        // 1 mg/L = 1e-3 kg/m3 and 1 ug/mL = 1e-3 kg/m3 (unit definitions, SI brochure).
        Assert.Null(problem);
        Assert.Equal(MeasuredQuantity.Concentration, series.Quantity);
        Assert.Equal([0, 1800], series.TimesSeconds);
        Assert.Equal(2.5e-3, series.Values[1], 15);
        Assert.Equal(2.5e-4, series.Deviations![1], 15);
    }

    private static IEnumerable<string> Keys(JsonElement element, string prefix = "")
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var property in element.EnumerateObject())
                {
                    var key = prefix.Length == 0 ? property.Name : $"{prefix}.{property.Name}";
                    yield return key;
                    foreach (var inner in Keys(property.Value, key))
                    {
                        yield return inner;
                    }
                }

                break;
            case JsonValueKind.Array:
                foreach (var item in element.EnumerateArray().Where(item => item.ValueKind == JsonValueKind.Object).Take(1))
                {
                    foreach (var inner in Keys(item, prefix + "[]"))
                    {
                        yield return inner;
                    }
                }

                break;
        }
    }
}
