using System.CommandLine;
using Layers.Core.Batch;
using Layers.Core.Cases;
using Layers.Core.Studies;

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

    /// <summary>
    /// <c>--allow-outside-files</c>: lets a case name files (its measured data) outside its own folder, which is
    /// refused by default so that a case received from someone else cannot make the tool read any file.
    /// </summary>
    public static Option<bool> AllowOutsideFilesOption() => new("--allow-outside-files")
    {
        Description = "Let case files name data files outside their own folder (refused by default; see docs/cli.md).",
    };

    /// <summary>The access the option gives.</summary>
    public static CaseFileAccess Access(ParseResult parseResult, Option<bool> allowOutside) =>
        parseResult.GetValue(allowOutside) ? CaseFileAccess.Anywhere : CaseFileAccess.InsideCaseFolder;

    /// <summary>Reads a case; on failure prints every error to <paramref name="error"/> and returns null.</summary>
    public static CaseReadResult? ReadOrReport(string path, TextWriter error, CaseFileAccess access = CaseFileAccess.InsideCaseFolder)
    {
        var result = CaseDocument.ReadFile(path, access);
        if (result.IsValid)
        {
            return result;
        }

        ReportInvalid(path, result.Errors, error);
        return null;
    }

    /// <summary>Prints every error of an invalid case to <paramref name="error"/>, under a line that counts them.</summary>
    public static void ReportInvalid(string path, IReadOnlyList<CaseError> errors, TextWriter error)
    {
        error.WriteLine($"{path}: {CaseRunOutcome.InvalidCaseHeading(errors.Count)}");
        error.WriteLine(new CaseReadResult(path, null, errors).FormatErrors());
    }
}
