namespace Layers.Core.Files;

/// <summary>
/// The path a file system entry really has, with every symbolic link on the way resolved (as realpath(3) does), so
/// that a link inside a folder that points out of it is seen to leave it, and a folder reached twice through links is
/// seen to be the same folder. Entries that do not exist are kept as written.
/// </summary>
public static class RealPath
{
    // The limit of links followed while resolving one path, as Linux's (40, from memory: MAXSYMLINKS); a loop of
    // links ends there.
    private const int MaximumLinks = 40;

    /// <summary>The resolved absolute path, or null when resolving it meets more than 40 links (a loop).</summary>
    public static string? Of(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var full = Path.GetFullPath(path);
        var current = Path.GetPathRoot(full) ?? string.Empty;
        var pending = new List<string>(Parts(full, current));
        var links = 0;
        while (pending.Count > 0)
        {
            var next = Path.Combine(current, pending[0]);
            pending.RemoveAt(0);
            var target = LinkTarget(next);
            if (target is null)
            {
                current = next;
                continue;
            }

            if (++links > MaximumLinks)
            {
                return null;
            }

            var resolved = Path.GetFullPath(target, current);
            current = Path.GetPathRoot(resolved) ?? string.Empty;
            pending.InsertRange(0, Parts(resolved, current));
        }

        return current;
    }

    /// <summary>True when <paramref name="path"/> is <paramref name="folder"/> or lies below it (both already resolved).</summary>
    public static bool IsWithin(string path, string folder)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(folder);
        var comparison = OperatingSystem.IsWindows() || OperatingSystem.IsMacOS() ? StringComparison.OrdinalIgnoreCase : StringComparison.Ordinal;
        var prefix = Path.EndsInDirectorySeparator(folder) ? folder : folder + Path.DirectorySeparatorChar;
        return path.Equals(folder, comparison) || path.StartsWith(prefix, comparison);
    }

    private static string[] Parts(string full, string root) =>
        full[root.Length..].Split([Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar], StringSplitOptions.RemoveEmptyEntries);

    private static string? LinkTarget(string path)
    {
        try
        {
            return new FileInfo(path).LinkTarget;
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }
}
