using System.CommandLine;
using System.Globalization;
using Layers.Cli.Commands;

namespace Layers.Tests.TestSupport;

/// <summary>What one invocation of the command line produced.</summary>
internal sealed record CliOutcome(int ExitCode, string Output, string Error)
{
    /// <summary>Standard error split into lines, without empty ones.</summary>
    public IReadOnlyList<string> ErrorLines =>
        Error.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
}

/// <summary>Runs <c>layers</c> in-process, as Program.cs does, with both streams captured.</summary>
internal static class CliRun
{
    public static CliOutcome Invoke(params string[] args)
    {
        using var output = new StringWriter(CultureInfo.InvariantCulture);
        using var error = new StringWriter(CultureInfo.InvariantCulture);
        var exitCode = CliApp.Invoke(
            CliApp.Build(output, error).Parse(args),
            new InvocationConfiguration { Output = output, Error = error });
        return new CliOutcome(exitCode, output.ToString(), error.ToString());
    }
}
