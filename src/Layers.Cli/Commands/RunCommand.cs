using System.CommandLine;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers run CASE [--out DIR] [--quiet | --json] [--no-plots]</c>: solves a case and writes its result files
/// into DIR/&lt;case name&gt;/, replacing an earlier folder of that name only once everything is written.
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
        var quiet = new Option<bool>("--quiet", "-q") { Description = "Print nothing on success (errors still go to stderr)." };
        var json = new Option<bool>("--json") { Description = "Print summary.json to stdout instead of the tables, for scripts." };
        var noPlots = new Option<bool>("--no-plots") { Description = "Skip the PNG plots (faster; report.html then has no pictures)." };
        var width = new Option<int>("--plot-width") { Description = "Width of the plots in pixels.", DefaultValueFactory = _ => 1200 };
        var height = new Option<int>("--plot-height") { Description = "Height of the plots in pixels.", DefaultValueFactory = _ => 800 };
        var logConcentration = new Option<bool>("--log-concentration") { Description = "Logarithmic concentration axis in profile.png." };
        var linearTime = new Option<bool>("--linear-time") { Description = "Linear time axis in transfer.png and equilibrium.png (default logarithmic)." };
        var command = new Command("run", "Solve a case and write its results.");
        command.Arguments.Add(caseFile);
        command.Options.Add(outputRoot);
        command.Options.Add(quiet);
        command.Options.Add(json);
        command.Options.Add(noPlots);
        command.Options.Add(width);
        command.Options.Add(height);
        command.Options.Add(logConcentration);
        command.Options.Add(linearTime);
        foreach (var size in new[] { width, height })
        {
            size.Validators.Add(result =>
            {
                if (result.GetValueOrDefault<int>() is < 200 or > 10000)
                {
                    result.AddError($"{size.Name} must be from 200 to 10000 pixels; got {result.GetValueOrDefault<int>()}");
                }
            });
        }
        command.SetAction(parseResult => Execute(
            new RunSettings(parseResult.GetValue(caseFile)!, parseResult.GetValue(outputRoot)!)
            {
                Quiet = parseResult.GetValue(quiet),
                Json = parseResult.GetValue(json),
                Plots = !parseResult.GetValue(noPlots),
                PlotOptions = new PlotOptions(
                    parseResult.GetValue(width),
                    parseResult.GetValue(height),
                    parseResult.GetValue(logConcentration),
                    !parseResult.GetValue(linearTime)),
            },
            output,
            error));
        return command;
    }

    private static int Execute(RunSettings settings, TextWriter output, TextWriter error)
    {
        var casePath = settings.CasePath;
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

        var files = CaseFiles.Build(result, settings);
        string folder;
        try
        {
            folder = CaseOutputFolder.Write(settings.OutputRoot, Path.GetFileNameWithoutExtension(casePath), files);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"{casePath}: cannot write results under '{settings.OutputRoot}': {exception.Message}");
            return ExitCodes.OutputFailed;
        }

        if (settings.Json)
        {
            output.Write(System.Text.Encoding.UTF8.GetString(files[CaseFiles.Summary]));
        }
        else if (!settings.Quiet)
        {
            output.WriteLine($"{simulation.Title} ({casePath})");
            output.WriteLine($"  stack: {StackText.Describe(simulation)}");
            ConsoleTables.Write(output, [ResultTables.AtReportTimes(result), ResultTables.KeyFigures(result), .. DiffusionCellTables.For(result)]);
            foreach (var warning in EstimateNotes.For(simulation).Concat(DiffusionCellTables.Warnings(result)))
            {
                output.WriteLine(warning);
            }

            output.WriteLine($"results: {folder}");
            output.WriteLine();
            output.WriteLine(CautionText.For(result));
        }

        return ExitCodes.Success;
    }
}
