using System.CommandLine;
using System.Text;
using Layers.Core.Batch;
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
        command.SetAction((parseResult, cancellation) =>
        {
            using var interrupt = new InterruptScope(cancellation);
            return Task.FromResult(Execute(parseResult.GetValue(report), output, error, VerificationSuite.Run, interrupt.Token));
        });
        return command;
    }

    /// <summary>Runs the suite given (tests give one that cancels) and prints, and writes the report, as the command does.</summary>
    internal static int Execute(
        string? reportFolder,
        TextWriter output,
        TextWriter error,
        Func<CancellationToken, IReadOnlyList<BenchmarkResult>> runSuite,
        CancellationToken cancellation)
    {
        var results = runSuite(cancellation);
        if (cancellation.IsCancellationRequested)
        {
            // A benchmark stopped part way compares a partial run with its solution: no verdict, nothing written.
            error.WriteLine($"verify: {CaseRun.CancelledMessage}");
            return ExitCodes.Cancelled;
        }

        ConsoleTables.Write(output, Table(results));
        var failed = results.Count(result => !result.Passed);
        output.WriteLine(failed == 0 ? $"all {results.Count} benchmarks pass" : $"{failed} of {results.Count} benchmarks FAIL");
        if (reportFolder is not null)
        {
            try
            {
                WriteReport(reportFolder, results, cancellation);
                output.WriteLine($"report: {Path.Combine(reportFolder, "validation.md")}");
            }
            catch (OperationCanceledException) when (cancellation.IsCancellationRequested)
            {
                error.WriteLine($"verify: {CaseRun.CancelledMessage}");
                return ExitCodes.Cancelled;
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
        $"Analytic benchmarks at fixed numerics ({VerificationSuite.BenchmarkSettings}); \"{VerificationSuite.ExactSuffix.Trim()}\": the exact method, held to {VerificationSuite.ExactTolerance:0e0}",
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

    /// <summary>
    /// Writes validation.md and its pictures (validation/). Everything is made in memory first, checking cancellation
    /// between pictures; the pictures' folder is then committed as a whole (<see cref="CaseOutputFolder"/>, nothing
    /// once cancelled) and the page after it as a whole (<see cref="AtomicFile"/>), so that an interrupted run leaves
    /// the earlier report, and a page never shows pictures that are not there.
    /// </summary>
    private static void WriteReport(string folder, IReadOnlyList<BenchmarkResult> results, CancellationToken cancellation)
    {
        var pictures = new Dictionary<int, string>();
        var files = new Dictionary<string, byte[]>();
        var options = new PlotOptions(900, 560);
        for (var i = 0; i < results.Count; i++)
        {
            if (results[i].Curve is { } curve)
            {
                cancellation.ThrowIfCancellationRequested();
                var name = FormattableString.Invariant($"benchmark-{i + 1:00}.png");
                files[name] = OverlayPlot.Render(results[i], curve, options);
                pictures[i] = $"{PictureFolder}/{name}";
            }
        }

        var page = Encoding.UTF8.GetBytes(ValidationMarkdown.Write(results, pictures));
        CaseOutputFolder.Write(folder, PictureFolder, files, cancellation);
        // The pictures are committed: the page that shows them follows, cancelled or not, so the two always match.
        AtomicFile.Write(Path.Combine(folder, "validation.md"), page);
    }
}
