using System.Globalization;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace Layers.Core.Cases;

/// <summary>
/// The simple JSON paths the tool uses in its messages (<c>$.layers[2].thickness</c>: member names and array
/// indices, nothing else), parsed into steps and used to find or replace a value in a document.
/// </summary>
internal static partial class JsonPathSteps
{
    /// <summary>The steps (string member names, int indices), or null when the text is not such a path.</summary>
    public static IReadOnlyList<object>? Parse(string path)
    {
        if (!path.StartsWith('$') || !WholePath().IsMatch(path))
        {
            return null;
        }

        var steps = new List<object>();
        foreach (Match match in Step().Matches(path[1..]))
        {
            steps.Add(match.Groups[1].Success ? match.Groups[1].Value : int.Parse(match.Groups[2].Value, CultureInfo.InvariantCulture));
        }

        return steps.Count == 0 ? null : steps;
    }

    /// <summary>The node at the steps, or null when some step does not exist.</summary>
    public static JsonNode? Find(JsonNode root, IReadOnlyList<object> steps)
    {
        JsonNode? node = root;
        foreach (var step in steps)
        {
            node = (step, node) switch
            {
                (string key, JsonObject member) => member[key],
                (int index, JsonArray array) when index < array.Count => array[index],
                _ => null,
            };
            if (node is null)
            {
                return null;
            }
        }

        return node;
    }

    /// <summary>Replaces the existing value at the steps.</summary>
    public static void Replace(JsonNode root, IReadOnlyList<object> steps, JsonNode value)
    {
        var parent = Find(root, steps.Take(steps.Count - 1).ToList()) ?? root;
        switch (steps[^1])
        {
            case string key:
                parent[key] = value;
                break;
            case int index:
                parent[index] = value;
                break;
        }
    }

    [GeneratedRegex(@"^\$(\.[A-Za-z_$][A-Za-z0-9_$]*|\[\d+\])+$")]
    private static partial Regex WholePath();

    [GeneratedRegex(@"\.([A-Za-z_$][A-Za-z0-9_$]*)|\[(\d+)\]")]
    private static partial Regex Step();
}
