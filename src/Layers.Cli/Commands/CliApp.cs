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
    /// Invokes a parsed command line. A usage error is answered here, with <see cref="ExitCodes.Usage"/> and one line
    /// on stderr: System.CommandLine would answer it with 1, which layers keeps for "a limit was exceeded", and with
    /// the whole help text, in which the mistake is easily missed.
    /// </summary>
    public static int Invoke(ParseResult parseResult, InvocationConfiguration? configuration = null)
    {
        ArgumentNullException.ThrowIfNull(parseResult);
        return parseResult.Errors.Count > 0 ? ReportUsageError(parseResult, configuration) : parseResult.Invoke(configuration);
    }

    /// <summary>
    /// As <see cref="Invoke"/>, asynchronously: the form that hooks Ctrl+C (SIGINT, SIGTERM) to the cancellation
    /// token of the actions, so that a batch can stop its cases and write its summary before the process ends.
    /// </summary>
    public static async Task<int> InvokeAsync(ParseResult parseResult, InvocationConfiguration? configuration = null)
    {
        ArgumentNullException.ThrowIfNull(parseResult);
        return parseResult.Errors.Count > 0
            ? ReportUsageError(parseResult, configuration)
            : await parseResult.InvokeAsync(configuration).ConfigureAwait(false);
    }

    /// <summary>
    /// The usage error as one line: one mistake (the others are often its consequences) and where the options
    /// are listed, e.g. <c>layers run: --jobs must be from 1 to 1024; got '0' (layers run --help lists the options)</c>.
    /// </summary>
    private static int ReportUsageError(ParseResult parseResult, InvocationConfiguration? configuration)
    {
        // The subcommands are one level below the root.
        var command = parseResult.CommandResult.Command is RootCommand ? "layers" : "layers " + parseResult.CommandResult.Command.Name;
        // A word the parser did not recognise says more than the missing command that follows from it.
        var first = parseResult.Errors.OrderBy(error => error.Message.StartsWith("Required", StringComparison.Ordinal) ? 1 : 0).First();
        var message = first.Message.ReplaceLineEndings(" ").Trim();
        (configuration?.Error ?? Console.Error).WriteLine($"{command}: {message} ({command} --help lists the options)");
        return ExitCodes.Usage;
    }
}
