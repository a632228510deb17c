using System.Diagnostics;
using System.Globalization;
using System.Text;

namespace Layers.Cli.Commands;

/// <summary>
/// Wall time of the phases of one run (reading, solving, building the files, writing them), for <c>--timing</c>:
/// where a cold start spends its time is measured, not guessed (docs/performance.md).
/// </summary>
internal sealed class PhaseClock
{
    private readonly List<(string Name, double Milliseconds)> _phases = [];
    private long _last = Stopwatch.GetTimestamp();

    /// <summary>Ends the phase that ran since the previous mark (or since the clock was made).</summary>
    public void Mark(string name)
    {
        var now = Stopwatch.GetTimestamp();
        _phases.Add((name, Stopwatch.GetElapsedTime(_last, now).TotalMilliseconds));
        _last = now;
    }

    /// <summary>One line: each phase in milliseconds, then the time since the process started (start-up included).</summary>
    public string Describe()
    {
        var text = new StringBuilder("timing: phases");
        foreach (var (name, milliseconds) in _phases)
        {
            text.Append(CultureInfo.InvariantCulture, $" {name} {milliseconds:F1} ms,");
        }

        using var process = Process.GetCurrentProcess();
        var sinceStart = (DateTime.Now - process.StartTime).TotalMilliseconds;
        return text.Append(CultureInfo.InvariantCulture, $" process start to here {sinceStart:F0} ms").ToString();
    }
}
