using System.Collections.Concurrent;

namespace Layers.Core.Reports;

/// <summary>
/// Writes the files of one case into <c>outputRoot/caseName/</c> as a whole: everything goes to a hidden temporary
/// folder first, each file flushed to the disk, which then replaces any earlier folder of that name by renames. A
/// failed, cancelled or interrupted run leaves the earlier results as they were and no half-written file in their
/// place; the hidden folders a killed run leaves behind are removed by the next run writing to the same output root
/// (<see cref="StagingNames.SweepStale(string)"/>).
/// </summary>
public static class CaseOutputFolder
{
    // Output roots already swept of stale leftovers by this process: once is enough, a batch writes many cases.
    private static readonly ConcurrentDictionary<string, bool> Swept = new(StringComparer.Ordinal);

    /// <summary>Writes the files and returns the final folder path.</summary>
    /// <param name="outputRoot">The output root, created if missing.</param>
    /// <param name="caseName">Name of the case folder.</param>
    /// <param name="files">File name and content (bytes) of every file.</param>
    /// <param name="cancellation">
    /// Checked before each file and before the renames: once it fires, nothing is committed, the temporary folder is
    /// removed and <see cref="OperationCanceledException"/> is thrown.
    /// </param>
    public static string Write(
        string outputRoot, string caseName, IReadOnlyDictionary<string, byte[]> files, CancellationToken cancellation = default) =>
        Write(outputRoot, caseName, files, folder => StagingNames.TryDelete(folder), cancellation);

    /// <summary>As <see cref="Write(string, string, IReadOnlyDictionary{string, byte[]}, CancellationToken)"/>, with the removal of the replaced folder given (for tests).</summary>
    internal static string Write(
        string outputRoot,
        string caseName,
        IReadOnlyDictionary<string, byte[]> files,
        Action<string> removeReplaced,
        CancellationToken cancellation)
    {
        ArgumentNullException.ThrowIfNull(files);
        Directory.CreateDirectory(outputRoot);
        if (Swept.TryAdd(Path.GetFullPath(outputRoot), true))
        {
            StagingNames.SweepStale(outputRoot);
        }

        var final = Path.Combine(outputRoot, caseName);
        var token = StagingNames.NewToken();
        var staging = Path.Combine(outputRoot, StagingNames.Writing(caseName, token));
        var previous = Path.Combine(outputRoot, StagingNames.Previous(caseName, token));
        Directory.CreateDirectory(staging);
        try
        {
            foreach (var (name, content) in files)
            {
                cancellation.ThrowIfCancellationRequested();
                DurableFile.Write(Path.Combine(staging, name), content);
            }

            cancellation.ThrowIfCancellationRequested();
            if (Directory.Exists(final))
            {
                Directory.Move(final, previous);
            }

            Directory.Move(staging, final);
        }
        catch
        {
            if (Directory.Exists(previous) && !Directory.Exists(final))
            {
                Directory.Move(previous, final);
            }

            StagingNames.TryDelete(staging);
            throw;
        }

        // The new results are in place: an old folder that cannot be removed stays hidden and is swept later.
        try
        {
            removeReplaced(previous);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            // Harmless: see above.
        }

        return final;
    }
}
