using System.CommandLine;
using System.Text;
using Layers.Core.Batch;
using Layers.Core.Domain;
using Layers.Core.Fitting;
using Layers.Core.Reports;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers fit CASE --data FILE --estimate PATH... [--face left|right] [--out DIR] [--quiet | --json] [--no-plots]</c>:
/// estimates inputs of a case from measurements and writes DIR/&lt;case name&gt;-fit/ (fit.json, fit-points.csv,
/// fit-curve.csv, fitted-case.json, fit.png), replacing an earlier folder only once everything is written.
/// </summary>
internal static class FitCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var caseFile = CaseArgument.Create();
        var data = new Option<string>("--data", "-d")
        {
            Description = "CSV of measurements: 'time [h],concentration [mg/L]' or 'time [h],cumulative amount [ug/cm2]', optionally ',sd [unit]'.",
            Required = true,
        };
        var estimate = new Option<string[]>("--estimate", "-e")
        {
            Description = "JSON path of an input to estimate, e.g. '$.layers[0].diffusionCoefficient'; repeat for more. The case's value is the start.",
            Required = true,
            Arity = ArgumentArity.OneOrMore,
        };
        var face = new Option<string>("--face")
        {
            Description = "The face whose medium was measured: left or right.",
            DefaultValueFactory = _ => "right",
        };
        face.AcceptOnlyFromAmong("left", "right");
        var outputRoot = new Option<string>("--out", "-o")
        {
            Description = "Folder that receives the sub-folder <case name>.fit.",
            DefaultValueFactory = _ => "results",
        };
        var quiet = new Option<bool>("--quiet", "-q") { Description = "Print nothing on success (errors still go to stderr)." };
        var json = new Option<bool>("--json") { Description = "Print fit.json to stdout instead of the tables, for scripts." };
        var noPlots = new Option<bool>("--no-plots") { Description = "Skip fit.png." };
        CommandLineRules.NonEmptyPath(data);
        CommandLineRules.NonEmptyPath(outputRoot);
        var command = new Command("fit", "Estimate inputs of a case (D, K, ...) from measured concentrations or cumulative amounts by weighted least squares.");
        command.Arguments.Add(caseFile);
        foreach (var option in new Option[] { data, estimate, face, outputRoot, quiet, json, noPlots })
        {
            command.Options.Add(option);
        }

        command.SetAction((parseResult, cancellation) =>
        {
            var settings = new Settings(
                parseResult.GetValue(caseFile)!,
                parseResult.GetValue(data)!,
                parseResult.GetValue(estimate)!,
                parseResult.GetValue(face) == "left" ? Side.Left : Side.Right,
                parseResult.GetValue(outputRoot)!,
                parseResult.GetValue(quiet),
                parseResult.GetValue(json),
                !parseResult.GetValue(noPlots));
            using var interrupt = new InterruptScope(cancellation);
            return Task.FromResult(Execute(settings, output, error, interrupt.Token));
        });
        return command;
    }

    private static int Execute(Settings settings, TextWriter output, TextWriter error, CancellationToken cancellation)
    {
        if (MeasuredSeries.Read(settings.DataPath, out var problem) is not { } measured)
        {
            error.WriteLine(problem);
            return ExitCodes.InvalidInput;
        }

        var errors = new List<string>();
        var prepared = CaseFitter.Prepare(new FitRequest(settings.CasePath, measured, settings.Face, settings.Paths), errors);
        if (prepared is null)
        {
            errors.ForEach(error.WriteLine);
            return ExitCodes.InvalidInput;
        }

        var request = new CaseRunRequest(settings.CasePath, Path.GetFileNameWithoutExtension(settings.CasePath) + ".fit", settings.OutputRoot);
        var run = StudyRun.Finish(request, token => CaseFitter.Run(prepared, token), (outcome, token) => Files(outcome.Result!, settings.Plots, token), cancellation);
        if (CaseOutcomeReport.Failure(settings.CasePath, run.Run, error) is { } failed)
        {
            return failed;
        }

        var fit = run.Study!.Result!;
        var files = run.Run.Files!;
        var folder = run.Run.Folder!;
        if (settings.Json)
        {
            output.Write(Encoding.UTF8.GetString(files["fit.json"]));
        }
        else if (!settings.Quiet)
        {
            Print(fit, folder, output);
        }

        return fit.IsTrustworthy ? ExitCodes.Success : ExitCodes.NoTrustworthyAnswer;
    }

    /// <summary>The files of a fit; stops between them once cancelled.</summary>
    private static Dictionary<string, byte[]> Files(FitResult fit, bool plots, CancellationToken cancellation)
    {
        var files = new Dictionary<string, byte[]>();
        void Add(string name, Func<string> text)
        {
            cancellation.ThrowIfCancellationRequested();
            files[name] = Encoding.UTF8.GetBytes(text());
        }

        Add("fit.json", () => FitJson.Write(fit));
        Add("fit-points.csv", () => FitTables.PointsCsv(fit));
        Add("fit-curve.csv", () => FitTables.CurveCsv(fit));
        Add("fitted-case.json", () => fit.FittedCaseJson + "\n");
        cancellation.ThrowIfCancellationRequested();
        if (plots)
        {
            files[FitPlot.FileName] = FitPlot.Render(fit, new PlotOptions());
        }

        return files;
    }

    private static void Print(FitResult fit, string folder, TextWriter output)
    {
        output.WriteLine($"{fit.FittedCase.Title} ({fit.Request.CasePath}) fitted to {fit.Request.Data.FileName}");
        ConsoleTables.Write(output, FitTables.Estimates(fit), FitTables.Correlation(fit), FitTables.Quality(fit));
        foreach (var finding in fit.Findings)
        {
            output.WriteLine((finding.NotIdentifiable ? "not identifiable: " : "note: ") + finding.Message + (finding.Combination is { } combination
                ? FormattableString.Invariant($"; {combination.Text} = {combination.Value:G4} {combination.Unit} ({fit.Request.Confidence * 100:0.#} % interval {combination.Lower:G4} to {combination.Upper:G4})")
                : string.Empty));
        }

        foreach (var note in CaseCautions.UnverifiedConstants(fit.FittedCase))
        {
            output.WriteLine(note);
        }

        output.WriteLine($"results: {folder}");
        output.WriteLine();
        output.WriteLine(CaseCautions.Paragraph(fit.FittedCase, CautionText.FittedInputs));
    }

    private sealed record Settings(
        string CasePath,
        string DataPath,
        IReadOnlyList<string> Paths,
        Side Face,
        string OutputRoot,
        bool Quiet,
        bool Json,
        bool Plots);
}
