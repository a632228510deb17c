using System.CommandLine;
using Layers.Core.Reports;

namespace Layers.Cli.Commands;

/// <summary>Builds the command tree; output goes to the writers given, so tests can capture it.</summary>
public static class CliApp
{
    /// <summary>The root command with all subcommands.</summary>
    public static RootCommand Build(TextWriter output, TextWriter error)
    {
        var root = new RootCommand(
            "Layers: transient diffusion of a substance through a stack of layers with partition jumps at every " +
            "interface (packaging migration into food, release and permeation through membranes and skin).\n\n" +
            CautionText.Paragraph);
        root.Subcommands.Add(RunCommand.Create(output, error));
        root.Subcommands.Add(CheckCommand.Create(output, error));
        root.Subcommands.Add(VerifyCommand.Create(output, error));
        root.Subcommands.Add(MergeCommand.Create(output, error));
        root.Subcommands.Add(DesignCommand.Create(output, error));
        root.Subcommands.Add(UncertaintyCommand.Create(output, error));
        root.Subcommands.Add(FitCommand.Create(output, error));
        return root;
    }

    /// <summary>
    /// Invokes a parsed command line. System.CommandLine answers a usage error with 1, which layers keeps for
    /// "a limit was exceeded"; usage errors are mapped to <see cref="ExitCodes.Usage"/> here.
    /// </summary>
    public static int Invoke(ParseResult parseResult, InvocationConfiguration? configuration = null)
    {
        var code = parseResult.Invoke(configuration);
        return parseResult.Errors.Count > 0 && code == 1 ? ExitCodes.Usage : code;
    }

    /// <summary>
    /// As <see cref="Invoke"/>, asynchronously: the form that hooks Ctrl+C (SIGINT, SIGTERM) to the cancellation
    /// token of the actions, so that a batch can stop its cases and write its summary before the process ends.
    /// </summary>
    public static async Task<int> InvokeAsync(ParseResult parseResult, InvocationConfiguration? configuration = null)
    {
        var code = await parseResult.InvokeAsync(configuration).ConfigureAwait(false);
        return parseResult.Errors.Count > 0 && code == 1 ? ExitCodes.Usage : code;
    }
}
