using System.Runtime.InteropServices;

namespace Layers.Cli.Commands;

/// <summary>
/// A cancellation token that fires on Ctrl+C (SIGINT), on SIGTERM (what schedulers and <c>kill</c> send) and when
/// the token System.CommandLine gives the action fires. Both signals are marked handled, so the process is not
/// ended at once: the run stops its cases at their next step or before their next plot or file, commits no new
/// results, keeps the finished ones, writes a batch's summary and exits 130.
/// </summary>
internal sealed class InterruptScope : IDisposable
{
    private readonly CancellationTokenSource _source;
    private readonly PosixSignalRegistration? _terminate;

    public InterruptScope(CancellationToken given)
    {
        _source = CancellationTokenSource.CreateLinkedTokenSource(given);
        Console.CancelKeyPress += OnCancelKeyPress;
        // System.CommandLine's own SIGTERM handling lets the runtime end the process before a batch writes its summary.
        _terminate = OperatingSystem.IsWindows() ? null : PosixSignalRegistration.Create(PosixSignal.SIGTERM, OnTerminate);
    }

    /// <summary>Fires on Ctrl+C, SIGTERM or when the given token fires.</summary>
    public CancellationToken Token => _source.Token;

    public void Dispose()
    {
        _terminate?.Dispose();
        Console.CancelKeyPress -= OnCancelKeyPress;
        _source.Dispose();
    }

    private void OnCancelKeyPress(object? sender, ConsoleCancelEventArgs e)
    {
        e.Cancel = true;
        _source.Cancel();
    }

    private void OnTerminate(PosixSignalContext context)
    {
        context.Cancel = true;
        _source.Cancel();
    }
}
