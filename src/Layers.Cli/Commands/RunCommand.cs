using System.Text;
using System.CommandLine;
using Layers.Core.Reports;
using Layers.Core.Simulation;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers run CASE [--out DIR]</c>: solves a case and writes summary.json, timeseries.csv and profiles.csv into
/// DIR/&lt;case name&gt;/, replacing an earlier folder of that name only once everything is written.
/// </summary>
internal static class RunCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var caseFile = CaseArgument.Create();
        var outputRoot = new Option<string>("--out", "-o")
        {
            Description = "Folder that receives one sub-folder of results per case.",
            DefaultValueFactory = _ => "results",
        };
        var command = new Command("run", "Solve a case and write its results.");
        command.Arguments.Add(caseFile);
        command.Options.Add(outputRoot);
        command.SetAction(parseResult => Execute(parseResult.GetValue(caseFile)!, parseResult.GetValue(outputRoot)!, output, error));
        return command;
    }

    private static int Execute(string casePath, string outputRoot, TextWriter output, TextWriter error)
    {
        var read = CaseArgument.ReadOrReport(casePath, error);
        if (read?.Case is not { } simulation)
        {
            return ExitCodes.InvalidInput;
        }

        var result = Simulator.Run(simulation);
        if (!result.Completed)
        {
            error.WriteLine($"{casePath}: the solver stopped early ({result.Statistics}); no results were written.");
            return ExitCodes.SolverFailed;
        }

        var files = new Dictionary<string, byte[]>
        {
            ["summary.json"] = Encoding.UTF8.GetBytes(SummaryJson.Write(result, casePath)),
            ["timeseries.csv"] = Encoding.UTF8.GetBytes(TimeSeriesCsv.Write(result)),
            ["profiles.csv"] = Encoding.UTF8.GetBytes(ProfilesCsv.Write(result)),
        };
        string folder;
        try
        {
            folder = CaseOutputFolder.Write(outputRoot, Path.GetFileNameWithoutExtension(casePath), files);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"{casePath}: cannot write results under '{outputRoot}': {exception.Message}");
            return ExitCodes.OutputFailed;
        }

        output.WriteLine($"{simulation.Title} ({casePath})");
        output.WriteLine($"  stack: {StackText.Describe(simulation)}");
        ConsoleTables.Write(output, ResultTables.AtReportTimes(result), ResultTables.KeyFigures(result));
        output.WriteLine($"results: {folder}");
        output.WriteLine();
        output.WriteLine(CautionText.Paragraph);
        return ExitCodes.Success;
    }
}
