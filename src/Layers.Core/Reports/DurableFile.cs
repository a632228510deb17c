namespace Layers.Core.Reports;

/// <summary>
/// Writes a file and flushes it to the disk before returning, so that a rename that follows cannot reach the disk
/// before the content does: after a power loss the final name holds the whole new file or the old one, never an
/// empty file.
/// </summary>
public static class DurableFile
{
    /// <summary>Creates (or truncates) <paramref name="path"/>, writes <paramref name="content"/> and flushes it to the disk.</summary>
    public static void Write(string path, byte[] content)
    {
        ArgumentNullException.ThrowIfNull(content);
        using var stream = new FileStream(path, FileMode.Create, FileAccess.Write, FileShare.None);
        stream.Write(content);
        stream.Flush(flushToDisk: true);
    }
}
