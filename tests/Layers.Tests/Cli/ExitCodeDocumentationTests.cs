using System.Globalization;
using System.Text.RegularExpressions;
using Layers.Cli;
using Layers.Tests.Batch;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// The exit-code tables of docs/cli.md and README.md list exactly the codes the tool defines, and a batch and a
/// usage error return what the tables say.
/// </summary>
public sealed partial class ExitCodeDocumentationTests
{
    private static readonly int[] Defined = typeof(ExitCodes).GetFields()
        .Select(field => (int)field.GetRawConstantValue()!)
        .Order()
        .ToArray();

    [Theory]
    [InlineData("docs/cli.md")]
    [InlineData("README.md")]
    public void The_documented_exit_codes_are_the_defined_ones(string document)
    {
        var text = File.ReadAllText(RepoRoot.File(document.Split('/')));

        var documented = TableRow().Matches(text[text.IndexOf("| code | meaning |", StringComparison.Ordinal)..])
            .Select(match => int.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture))
            .ToArray();

        Assert.Equal(Defined, documented);
    }

    [Fact]
    public void Usage_errors_do_not_share_a_code_with_any_case_outcome()
    {
        var outcome = CliRun.Invoke("run", "x.json", "--jobs", "0");

        Assert.Equal(64, outcome.ExitCode);
        Assert.NotEqual(ExitCodes.LimitExceeded, ExitCodes.Usage);
    }

    [Fact]
    public void A_batch_with_json_prints_only_the_summary_on_stdout()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "one.json"), BatchCases.Membrane);
        temp.WriteFile(Path.Combine("in", "two.json"), BatchCases.Membrane);

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "--json");

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Equal(File.ReadAllText(temp.Combine("out", "summary.json")), outcome.Output);
    }

    [Fact]
    public void Check_reports_the_mistakes_of_a_sweep()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("s.json", CaseJson.With(BatchCases.ThicknessSweep("10 um"), ("$.sweep.result", "\"flux\"")));

        var outcome = CliRun.Invoke("check", file);

        Assert.Equal(ExitCodes.InvalidInput, outcome.ExitCode);
        Assert.Matches(@"\$\.sweep\.result( \(line \d+, column \d+\))?: must be one of", outcome.Error);
    }

    [GeneratedRegex(@"^\| (\d+) \|", RegexOptions.Multiline)]
    private static partial Regex TableRow();
}
