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
        return root;
    }
}
