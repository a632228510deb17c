namespace Layers.Cli.Commands;

/// <summary>
/// A cancellation token that fires on Ctrl+C (Console.CancelKeyPress) as well as on the token System.CommandLine
/// gives the action. The key press is marked handled, so the process is not killed at once: a batch stops its
/// running cases at their next step, keeps the finished ones and writes its summary.
/// </summary>
internal sealed class InterruptScope : IDisposable
{
    private readonly CancellationTokenSource _source;

    public InterruptScope(CancellationToken given)
    {
        _source = CancellationTokenSource.CreateLinkedTokenSource(given);
        Console.CancelKeyPress += OnCancelKeyPress;
    }

    /// <summary>Fires on Ctrl+C or when the given token fires.</summary>
    public CancellationToken Token => _source.Token;

    public void Dispose()
    {
        Console.CancelKeyPress -= OnCancelKeyPress;
        _source.Dispose();
    }

    private void OnCancelKeyPress(object? sender, ConsoleCancelEventArgs e)
    {
        e.Cancel = true;
        _source.Cancel();
    }
}
