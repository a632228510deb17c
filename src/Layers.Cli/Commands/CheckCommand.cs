using System.CommandLine;
using Layers.Core.Reports;

namespace Layers.Cli.Commands;

/// <summary><c>layers check CASE</c>: validates a case and prints its stack in consistent units, without solving.</summary>
internal static class CheckCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var caseFile = CaseArgument.Create();
        var command = new Command("check", "Validate a case file and print the stack in consistent units, without solving.");
        command.Arguments.Add(caseFile);
        var allowOutside = CaseArgument.AllowOutsideFilesOption();
        command.Options.Add(allowOutside);
        command.SetAction(parseResult =>
        {
            var read = CaseArgument.ReadOrReport(parseResult.GetValue(caseFile)!, error, CaseArgument.Access(parseResult, allowOutside));
            if (read?.Case is not { } simulation)
            {
                return ExitCodes.InvalidInput;
            }

            output.WriteLine($"{simulation.Title} ({parseResult.GetValue(caseFile)}): valid");
            ConsoleTables.Write(output, [InputTables.Layers(simulation), InputTables.Conditions(simulation), .. FoodContactTables.Stages(simulation)]);
            return ExitCodes.Success;
        });
        return command;
    }
}
