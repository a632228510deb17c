using System.CommandLine;
using System.Text;
using System.Text.Json.Nodes;
using Layers.Core.Batch;
using Layers.Core.Domain;
using Layers.Core.Reports;
using Layers.Core.Studies;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers uncertainty CASE [--samples N] [--seed S] [--latin-hypercube] [--out DIR] [--jobs N] [--quiet | --json]
/// [--no-plots]</c>: runs the case's <c>uncertainty</c> study (Monte Carlo) and writes uncertainty.json,
/// percentiles.csv, samples.csv and spread.png into DIR/&lt;case name&gt;.uncertainty/.
/// </summary>
internal static class UncertaintyCommand
{
    /// <summary>The study's JSON file, also what --json prints.</summary>
    private const string Json = "uncertainty.json";

    public static Command Create(TextWriter output, TextWriter error)
    {
        var caseFile = CaseArgument.Create();
        var options = new StudyOptions();
        var samples = new Option<int?>("--samples", "-n") { Description = "Number of samples, instead of $.uncertainty.samples." };
        var seed = new Option<int?>("--seed") { Description = "Seed of the random numbers, instead of $.uncertainty.seed; the same seed gives the same samples on any machine and any --jobs." };
        var latin = new Option<bool>("--latin-hypercube") { Description = "Latin hypercube sampling, instead of $.uncertainty.sampling." };
        var command = new Command("uncertainty", "Monte Carlo over the case's uncertain inputs: percentiles of the amounts at each report time and the chance of exceeding a limit.");
        command.Arguments.Add(caseFile);
        command.Options.Add(samples);
        command.Options.Add(seed);
        command.Options.Add(latin);
        options.AddTo(command);
        CommandLineRules.WholeNumber(samples, 2, UncertaintySettings.MaximumSamples);
        CommandLineRules.WholeNumber(seed, 0, int.MaxValue);
        command.SetAction((parseResult, cancellation) =>
        {
            using var interrupt = new InterruptScope(cancellation);
            var overrides = (parseResult.GetValue(samples), parseResult.GetValue(seed), parseResult.GetValue(latin));
            return Task.FromResult(Execute(parseResult.GetValue(caseFile)!, overrides, options.Read(parseResult), output, error, interrupt.Token));
        });
        return command;
    }

    private static int Execute(
        string casePath, (int? Samples, int? Seed, bool Latin) overrides, StudyOptions.Values settings, TextWriter output, TextWriter error, CancellationToken cancellation)
    {
        UncertaintyOutcome Solve(SimulationCase simulation, JsonObject document, CancellationToken token)
        {
            // Read once already with the case, so valid here.
            var study = UncertaintyReader.Read(document, casePath, simulation, [])!;
            study = study with
            {
                Samples = overrides.Samples ?? study.Samples,
                Seed = overrides.Seed ?? study.Seed,
                Sampling = overrides.Latin ? SamplingMethod.LatinHypercube : study.Sampling,
            };
            return UncertaintyRunner.Run(document, casePath, simulation, study, settings.Jobs, token);
        }

        var run = StudyRun.Execute(
            settings.Request(casePath, "uncertainty"), "uncertainty", Solve, (_, outcome, token) => Files(casePath, outcome, settings, token), cancellation);
        if (CaseOutcomeReport.Failure(casePath, run.Run, error) is { } failed)
        {
            return failed;
        }

        var outcome = run.Study!;
        if (settings.Json)
        {
            output.Write(Encoding.UTF8.GetString(run.Run.Files![Json]));
        }
        else if (!settings.Quiet)
        {
            output.WriteLine($"{run.Case!.Title} ({casePath})");
            foreach (var line in UncertaintyReport.Lines(outcome))
            {
                output.WriteLine($"  {line}");
            }

            foreach (var note in CaseCautions.UnverifiedConstants(outcome.BaseCase))
            {
                output.WriteLine(note);
            }

            output.WriteLine($"results: {run.Run.Folder}");
            output.WriteLine();
            output.WriteLine(CaseCautions.Paragraph(outcome.BaseCase));
        }

        return ExitCodes.Success;
    }

    /// <summary>uncertainty.json, percentiles.csv, samples.csv and spread.png; stops between them once cancelled.</summary>
    private static Dictionary<string, byte[]> Files(string casePath, UncertaintyOutcome outcome, StudyOptions.Values settings, CancellationToken cancellation)
    {
        var files = new Dictionary<string, byte[]>();
        void Add(string name, Func<string> text)
        {
            cancellation.ThrowIfCancellationRequested();
            files[name] = Encoding.UTF8.GetBytes(text());
        }

        Add(Json, () => UncertaintyReport.Json(outcome, casePath));
        Add("percentiles.csv", () => UncertaintyReport.PercentilesCsv(outcome));
        Add("samples.csv", () => UncertaintyReport.SamplesCsv(outcome));
        cancellation.ThrowIfCancellationRequested();
        if (settings.Plots && SpreadPlot.Render(outcome, settings.PlotOptions with { LogTimeAxis = false }) is { } png)
        {
            files["spread.png"] = png;
        }

        return files;
    }
}
