using System.Globalization;
using System.Text.RegularExpressions;
using Layers.Cli;
using Layers.Tests.Batch;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// The SLURM array script that README.md and docs/cli.md show (and that tests/benchmarks/slurm-one-node.sh submits
/// as the README has it) is one script, and its array task ids are exactly the shard numbers the tool accepts:
/// SLURM numbers the tasks of `--array=A-B` from A to B into SLURM_ARRAY_TASK_ID (the sbatch(1) manual page,
/// options --array and the output environment variables), and `--shard I/N` takes I from 1 to N.
/// </summary>
public sealed partial class ClusterArrayExampleTests
{
    [Fact]
    public void The_readme_and_the_command_line_reference_show_the_same_array_script()
    {
        Assert.Equal(ArrayScript("README.md"), ArrayScript("docs/cli.md"));
    }

    [Fact]
    public void The_array_task_ids_are_the_shard_numbers_one_to_the_shard_count()
    {
        var script = ArrayScript("README.md");
        var array = ArrayRange().Match(script);
        var shard = ShardCount().Match(script);

        Assert.True(array.Success && shard.Success, script);
        var count = Number(shard.Groups[1].Value);
        Assert.Equal(1, Number(array.Groups[1].Value));
        Assert.Equal(count, Number(array.Groups[2].Value));

        using var temp = new TempFolder();
        for (var i = 0; i < count; i++)
        {
            temp.WriteFile(Path.Combine("in", $"case-{i}.json"), BatchCases.Membrane);
        }

        int Shard(int id) => CliRun.Invoke(
            "run", temp.Combine("in"), "--no-plots", "--quiet", "--shard", $"{id}/{count}", "--out", temp.Combine($"s{id}")).ExitCode;

        Assert.Equal(ExitCodes.Success, Shard(1));
        Assert.Equal(ExitCodes.Success, Shard(count));
        Assert.Equal(ExitCodes.Usage, Shard(0));
        Assert.Equal(ExitCodes.Usage, Shard(count + 1));
    }

    /// <summary>The one ```sh block of the document that holds an `#SBATCH --array` line.</summary>
    private static string ArrayScript(string document)
    {
        var blocks = ShellBlock().Matches(File.ReadAllText(RepoRoot.File(document.Split('/'))).ReplaceLineEndings("\n"))
            .Select(match => match.Groups[1].Value)
            .Where(block => block.Contains("#SBATCH --array", StringComparison.Ordinal))
            .ToList();
        return Assert.Single(blocks);
    }

    private static int Number(string text) => int.Parse(text, CultureInfo.InvariantCulture);

    [GeneratedRegex(@"^```sh\n(.*?)^```$", RegexOptions.Multiline | RegexOptions.Singleline)]
    private static partial Regex ShellBlock();

    [GeneratedRegex(@"^#SBATCH --array=(\d+)-(\d+)$", RegexOptions.Multiline)]
    private static partial Regex ArrayRange();

    [GeneratedRegex(@"--shard ""\$SLURM_ARRAY_TASK_ID/(\d+)""")]
    private static partial Regex ShardCount();
}
