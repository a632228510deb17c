using System.CommandLine;
using Layers.Core.Cases;

namespace Layers.Cli.Commands;

/// <summary>The case-file argument shared by the commands, and reading it with errors reported the same way.</summary>
internal static class CaseArgument
{
    public static Argument<string> Create()
    {
        var argument = new Argument<string>("case") { Description = "Path of a JSON case file (format: docs/case-format.md)." };
        CommandLineRules.PathsNotOptions(argument);
        return argument;
    }

    /// <summary>Reads a case; on failure prints every error to <paramref name="error"/> and returns null.</summary>
    public static CaseReadResult? ReadOrReport(string path, TextWriter error)
    {
        var result = CaseReader.ReadFile(path);
        if (result.IsValid)
        {
            return result;
        }

        error.WriteLine($"{path}: invalid case ({result.Errors.Count} problem{(result.Errors.Count == 1 ? string.Empty : "s")}):");
        error.WriteLine(result.FormatErrors());
        return null;
    }
}
