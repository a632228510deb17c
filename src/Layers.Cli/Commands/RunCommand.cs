using System.CommandLine;
using Layers.Core.Batch;
using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Results;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers run CASE... [--out DIR] [--quiet | --json] [--no-plots] [--jobs N] [--recursive] [--shard I/N]</c>:
/// solves cases and writes each one's result files into DIR/&lt;case name&gt;/, replacing an earlier folder of that
/// name only once everything is written. One plain case file prints its tables; several cases, a folder, a sweep or
/// a shard run as a batch (<see cref="BatchRun"/>).
/// </summary>
internal static class RunCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var caseFile = new Argument<string[]>("cases")
        {
            Description = "Case files (format: docs/case-format.md) and folders (every *.json in them).",
            Arity = ArgumentArity.OneOrMore,
        };
        var jobs = new Option<int>("--jobs", "-j")
        {
            Description = "How many cases run at once.",
            DefaultValueFactory = _ => Environment.ProcessorCount,
        };
        var recursive = new Option<bool>("--recursive", "-r") { Description = "Also take the *.json in sub-folders of the folders given." };
        var shard = new Option<string?>("--shard")
        {
            Description = "Run only part I of N of the cases (ordered by name), e.g. 2/8 for the second of eight machines.",
        };
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
        var linearTime = new Option<bool>("--linear-time") { Description = "Linear time axis in transfer.png and equilibrium.png or permeation.png (default logarithmic; transfer.png is linear for a case with a schedule)." };
        var command = new Command("run", "Solve cases and write their results; several cases, folders or a sweep run as a batch with a summary.");
        command.Arguments.Add(caseFile);
        command.Options.Add(outputRoot);
        command.Options.Add(quiet);
        command.Options.Add(json);
        var timing = new Option<bool>("--timing") { Description = "Print the solve time, steps accepted and rejected, cells and the time outside the solve (on stderr)." };
        command.Options.Add(timing);
        command.Options.Add(noPlots);
        command.Options.Add(width);
        command.Options.Add(height);
        command.Options.Add(logConcentration);
        command.Options.Add(linearTime);
        command.Options.Add(jobs);
        command.Options.Add(recursive);
        var checkEveryCase = new Option<bool>("--check-every-case")
        {
            Description = "In a batch, also solve each case the exact method served by the finite volumes and compare the two (a single case always is; it costs the finite volumes' time).",
        };
        command.Options.Add(checkEveryCase);
        command.Options.Add(shard);
        var allowOutside = CaseArgument.AllowOutsideFilesOption();
        command.Options.Add(allowOutside);
        CommandLineRules.PathsNotOptions(caseFile);
        CommandLineRules.NonEmptyPath(outputRoot);
        CommandLineRules.WholeNumber(jobs, 1, 1024);
        CommandLineRules.WholeNumber(width, 200, 10000, " pixels");
        CommandLineRules.WholeNumber(height, 200, 10000, " pixels");
        shard.Validators.Add(result =>
        {
            if (!ShardSpec.TryParse(result.GetValueOrDefault<string?>() ?? string.Empty, out _, out var problem))
            {
                result.AddError(problem!);
            }
        });
        command.SetAction((parseResult, cancellation) =>
        {
            var paths = parseResult.GetValue(caseFile)!;
            var settings = new RunSettings(paths[0], parseResult.GetValue(outputRoot)!)
            {
                CasePaths = paths,
                Quiet = parseResult.GetValue(quiet),
                Json = parseResult.GetValue(json),
                Timing = parseResult.GetValue(timing),
                Plots = !parseResult.GetValue(noPlots),
                PlotOptions = new PlotOptions(
                    parseResult.GetValue(width),
                    parseResult.GetValue(height),
                    parseResult.GetValue(logConcentration),
                    !parseResult.GetValue(linearTime)),
                Jobs = parseResult.GetValue(jobs),
                Recursive = parseResult.GetValue(recursive),
                CheckEveryCase = parseResult.GetValue(checkEveryCase),
                Access = CaseArgument.Access(parseResult, allowOutside),
                Shard = parseResult.GetValue(shard) is { } text && ShardSpec.TryParse(text, out var part, out _) ? part : null,
            };
            using var interrupt = new InterruptScope(cancellation);
            return Task.FromResult(IsSingleCase(settings)
                ? Execute(settings, output, error, interrupt.Token)
                : BatchRun.Execute(settings, output, error, interrupt.Token));
        });
        return command;
    }

    /// <summary>One case file that is not a sweep, without --shard: the single-case behaviour, tables on stdout.</summary>
    private static bool IsSingleCase(RunSettings settings)
    {
        var path = settings.CasePaths[0];
        if (settings.CasePaths.Count != 1 || settings.Shard is not null || Directory.Exists(path))
        {
            return false;
        }

        // An unreadable file is reported by the single-case path.
        return CaseReader.ReadDocument(path, out _) is not { } text || !SweepExpander.Declares(text);
    }

    private static int Execute(RunSettings settings, TextWriter output, TextWriter error, CancellationToken cancellation) =>
        Execute(settings, output, error, CaseFiles.Build, cancellation);

    /// <summary>One case, with the maker of its files given (tests cancel while the files are made).</summary>
    internal static int Execute(
        RunSettings settings,
        TextWriter output,
        TextWriter error,
        Func<SimulationResult, RunSettings, CancellationToken, Dictionary<string, byte[]>> buildFiles,
        CancellationToken cancellation)
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var phases = new PhaseClock();
        var casePath = settings.CasePath;
        var request = new CaseRunRequest(casePath, Path.GetFileNameWithoutExtension(casePath), settings.OutputRoot) { Access = settings.Access };
        var outcome = CaseRun.Execute(
            request,
            (result, token) => buildFiles(result, settings, token),
            phase => phases.Mark(PhaseName(phase, settings.Plots)),
            cancellation);
        if (CaseOutcomeReport.Failure(casePath, outcome, error) is { } failed)
        {
            return failed;
        }

        var result = outcome.Result!;
        var simulation = result.Case;
        var files = outcome.Files!;
        var folder = outcome.Folder!;
        if (settings.Json)
        {
            output.Write(System.Text.Encoding.UTF8.GetString(files[CaseFiles.Summary]));
        }
        else if (!settings.Quiet)
        {
            output.WriteLine($"{simulation.Title} ({casePath})");
            output.WriteLine($"  stack: {StackText.Describe(simulation)}");
            ConsoleTables.Write(output, [
                ResultTables.AtReportTimes(result), ResultTables.KeyFigures(result), .. AccuracyTables.Shortfalls(result) is { } shortfalls ? [shortfalls] : Array.Empty<TextTable>(),
                .. ScheduleTables.For(result), .. FoodContactTables.For(result), .. DiffusionCellTables.For(result)]);
            foreach (var warning in CaseCautions.UnverifiedConstants(simulation).Concat(DiffusionCellTables.Warnings(result)))
            {
                output.WriteLine(warning);
            }

            output.WriteLine($"results: {folder}");
            output.WriteLine();
            output.WriteLine(CautionText.For(result));
            if (result.FoodContact is not null)
            {
                output.WriteLine(FoodContactTables.Caution);
            }
        }

        if (settings.Timing)
        {
            var statistics = result.Statistics;
            var total = clock.Elapsed.TotalSeconds;
            error.WriteLine(FormattableString.Invariant(
                $"timing: time loop {statistics.WallSeconds * 1e3:F2} ms ({statistics.AcceptedSteps} steps accepted, {statistics.RejectedSteps} rejected, {result.Grid.CellCount} cells, {statistics.Unknowns} unknowns); outside the time loop {(total - statistics.WallSeconds) * 1e3:F1} ms (reading, other solves, writing{(settings.Plots ? ", plots" : string.Empty)})"));
            phases.Mark("print");
            error.WriteLine(phases.Describe());
        }

        // The verdict a batch row carries too (LimitCheck), so one case gives the same exit code alone and in a batch.
        return outcome.Limit?.Exceeded == true ? ExitCodes.LimitExceeded : ExitCodes.Success;
    }

    /// <summary>The name of a phase in the <c>--timing</c> line.</summary>
    private static string PhaseName(CaseRunPhase phase, bool plots) => phase switch
    {
        CaseRunPhase.Read => "read",
        CaseRunPhase.Solve => "solve",
        CaseRunPhase.BuildFiles => plots ? "files and plots" : "files",
        CaseRunPhase.Write => "write",
        _ => throw new ArgumentOutOfRangeException(nameof(phase), phase, "unknown phase"),
    };
}
