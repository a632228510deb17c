using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using Layers.Core.Cases;
using Layers.Core.Studies;

namespace Layers.Tests.TestSupport;

/// <summary>
/// Case documents for reader tests: a small valid case, and edits addressed by the same JSON paths the reader
/// uses in its messages (<c>$.layers[0].thickness</c>), so a test can break one key and expect an error there.
/// </summary>
internal static partial class CaseJson
{
    /// <summary>Invented: one film between a closed face and a juice compartment. Valid.</summary>
    public const string Minimal = """
        {
          "layers": [
            { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" }
          ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "volume": "1 L", "area": "6 dm2" },
          "duration": "10 d"
        }
        """;

    /// <summary>
    /// <paramref name="json"/> with each edit applied: the raw JSON value is set at the path (created when the
    /// last step is missing, appended when it is the next array index); a null value removes the key.
    /// </summary>
    public static string With(string json, params (string Path, string? Value)[] edits)
    {
        var root = JsonNode.Parse(json)!;
        foreach (var (path, value) in edits)
        {
            Set(root, path, value is null ? null : JsonNode.Parse(value));
        }

        return root.ToJsonString(new JsonSerializerOptions { WriteIndented = true });
    }

    /// <summary>The minimal case with edits applied.</summary>
    public static string MinimalWith(params (string Path, string? Value)[] edits) => With(Minimal, edits);

    /// <summary>Reads a document as the file <c>case.json</c>.</summary>
    public static CaseReadResult Read(string json, string fileName = "case.json") => CaseDocument.ReadText(json, fileName);

    /// <summary>The errors as "path: message" lines.</summary>
    public static IReadOnlyList<string> ErrorLines(CaseReadResult result) =>
        result.Errors.Select(error => $"{error.JsonPath}: {error.Message}").ToList();

    private static void Set(JsonNode root, string path, JsonNode? value)
    {
        var steps = Steps(path);
        var node = root;
        for (var i = 0; i < steps.Count - 1; i++)
        {
            node = steps[i] switch
            {
                string key => node[key] ??= new JsonObject(),
                int index => node.AsArray()[index]!,
                _ => throw new InvalidOperationException(path),
            };
        }

        switch (steps[^1])
        {
            case string key when value is null:
                node.AsObject().Remove(key);
                break;
            case string key:
                node[key] = value;
                break;
            case int index when index == node.AsArray().Count:
                node.AsArray().Add(value);
                break;
            case int index when value is null:
                node.AsArray().RemoveAt(index);
                break;
            case int index:
                node[index] = value;
                break;
        }
    }

    private static List<object> Steps(string path)
    {
        if (!path.StartsWith('$'))
        {
            throw new ArgumentException($"A path starts with '$': {path}", nameof(path));
        }

        var steps = new List<object>();
        foreach (Match match in StepPattern().Matches(path[1..]))
        {
            steps.Add(match.Groups[1].Success
                ? match.Groups[1].Value
                : int.Parse(match.Groups[2].Value, CultureInfo.InvariantCulture));
        }

        return steps;
    }

    [GeneratedRegex(@"\.([^.\[]+)|\[(\d+)\]")]
    private static partial Regex StepPattern();
}
