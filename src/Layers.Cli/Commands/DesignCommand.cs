using System.CommandLine;
using System.Text;
using Layers.Core.Batch;
using Layers.Core.Domain;
using Layers.Core.Reports;
using Layers.Core.Studies;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers design CASE [--out DIR] [--jobs N] [--quiet | --json] [--no-plots]</c>: finds the value of the case's
/// <c>design</c> input at which its result equals the target, and writes design.json and design.png into
/// DIR/&lt;case name&gt;.design/.
/// </summary>
internal static class DesignCommand
{
    /// <summary>The study's JSON file, also what --json prints.</summary>
    private const string Json = "design.json";

    public static Command Create(TextWriter output, TextWriter error)
    {
        var caseFile = CaseArgument.Create();
        var options = new StudyOptions();
        var command = new Command("design", "Solve for an input: find the value of the case's design input (a thickness, a D, the contact time...) at which a result equals the target.");
        command.Arguments.Add(caseFile);
        options.AddTo(command);
        command.SetAction((parseResult, cancellation) =>
        {
            using var interrupt = new InterruptScope(cancellation);
            return Task.FromResult(Execute(parseResult.GetValue(caseFile)!, options.Read(parseResult), output, error, interrupt.Token));
        });
        return command;
    }

    private static int Execute(string casePath, StudyOptions.Values settings, TextWriter output, TextWriter error, CancellationToken cancellation)
    {
        var run = StudyRun.Execute(
            settings.Request(casePath, "design"),
            "design",
            // Read once already with the case, so valid here.
            (simulation, document, token) => DesignSolver.Solve(document, casePath, DesignReader.Read(document, casePath, simulation, [])!, settings.Jobs, token),
            (simulation, outcome, token) => Files(casePath, simulation, outcome, settings, token),
            cancellation);
        if (CaseOutcomeReport.Failure(casePath, run.Run, error) is { } failed)
        {
            return failed;
        }

        var outcome = run.Study!;
        if (outcome.Status == StudyStatus.NotReached)
        {
            error.WriteLine($"{casePath}: {DesignReport.Line(outcome)}");
        }

        if (settings.Json)
        {
            output.Write(Encoding.UTF8.GetString(run.Run.Files![Json]));
        }
        else if (!settings.Quiet)
        {
            output.WriteLine($"{run.Case!.Title} ({casePath})");
            if (outcome.Status == StudyStatus.Done)
            {
                output.WriteLine($"  {DesignReport.Line(outcome)}");
            }

            output.WriteLine($"results: {run.Run.Folder}");
            output.WriteLine();
            output.WriteLine(DesignReport.Caution(outcome));
        }

        return outcome.Status == StudyStatus.Done ? ExitCodes.Success : ExitCodes.NoTrustworthyAnswer;
    }

    /// <summary>design.json and design.png; stops before the plot once cancelled.</summary>
    private static Dictionary<string, byte[]> Files(
        string casePath, SimulationCase simulation, DesignOutcome outcome, StudyOptions.Values settings, CancellationToken cancellation)
    {
        var files = new Dictionary<string, byte[]> { [Json] = Encoding.UTF8.GetBytes(DesignReport.Json(outcome, casePath)) };
        cancellation.ThrowIfCancellationRequested();
        if (settings.Plots && DesignPlot.Render(outcome, simulation.Title, settings.PlotOptions) is { } png)
        {
            files["design.png"] = png;
        }

        return files;
    }
}
