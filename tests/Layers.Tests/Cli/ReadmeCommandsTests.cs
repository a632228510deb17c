using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>
/// The `layers run` commands the README shows on the shipped cases (the set-up command, the batch and sweep examples,
/// the installed tool's first run) run as written and exit 0. Only the places change: `cases/` is the repository's,
/// and the results go to a temporary folder instead of `results/`.
/// </summary>
public sealed class ReadmeCommandsTests
{
    private const string FromSource = "dotnet run --project src/Layers.Cli -- ";

    public static TheoryData<string> Commands() => new(ReadmeCommands());

    private static List<string> ReadmeCommands()
        => [.. File.ReadAllLines(RepoRoot.File("README.md"))
            .Select(line => line.Split('#')[0].Trim())
            .Select(line => line.StartsWith(FromSource, StringComparison.Ordinal) ? "layers " + line[FromSource.Length..] : line)
            .Where(line => line.StartsWith("layers run cases/", StringComparison.Ordinal))
            .Distinct(StringComparer.Ordinal)];

    [Fact]
    public void The_readme_shows_the_set_up_batch_and_sweep_commands()
    {
        var commands = ReadmeCommands();

        Assert.Contains("layers run cases/laminate-fatty-food.json", commands);
        Assert.Contains(commands, command => command.StartsWith("layers run cases/ ", StringComparison.Ordinal));
        Assert.Contains(commands, command => command.Contains("sweep", StringComparison.Ordinal));
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void A_command_of_the_readme_on_the_shipped_cases_exits_0(string command)
    {
        using var temp = new TempFolder();
        var args = command.Split(' ', StringSplitOptions.RemoveEmptyEntries).Skip(1)
            .Select(arg => arg.StartsWith("cases/", StringComparison.Ordinal) ? RepoRoot.File("cases") + arg["cases".Length..] : arg)
            .ToList();
        var at = args.IndexOf("--out");
        if (at >= 0)
        {
            args[at + 1] = temp.Path;
        }
        else
        {
            args.AddRange(["--out", temp.Path]);
        }

        var outcome = CliRun.Invoke([.. args, "--no-plots", "--quiet"]);

        Assert.True(outcome.ExitCode == 0, $"{command}: exit {outcome.ExitCode}\n{outcome.Error}");
    }
}
