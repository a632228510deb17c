namespace Layers.Tests.TestSupport;

/// <summary>The repository root: the first folder above the test binaries that holds Layers.sln.</summary>
internal static class RepoRoot
{
    private static readonly Lazy<string> LazyPath = new(Find);

    public static string Path => LazyPath.Value;

    /// <summary>A path below the repository root, e.g. <c>RepoRoot.File("cases", "x.json")</c>.</summary>
    public static string File(params string[] parts) => System.IO.Path.Combine([Path, .. parts]);

    private static string Find()
    {
        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null; directory = directory.Parent)
        {
            if (System.IO.File.Exists(System.IO.Path.Combine(directory.FullName, "Layers.sln")))
            {
                return directory.FullName;
            }
        }

        throw new InvalidOperationException($"No Layers.sln in {AppContext.BaseDirectory} or any folder above it.");
    }
}
