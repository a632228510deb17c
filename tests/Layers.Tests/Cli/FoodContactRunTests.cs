using System.Text.Json;
using Layers.Core.Reports;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// <c>layers run</c> and <c>check</c> on the food-contact demo: the key figures, the provenance of every D, the
/// migration caution and the assumptions reach the console, summary.json and report.html (common practice, no
/// source: results that bear on food safety carry their caution).
/// </summary>
public sealed class FoodContactRunTests
{
    private static readonly string Demo = RepoRoot.File("cases", "hot-fill-barrier-shelf-life.json");

    [Fact]
    public void Run_prints_the_verdict_the_provenance_and_the_caution()
    {
        using var temp = new TempFolder();

        var outcome = CliRun.Invoke("run", Demo, "--out", temp.Path, "--no-plots");

        Assert.Equal(0, outcome.ExitCode);
        Assert.Contains("specific migration limit", outcome.Output, StringComparison.Ordinal);
        Assert.Contains("verdict (model)", outcome.Output, StringComparison.Ordinal);
        Assert.Contains("UNVERIFIED, from memory", outcome.Output, StringComparison.Ordinal);
        Assert.Contains(FoodContactTables.Caution, outcome.Output, StringComparison.Ordinal);

        var folder = Path.Combine(temp.Path, "hot-fill-barrier-shelf-life");
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "summary.json")));
        var food = summary.RootElement.GetProperty("foodContact");
        Assert.Equal(FoodContactTables.Caution, food.GetProperty("caution").GetString());
        Assert.Equal(5, food.GetProperty("assumptions").GetArrayLength());
        Assert.All(food.GetProperty("diffusionSources").EnumerateArray().Where(source => source.GetProperty("kind").GetString() == "upperBoundEstimate"),
            source => Assert.False(source.GetProperty("constantsVerified").GetBoolean()));
        var html = File.ReadAllText(Path.Combine(folder, "report.html"));
        Assert.Contains("Food contact: no swelling", html, StringComparison.Ordinal);
        Assert.Contains("Diffusion coefficients by stage", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_lists_the_diffusion_coefficient_of_every_layer_in_every_stage()
    {
        var outcome = CliRun.Invoke("check", Demo);

        Assert.Equal(0, outcome.ExitCode);
        Assert.Contains("Diffusion coefficients by stage", outcome.Output, StringComparison.Ordinal);
        Assert.Contains("hot fill", outcome.Output, StringComparison.Ordinal);
        Assert.Contains("Arrhenius with Ea = 87 kJ/mol", outcome.Output, StringComparison.Ordinal);
    }
}
