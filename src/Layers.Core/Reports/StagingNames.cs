using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;

namespace Layers.Core.Reports;

/// <summary>
/// Names of the hidden files and folders a write goes through (<c>.NAME.writing-PID-TOKEN</c> while written,
/// <c>.NAME.previous-PID-TOKEN</c> for results being replaced), and the sweep that removes those left behind by a run
/// that was killed. The process id in the name tells a leftover of a dead run from the work of a live one writing to
/// the same output folder at the same time.
/// </summary>
public static partial class StagingNames
{
    /// <summary>A leftover whose writer still runs is taken as stale after this long: no write takes so long, so its process id was reused.</summary>
    public static readonly TimeSpan LiveWriterAge = TimeSpan.FromDays(1);

    /// <summary>A leftover of an older version (no process id in its name) is taken as stale after this long.</summary>
    public static readonly TimeSpan UnownedAge = TimeSpan.FromHours(1);

    /// <summary>The hidden name of <paramref name="name"/> while it is written by this process.</summary>
    public static string Writing(string name, string token) => $".{name}.writing-{Environment.ProcessId}-{token}";

    /// <summary>The hidden name that results being replaced take for a moment.</summary>
    public static string Previous(string name, string token) => $".{name}.previous-{Environment.ProcessId}-{token}";

    /// <summary>A fresh random token, so that several writers of the same name in one process do not collide.</summary>
    public static string NewToken() => Guid.NewGuid().ToString("N")[..8];

    /// <summary>
    /// Removes the leftovers in <paramref name="folder"/> whose writer is gone: its process no longer runs, or the
    /// leftover is older than <see cref="LiveWriterAge"/> (<see cref="UnownedAge"/> without a process id). A
    /// <c>previous</c> folder is removed only when the results it stood for are in place, so that a run killed
    /// between its two renames never loses the only copy. Whatever cannot be removed is left; it is harmless.
    /// </summary>
    /// <returns>How many leftovers were removed.</returns>
    public static int SweepStale(string folder) => SweepStale(folder, IsRunning, DateTime.UtcNow);

    /// <summary>As <see cref="SweepStale(string)"/>, with the liveness test and the clock given (for tests).</summary>
    internal static int SweepStale(string folder, Func<int, bool> isRunning, DateTime nowUtc)
    {
        if (!Directory.Exists(folder))
        {
            return 0;
        }

        var removed = 0;
        foreach (var path in Directory.EnumerateFileSystemEntries(folder, ".*"))
        {
            if (Pattern().Match(Path.GetFileName(path)) is not { Success: true } match)
            {
                continue;
            }

            var age = nowUtc - File.GetLastWriteTimeUtc(path);
            var stale = match.Groups["pid"].Success
                ? !isRunning(int.Parse(match.Groups["pid"].Value, CultureInfo.InvariantCulture)) || age > LiveWriterAge
                : age > UnownedAge;
            var isPrevious = match.Groups["kind"].Value == "previous";
            if (!stale || (isPrevious && !Path.Exists(Path.Combine(folder, match.Groups["name"].Value))))
            {
                continue;
            }

            removed += TryDelete(path) ? 1 : 0;
        }

        return removed;
    }

    /// <summary>Deletes a file or folder; false (and nothing thrown) when the file system refuses.</summary>
    public static bool TryDelete(string path)
    {
        try
        {
            if (Directory.Exists(path))
            {
                Directory.Delete(path, recursive: true);
            }
            else if (File.Exists(path))
            {
                File.Delete(path);
            }

            return true;
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return false;
        }
    }

    private static bool IsRunning(int processId)
    {
        if (processId == Environment.ProcessId)
        {
            return true;
        }

        try
        {
            using var process = Process.GetProcessById(processId);
            return !process.HasExited;
        }
        catch (Exception exception) when (exception is ArgumentException or InvalidOperationException)
        {
            return false;
        }
    }

    [GeneratedRegex(@"^\.(?<name>.+)\.(?<kind>writing|previous)-(?:(?<pid>\d{1,9})-)?[0-9a-f]{8}$", RegexOptions.CultureInvariant)]
    private static partial Regex Pattern();
}
