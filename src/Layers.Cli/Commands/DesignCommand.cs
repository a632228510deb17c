using System.CommandLine;
using System.Text;
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
        if (StudyCase.Read(casePath, "design", error) is not var (simulation, document))
        {
            return ExitCodes.InvalidInput;
        }

        // Read once already with the case, so valid here.
        var design = DesignReader.Read(document, casePath, simulation, [])!;
        var outcome = DesignSolver.Solve(document, casePath, design, settings.Jobs, cancellation);
        if (StudyCase.Failure(casePath, outcome.Status, outcome.Message, outcome.Errors, error) is { } failed)
        {
            return failed;
        }

        var json = DesignReport.Json(outcome, casePath);
        var files = new Dictionary<string, byte[]> { ["design.json"] = Encoding.UTF8.GetBytes(json) };
        if (settings.Plots && DesignPlot.Render(outcome, simulation.Title, settings.PlotOptions) is { } png)
        {
            files["design.png"] = png;
        }

        if (StudyCase.Write(settings.OutputRoot, casePath, "design", files, error) is not { } folder)
        {
            return ExitCodes.OutputFailed;
        }

        if (outcome.Status == StudyStatus.NotReached)
        {
            error.WriteLine($"{casePath}: {DesignReport.Line(outcome)}");
        }

        if (settings.Json)
        {
            output.Write(json);
        }
        else if (!settings.Quiet)
        {
            output.WriteLine($"{simulation.Title} ({casePath})");
            if (outcome.Status == StudyStatus.Done)
            {
                output.WriteLine($"  {DesignReport.Line(outcome)}");
            }

            output.WriteLine($"results: {folder}");
            output.WriteLine();
            output.WriteLine(DesignReport.Caution(outcome));
        }

        return outcome.Status == StudyStatus.Done ? ExitCodes.Success : ExitCodes.NoTrustworthyAnswer;
    }
}
