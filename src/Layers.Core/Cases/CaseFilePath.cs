using Layers.Core.Files;

namespace Layers.Core.Cases;

/// <summary>
/// The one rule for a file named inside a case file (or inside a shard summary read by <c>layers merge</c>): the
/// path is taken relative to the folder of the file that names it and, unless the user allows it, must not leave
/// that folder; the file is then read by <see cref="InputFile"/> (regular files only, size limit, UTF-8).
/// </summary>
public static class CaseFilePath
{
    /// <summary>Reads the file that <paramref name="written"/> names, or returns null with the reason in <paramref name="problem"/>.</summary>
    /// <param name="namingFile">The file in which the path is written (a case file, a shard summary).</param>
    /// <param name="written">The path as written there.</param>
    /// <param name="access">Whether the file may lie outside the folder of <paramref name="namingFile"/>.</param>
    /// <param name="problem">Why the file was not read, quoting only the path as written.</param>
    public static string? ReadText(string namingFile, string written, CaseFileAccess access, out string? problem)
    {
        ArgumentNullException.ThrowIfNull(namingFile);
        var folder = Path.GetDirectoryName(Path.GetFullPath(namingFile)) ?? Directory.GetCurrentDirectory();
        var path = Resolve(folder, $"the folder of {Path.GetFileName(namingFile)}", written, access, out problem);
        if (path is null)
        {
            return null;
        }

        var text = InputFile.ReadText(path, InputFile.CaseLimitBytes, out var reason);
        problem = reason is null ? null : $"'{written}': {reason}";
        return text;
    }

    /// <summary>
    /// The full path of the file that <paramref name="written"/> names, relative to <paramref name="folder"/>; null,
    /// with the reason, when it is empty or leaves that folder (after symbolic links are resolved) without leave.
    /// </summary>
    /// <param name="folder">The folder paths are relative to.</param>
    /// <param name="folderName">How messages name that folder, e.g. "the folder of film.json".</param>
    /// <param name="written">The path as written.</param>
    /// <param name="access">Whether the file may lie outside <paramref name="folder"/>.</param>
    /// <param name="problem">Why the path is refused.</param>
    public static string? Resolve(string folder, string folderName, string written, CaseFileAccess access, out string? problem)
    {
        ArgumentNullException.ThrowIfNull(folder);
        ArgumentNullException.ThrowIfNull(written);
        problem = null;
        if (string.IsNullOrWhiteSpace(written) || written.Contains('\0', StringComparison.Ordinal))
        {
            problem = "expected a file name; got an empty name";
            return null;
        }

        var path = Path.GetFullPath(Path.Combine(folder, written));
        if (access == CaseFileAccess.Anywhere)
        {
            return path;
        }

        var realFolder = RealPath.Of(folder);
        var realPath = RealPath.Of(path);
        if (realFolder is null || realPath is null || !RealPath.IsWithin(realPath, realFolder))
        {
            problem = $"'{written}' is outside {folderName}; a file named there must be in that folder or below it " +
                "(the command line's --allow-outside-files lifts this)";
            return null;
        }

        return path;
    }
}
