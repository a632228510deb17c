using System.CommandLine;
using System.Text;
using Layers.Core.Reports;
using Layers.Core.Verification;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers verify [--report DIR]</c>: runs the shipped analytic benchmarks and prints how the tool reproduces
/// them; with --report also writes DIR/validation.md and its overlay plots in DIR/validation/.
/// </summary>
internal static class VerifyCommand
{
    private const string PictureFolder = "validation";

    public static Command Create(TextWriter output, TextWriter error)
    {
        var report = new Option<string?>("--report") { Description = "Folder to receive validation.md and its plots." };
        CommandLineRules.NonEmptyPath(report);
        var command = new Command("verify", "Run the analytic benchmarks and show how closely the tool reproduces them.");
        command.Options.Add(report);
        command.SetAction((parseResult, cancellation) => Task.FromResult(Execute(parseResult.GetValue(report), output, error, cancellation)));
        return command;
    }

    private static int Execute(string? reportFolder, TextWriter output, TextWriter error, CancellationToken cancellation)
    {
        var results = VerificationSuite.Run(cancellation);
        ConsoleTables.Write(output, Table(results));
        var failed = results.Count(result => !result.Passed);
        output.WriteLine(failed == 0 ? $"all {results.Count} benchmarks pass" : $"{failed} of {results.Count} benchmarks FAIL");
        if (reportFolder is not null)
        {
            try
            {
                WriteReport(reportFolder, results);
                output.WriteLine($"report: {Path.Combine(reportFolder, "validation.md")}");
            }
            catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
            {
                error.WriteLine($"cannot write the report under '{reportFolder}': {exception.Message}");
                return ExitCodes.OutputFailed;
            }
        }

        return failed == 0 ? ExitCodes.Success : ExitCodes.VerificationFailed;
    }

    private static TextTable Table(IReadOnlyList<BenchmarkResult> results) => new(
        "Analytic benchmarks at default accuracy",
        ["benchmark", "source", "quantity", "analytic", "computed", "rel. error", "verdict"],
        results.Select(result => (IReadOnlyList<string>)
        [
            result.Name,
            result.Source,
            result.Quantity,
            ValidationMarkdown.Value(result.Analytic),
            ValidationMarkdown.Value(result.Computed),
            ValidationMarkdown.Error(result.RelativeError),
            result.Passed ? "pass" : "FAIL",
        ]).ToArray());

    private static void WriteReport(string folder, IReadOnlyList<BenchmarkResult> results)
    {
        var pictures = new Dictionary<int, string>();
        var files = new Dictionary<string, byte[]>();
        var options = new PlotOptions(900, 560);
        for (var i = 0; i < results.Count; i++)
        {
            if (results[i].Curve is { } curve)
            {
                var name = FormattableString.Invariant($"benchmark-{i + 1:00}.png");
                files[name] = OverlayPlot.Render(results[i], curve, options);
                pictures[i] = $"{PictureFolder}/{name}";
            }
        }

        Directory.CreateDirectory(folder);
        CaseOutputFolder.Write(folder, PictureFolder, files);
        var markdown = Path.Combine(folder, "validation.md");
        var staging = markdown + ".writing";
        File.WriteAllText(staging, ValidationMarkdown.Write(results, pictures), new UTF8Encoding(false));
        File.Move(staging, markdown, overwrite: true);
    }
}
