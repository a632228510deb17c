namespace Layers.Core.Reports;

/// <summary>
/// Writes one file as a whole: to a hidden temporary file beside it, flushed to the disk, then renamed over the
/// target, so that an interrupted run or a power loss leaves the earlier file or the new one, never half of either.
/// </summary>
public static class AtomicFile
{
    /// <summary>Writes <paramref name="content"/> to <paramref name="path"/>, creating its folder if needed.</summary>
    public static void Write(string path, byte[] content)
    {
        var folder = Path.GetDirectoryName(Path.GetFullPath(path))!;
        Directory.CreateDirectory(folder);
        var temporary = Path.Combine(folder, StagingNames.Writing(Path.GetFileName(path), StagingNames.NewToken()));
        try
        {
            DurableFile.Write(temporary, content);
            File.Move(temporary, path, overwrite: true);
        }
        finally
        {
            if (File.Exists(temporary))
            {
                File.Delete(temporary);
            }
        }
    }
}
