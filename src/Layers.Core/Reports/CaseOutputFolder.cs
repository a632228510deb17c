namespace Layers.Core.Reports;

/// <summary>
/// Writes the files of one case into <c>outputRoot/caseName/</c> as a whole: everything goes to a hidden temporary
/// folder first, which then replaces any earlier folder of that name by renames. A failed or interrupted run leaves
/// the earlier results as they were and no half-written file in their place.
/// </summary>
public static class CaseOutputFolder
{
    /// <summary>Writes the files and returns the final folder path.</summary>
    /// <param name="outputRoot">The output root, created if missing.</param>
    /// <param name="caseName">Name of the case folder.</param>
    /// <param name="files">File name and content (bytes) of every file.</param>
    public static string Write(string outputRoot, string caseName, IReadOnlyDictionary<string, byte[]> files)
    {
        Directory.CreateDirectory(outputRoot);
        var final = Path.Combine(outputRoot, caseName);
        var token = Guid.NewGuid().ToString("N")[..8];
        var staging = Path.Combine(outputRoot, $".{caseName}.writing-{token}");
        var previous = Path.Combine(outputRoot, $".{caseName}.previous-{token}");
        Directory.CreateDirectory(staging);
        try
        {
            foreach (var (name, content) in files)
            {
                File.WriteAllBytes(Path.Combine(staging, name), content);
            }

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

            TryDelete(staging);
            throw;
        }

        TryDelete(previous);
        return final;
    }

    private static void TryDelete(string folder)
    {
        try
        {
            if (Directory.Exists(folder))
            {
                Directory.Delete(folder, recursive: true);
            }
        }
        catch (IOException)
        {
            // A leftover hidden folder is harmless; the results are already in place.
        }
    }
}
