using System.CommandLine;
using System.Text;
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
        if (StudyCase.Read(casePath, "uncertainty", error) is not var (simulation, document))
        {
            return ExitCodes.InvalidInput;
        }

        // Read once already with the case, so valid here.
        var study = UncertaintyReader.Read(document, casePath, simulation, [])!;
        study = study with
        {
            Samples = overrides.Samples ?? study.Samples,
            Seed = overrides.Seed ?? study.Seed,
            Sampling = overrides.Latin ? SamplingMethod.LatinHypercube : study.Sampling,
        };
        var outcome = UncertaintyRunner.Run(document, casePath, simulation, study, settings.Jobs, cancellation);
        if (StudyCase.Failure(casePath, outcome.Status, outcome.Message, outcome.Errors, error) is { } failed)
        {
            return failed;
        }

        var json = UncertaintyReport.Json(outcome, casePath);
        var files = new Dictionary<string, byte[]>
        {
            ["uncertainty.json"] = Encoding.UTF8.GetBytes(json),
            ["percentiles.csv"] = Encoding.UTF8.GetBytes(UncertaintyReport.PercentilesCsv(outcome)),
            ["samples.csv"] = Encoding.UTF8.GetBytes(UncertaintyReport.SamplesCsv(outcome)),
        };
        if (settings.Plots && SpreadPlot.Render(outcome, settings.PlotOptions with { LogTimeAxis = false }) is { } png)
        {
            files["spread.png"] = png;
        }

        if (StudyCase.Write(settings.OutputRoot, casePath, "uncertainty", files, error) is not { } folder)
        {
            return ExitCodes.OutputFailed;
        }

        if (settings.Json)
        {
            output.Write(json);
        }
        else if (!settings.Quiet)
        {
            output.WriteLine($"{simulation.Title} ({casePath})");
            foreach (var line in UncertaintyReport.Lines(outcome))
            {
                output.WriteLine($"  {line}");
            }

            foreach (var note in CaseCautions.UnverifiedConstants(outcome.BaseCase))
            {
                output.WriteLine(note);
            }

            output.WriteLine($"results: {folder}");
            output.WriteLine();
            output.WriteLine(CaseCautions.Paragraph(outcome.BaseCase));
        }

        return ExitCodes.Success;
    }
}
