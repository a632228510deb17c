using System.Diagnostics;
using System.Globalization;
using Layers.Core.Batch;
using Spectre.Console;

namespace Layers.Cli.Commands;

/// <summary>
/// Progress of a batch: on a terminal, a live status line (done, running, failed, elapsed) drawn by Spectre.Console;
/// otherwise (CI, pipes, tests) one plain line per finished case. Nothing with --quiet; with --json the plain lines
/// go to stderr so that stdout stays JSON.
/// </summary>
internal sealed class BatchProgressDisplay : IBatchProgress
{
    private readonly Lock _gate = new();
    private readonly int _total;
    private readonly TextWriter? _lines;
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private int _running;
    private int _done;
    private int _failed;

    private BatchProgressDisplay(int total, TextWriter? lines)
    {
        _total = total;
        _lines = lines;
    }

    /// <summary>Runs <paramref name="run"/> with a progress display suited to where the output goes.</summary>
    public static IReadOnlyList<BatchRow> Run(
        IReadOnlyList<BatchItem> items,
        RunSettings settings,
        TextWriter output,
        TextWriter error,
        Func<IBatchProgress, IReadOnlyList<BatchRow>> run)
    {
        var terminal = ReferenceEquals(output, Console.Out) && !Console.IsOutputRedirected && !settings.Quiet && !settings.Json;
        if (!terminal)
        {
            var lines = settings.Quiet ? null : settings.Json ? error : output;
            return run(new BatchProgressDisplay(items.Count, lines));
        }

        var display = new BatchProgressDisplay(items.Count, null);
        IReadOnlyList<BatchRow> rows = [];
        AnsiConsole.Status().Start(display.Text(), context =>
        {
            var task = Task.Run(() => rows = run(display));
            while (!task.Wait(250))
            {
                context.Status(display.Text());
            }

            task.GetAwaiter().GetResult();
        });
        return rows;
    }

    public void Started(BatchItem item)
    {
        lock (_gate)
        {
            _running++;
        }
    }

    public void Finished(BatchRow row)
    {
        lock (_gate)
        {
            _running--;
            _done++;
            if (row.Status != BatchStatus.Succeeded)
            {
                _failed++;
            }

            var message = row.Message.Length > 0 ? $": {row.Message}" : string.Empty;
            _lines?.WriteLine(string.Create(CultureInfo.InvariantCulture, $"[{_done}/{_total}] {BatchColumns.StatusName(row.Status)} {row.Name}{message}"));
        }
    }

    private string Text()
    {
        lock (_gate)
        {
            var elapsed = _clock.Elapsed;
            return string.Create(CultureInfo.InvariantCulture,
                $"{_done}/{_total} done, {_running} running, {_failed} not succeeded, {(int)elapsed.TotalMinutes}:{elapsed.Seconds:00} elapsed");
        }
    }
}
