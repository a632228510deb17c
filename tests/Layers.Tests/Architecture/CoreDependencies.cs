using System.Text.RegularExpressions;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Architecture;

/// <summary>
/// The namespace-to-namespace uses inside Layers.Core, read from its sources. In C# a type of another namespace is
/// reachable only through a <c>using</c> directive or a qualified name (<c>Layers.Core.X.Type</c>, or <c>X.Type</c>
/// from inside <c>Layers.Core</c>), so scanning for those finds every use, in signatures and method bodies alike,
/// constants and enum values included. A <c>using</c> that nothing needs still counts: it is a dependency in waiting.
/// </summary>
internal static partial class CoreDependencies
{
    /// <summary>One use: a file of layer <paramref name="From"/> names layer <paramref name="To"/>.</summary>
    public sealed record Edge(string From, string To, string File, string Evidence);

    /// <summary>Every use of one Layers.Core namespace by a file of another.</summary>
    public static IReadOnlyList<Edge> Scan()
    {
        var root = RepoRoot.File("src", "Layers.Core");
        var types = typeof(Layers.Core.Units.Quantity).Assembly.GetTypes()
            .Where(type => type.Namespace?.StartsWith("Layers.Core.", StringComparison.Ordinal) == true)
            .Select(type => type.Namespace + "." + type.Name.Split('`')[0])
            .ToHashSet(StringComparer.Ordinal);
        var edges = new List<Edge>();
        foreach (var path in Directory.EnumerateFiles(root, "*.cs", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
        {
            var relative = Path.GetRelativePath(root, path).Replace('\\', '/');
            if (relative.StartsWith("obj/", StringComparison.Ordinal) || relative.StartsWith("bin/", StringComparison.Ordinal))
            {
                continue;
            }

            var code = string.Join('\n', File.ReadAllLines(path).Where(line => !line.TrimStart().StartsWith("//", StringComparison.Ordinal)));
            if (FileNamespace().Match(code) is not { Success: true } declared)
            {
                continue;
            }

            var from = declared.Groups["layer"].Value;
            var found = new SortedDictionary<string, string>(StringComparer.Ordinal);
            foreach (Match use in UsingDirective().Matches(code))
            {
                found.TryAdd(use.Groups["layer"].Value, use.Value.Trim());
            }

            foreach (Match use in FullyQualified().Matches(code))
            {
                found.TryAdd(use.Groups["layer"].Value, use.Value);
            }

            foreach (Match use in PartlyQualified().Matches(code))
            {
                // "FoodContact.Stages" may be a property read; it is a use of a namespace only if that type exists.
                if (types.Contains("Layers.Core." + use.Value))
                {
                    found.TryAdd(use.Groups["layer"].Value, use.Value);
                }
            }

            edges.AddRange(found.Where(pair => pair.Key != from).Select(pair => new Edge(from, pair.Key, relative, pair.Value)));
        }

        return edges;
    }

    [GeneratedRegex(@"^namespace\s+Layers\.Core\.(?<layer>\w+)", RegexOptions.Multiline)]
    private static partial Regex FileNamespace();

    [GeneratedRegex(@"^\s*using\s+(static\s+)?(\w+\s*=\s*)?Layers\.Core\.(?<layer>\w+)[^;]*;", RegexOptions.Multiline)]
    private static partial Regex UsingDirective();

    [GeneratedRegex(@"(?<![\w.])Layers\.Core\.(?<layer>\w+)\.\w+")]
    private static partial Regex FullyQualified();

    [GeneratedRegex(@"(?<![\w.])(?<layer>Units|Files|FoodContact|Domain|Discretization|Analytics|TimeStepping|Results|Permeation|Simulation|Cases|Studies|Fitting|Reports|Verification|Batch)\.[A-Z]\w*")]
    private static partial Regex PartlyQualified();
}
