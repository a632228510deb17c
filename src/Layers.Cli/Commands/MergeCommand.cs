using System.CommandLine;
using System.Text.Json;
using Layers.Core.Batch;
using Layers.Core.Cases;
using Layers.Core.Files;
using Layers.Core.Reports;

namespace Layers.Cli.Commands;

/// <summary>
/// <c>layers merge FOLDER... [--out DIR]</c>: combines the summary.json of shard runs (<c>layers run --shard I/N</c>)
/// into one set of summary files, as if the batch had run on one machine. A case that appears in two shards is an
/// error, since shards are disjoint by construction.
/// </summary>
internal static class MergeCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var folders = new Argument<string[]>("folders")
        {
            Description = "Output folders of shard runs, each holding a summary.json.",
            Arity = ArgumentArity.OneOrMore,
        };
        var outputRoot = new Option<string>("--out", "-o")
        {
            Description = "Folder that receives the merged summary files.",
            DefaultValueFactory = _ => "results",
        };
        var quiet = new Option<bool>("--quiet", "-q") { Description = "Print nothing on success (errors still go to stderr)." };
        var json = new Option<bool>("--json") { Description = "Print the merged summary.json to stdout instead of the table." };
        var noPlots = new Option<bool>("--no-plots") { Description = "Skip the sweep plots." };
        var allowOutside = new Option<bool>("--allow-outside-files")
        {
            Description = "Let the shard summaries name sweep files outside the current folder (refused by default; see docs/cli.md).",
        };
        CommandLineRules.PathsNotOptions(folders);
        CommandLineRules.NonEmptyPath(outputRoot);
        var command = new Command("merge", "Combine the summaries of shard runs into one.");
        command.Arguments.Add(folders);
        command.Options.Add(outputRoot);
        command.Options.Add(quiet);
        command.Options.Add(json);
        command.Options.Add(noPlots);
        command.Options.Add(allowOutside);
        command.SetAction(parseResult => Execute(
            parseResult.GetValue(folders)!,
            new RunSettings(string.Empty, parseResult.GetValue(outputRoot)!) {
                Quiet = parseResult.GetValue(quiet),
                Json = parseResult.GetValue(json),
                Plots = !parseResult.GetValue(noPlots),
                Access = parseResult.GetValue(allowOutside) ? CaseFileAccess.Anywhere : CaseFileAccess.InsideCaseFolder,
            },
            output,
            error));
        return command;
    }

    private static int Execute(IReadOnlyList<string> folders, RunSettings settings, TextWriter output, TextWriter error)
    {
        var rows = new List<BatchRow>();
        var origin = new Dictionary<string, string>(StringComparer.Ordinal);
        var problems = 0;
        foreach (var folder in folders)
        {
            var path = Path.Combine(folder, BatchSummaryFiles.Json);
            IReadOnlyList<BatchRow> shard;
            if (InputFile.ReadText(path, InputFile.SummaryLimitBytes, out var unreadable) is not { } text)
            {
                error.WriteLine($"{path}: cannot read the batch summary: {unreadable}");
                problems++;
                continue;
            }

            try
            {
                shard = BatchSummaryJson.Read(text);
            }
            catch (Exception exception) when (exception is JsonException or KeyNotFoundException or InvalidOperationException)
            {
                // The parser's message names a position, never the content.
                error.WriteLine($"{path}: not a batch summary: {exception.Message}");
                problems++;
                continue;
            }

            var times = Timing(Path.Combine(folder, BatchSummaryFiles.Timing));
            foreach (var row in shard)
            {
                var key = $"{row.Name}\u0000{row.File}";
                if (!origin.TryAdd(key, path))
                {
                    error.WriteLine($"{path}: case '{row.Name}' is also in {origin[key]}; shards of one batch never share a case");
                    problems++;
                    continue;
                }

                rows.Add(row with { SolveSeconds = times.TryGetValue(row.Name, out var seconds) ? seconds : null });
            }
        }

        if (problems > 0)
        {
            return ExitCodes.InvalidInput;
        }

        var ordered = BatchRow.Ordered(rows);
        try
        {
            if (settings.Plots)
            {
                BatchRun.WriteSweepPlots(SweepsOf(ordered, settings.Access, error), ordered, settings);
            }

            BatchSummaryFiles.WriteTo(settings.OutputRoot, ordered);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"cannot write the merged summary under '{settings.OutputRoot}': {exception.Message}");
            return ExitCodes.OutputFailed;
        }

        BatchRun.Report(ordered, settings, output, error, cancelled: false);
        return BatchRun.OutcomeCode(ordered, cancelled: false);
    }

    /// <summary>
    /// The sweeps whose sub-cases the rows hold, read again from their case files (which the shards read by the
    /// same paths, relative to the current folder); a sweep file that is gone or changed simply gets no plot. The
    /// paths come from files that may have been written elsewhere, so they follow the rule for paths written in a
    /// case: within the current folder unless the user allows more, regular files only (<see cref="CaseFilePath"/>).
    /// </summary>
    private static List<SweepGroup> SweepsOf(IReadOnlyList<BatchRow> rows, CaseFileAccess access, TextWriter error)
    {
        var files = new List<string>();
        foreach (var written in rows.Where(row => row.Parameters.Count > 0).Select(row => row.File).Distinct(StringComparer.Ordinal))
        {
            if (CaseFilePath.Resolve(Directory.GetCurrentDirectory(), "the current folder", written, access, out var problem) is not { } file)
            {
                error.WriteLine($"sweep file {problem}; its sweep gets no plot");
            }
            else if (File.Exists(file))
            {
                files.Add(written);
            }
        }

        return files.SelectMany(file => BatchCollector.Collect([file], recursive: false).Sweeps).ToList();
    }

    /// <summary>Solve times from a timing.csv, when there is one (case names never hold commas they would quote).</summary>
    private static Dictionary<string, double> Timing(string path)
    {
        var times = new Dictionary<string, double>(StringComparer.Ordinal);
        if (!File.Exists(path) || InputFile.ReadText(path, InputFile.SummaryLimitBytes, out _) is not { } text)
        {
            return times;
        }

        foreach (var line in text.Split('\n').Skip(1))
        {
            var comma = line.LastIndexOf(',');
            if (comma > 0 && double.TryParse(line[(comma + 1)..], System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out var seconds))
            {
                times[CsvText.ReadText(line[..comma].Trim('"'))] = seconds;
            }
        }

        return times;
    }
}
