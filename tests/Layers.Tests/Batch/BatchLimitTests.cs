using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// A case's specific migration limit reaches the batch summary and the exit code: 1 when some case exceeds its limit
/// (docs/cli.md, exit codes). The limits here are set far above and far below the demo's result, so the verdicts do
/// not depend on its exact value.
/// </summary>
public sealed class BatchLimitTests
{
    [Fact]
    public void A_case_over_its_limit_gets_the_verdict_exceeded_and_the_batch_exits_1()
    {
        using var temp = new TempFolder();
        var demo = File.ReadAllText(RepoRoot.File("cases", "hot-fill-barrier-shelf-life.json"));
        temp.WriteFile(Path.Combine("in", "high.json"), CaseJson.With(demo, ("$.foodContact.specificMigrationLimit", "\"1000 mg/kg\"")));
        temp.WriteFile(Path.Combine("in", "low.json"), CaseJson.With(demo, ("$.foodContact.specificMigrationLimit", "\"1e-9 mg/kg\"")));

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "--quiet");

        Assert.Equal(ExitCodes.LimitExceeded, outcome.ExitCode);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal(["within", "exceeded"], rows.Select(row => row["limitVerdict"]));
    }

    [Fact]
    public void A_single_case_over_its_limit_exits_1_and_within_it_exits_0()
    {
        using var temp = new TempFolder();
        var demo = File.ReadAllText(RepoRoot.File("cases", "hot-fill-barrier-shelf-life.json"));
        var over = temp.WriteFile("over.json", CaseJson.With(demo, ("$.foodContact.specificMigrationLimit", "\"1e-9 mg/kg\"")));
        var within = temp.WriteFile("within.json", CaseJson.With(demo, ("$.foodContact.specificMigrationLimit", "\"1000 mg/kg\"")));

        Assert.Equal(ExitCodes.LimitExceeded, CliRun.Invoke("run", over, "--out", temp.Combine("out"), "--no-plots", "-q").ExitCode);
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", within, "--out", temp.Combine("out"), "--no-plots", "-q").ExitCode);
    }
}
