using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary><c>layers check CASE</c>: validates and prints the stack without solving.</summary>
public sealed class CheckCommandTests
{
    private static string Demo => RepoRoot.File("cases", "laminate-fatty-food.json");

    [Fact]
    public void Checking_the_demo_prints_the_stack_and_exits_0()
    {
        var outcome = CliRun.Invoke("check", Demo);

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
        Assert.Equal(string.Empty, outcome.Error);
        var lines = outcome.Output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.EndsWith(": valid", lines[0], StringComparison.Ordinal);
        // The layers from the left face to the right face, in the order the case lists them.
        var layerRows = lines.Where(line => line.TrimStart().StartsWith("print layer", StringComparison.Ordinal)
            || line.TrimStart().StartsWith("adhesive", StringComparison.Ordinal)
            || line.TrimStart().StartsWith("sealant", StringComparison.Ordinal)).Select(line => line.Trim()).ToArray();
        Assert.Equal(3, layerRows.Length);
        Assert.StartsWith("print layer", layerRows[0], StringComparison.Ordinal);
        Assert.StartsWith("adhesive", layerRows[1], StringComparison.Ordinal);
        Assert.StartsWith("sealant", layerRows[2], StringComparison.Ordinal);
        Assert.Contains(lines, line => line.Contains("left face", StringComparison.Ordinal) && line.TrimEnd().EndsWith("closed", StringComparison.Ordinal));
        Assert.Contains(lines, line => line.Contains("right face", StringComparison.Ordinal) && line.Contains("compartment \"simulant\"", StringComparison.Ordinal));
    }

    [Fact]
    public void The_printed_stack_shows_the_converted_inputs()
    {
        var output = CliRun.Invoke("check", Demo).Output;

        // 1000 mg/kg at 0.92 g/cm3 = 0.92 kg/m3 inside the run (mass fraction times density; SI Brochure 9th ed.,
        // Tables 7 and 8), shown back as written: every layer gives its density, so "initial c [mg/kg]".
        Assert.Contains("initial c [mg/kg]", output, StringComparison.Ordinal);
        var sealant = output.Split('\n').Single(line => line.TrimStart().StartsWith("sealant", StringComparison.Ordinal));
        Assert.Contains(" 1000 ", sealant, StringComparison.Ordinal);
        // 1 kg / 0.92 g/cm3 = 1087 mL to four digits; 6 dm2 = 600 cm2 (SI Brochure 9th ed., Tables 7 and 8).
        Assert.Contains("1087 mL on 600 cm2", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Checking_an_invalid_case_exits_2_and_names_file_and_path_on_stderr()
    {
        using var temp = new TempFolder();
        var casePath = temp.WriteFile("film.json", CaseJson.MinimalWith(("$.right.kind", "\"pipe\"")));

        var outcome = CliRun.Invoke("check", casePath);

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Equal(string.Empty, outcome.Output);
        Assert.Contains(outcome.ErrorLines, line => line.StartsWith($"{casePath}: $.right.kind (line ", StringComparison.Ordinal)
            && line.EndsWith("): must be one of closed, bath, compartment; got 'pipe'", StringComparison.Ordinal));
    }

    [Fact]
    public void Checking_a_file_that_is_not_JSON_exits_2_with_line_and_column()
    {
        using var temp = new TempFolder();
        var casePath = temp.WriteFile("notes.json", "layers: film\n");

        var outcome = CliRun.Invoke("check", casePath);

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Contains(outcome.ErrorLines, line => line.StartsWith($"{casePath}: $ (line 1, column 1): not valid JSON", StringComparison.Ordinal));
    }

    [Fact]
    public void Checking_writes_no_results()
    {
        using var temp = new TempFolder();
        var casePath = temp.WriteFile("film.json", CaseJson.Minimal);

        var outcome = CliRun.Invoke("check", casePath);

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Equal([casePath], Directory.GetFileSystemEntries(temp.Path));
    }
}
