using System.Text.Json;
using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// docs/cli.md: a single case the exact method solves is also solved by the finite volumes as its independent check; a
/// batch leaves that check out (it would cost the finite volumes' time for every case) unless --check-every-case asks.
/// </summary>
public sealed class BatchIndependentCheckTests
{
    [Fact]
    public void A_batch_checks_exact_runs_by_the_finite_volumes_only_when_asked()
    {
        using var temp = new TempFolder();
        var demo = File.ReadAllText(RepoRoot.File("cases", "membrane-time-lag.json"));
        temp.WriteFile(Path.Combine("in", "a.json"), demo);
        temp.WriteFile(Path.Combine("in", "b.json"), demo);

        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("plain"), "--no-plots", "-q").ExitCode);
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("checked"), "--no-plots", "-q", "--check-every-case").ExitCode);
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", temp.Combine("in", "a.json"), "--out", temp.Combine("single"), "--no-plots", "-q").ExitCode);

        Assert.Equal(JsonValueKind.Null, CrossCheck(temp.Combine("plain", "a", "summary.json")).ValueKind);
        Assert.Contains("finite volumes", CrossCheck(temp.Combine("checked", "a", "summary.json")).GetProperty("method").GetString(), StringComparison.Ordinal);
        Assert.Contains("finite volumes", CrossCheck(temp.Combine("single", "a", "summary.json")).GetProperty("method").GetString(), StringComparison.Ordinal);
        Assert.Contains("not run", File.ReadAllText(temp.Combine("plain", "a", "report.html")), StringComparison.Ordinal);
    }

    private static JsonElement CrossCheck(string summaryPath)
    {
        using var document = JsonDocument.Parse(File.ReadAllText(summaryPath));
        return document.RootElement.GetProperty("crossCheck").Clone();
    }
}
