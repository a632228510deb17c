using System.Text.Json;
using System.Text.Json.Nodes;
using Layers.Core.Cases;

namespace Layers.Core.Batch;

/// <summary>
/// The inputs that differ between the plain case files of a batch: the question a folder of variants asks. Every
/// value a document writes (a JSON leaf; a list of plain values counts as one, shown as text in brackets) is compared across the
/// documents, and each path that every document writes, with a text that differs between two of them, becomes an
/// input of every document, labelled for people by the layer or medium it belongs to ("sealant thickness").
/// Documentation members ($schema, title, description) are not inputs. Variants of one case differ in a few values
/// and keep the names and kinds of their layers and media; cases that differ in a <c>name</c> or a <c>kind</c>, or
/// in more than <see cref="MaximumInputs"/> values, are not variants of one another and get no inputs listed (a
/// folder of unrelated cases would otherwise get a column for nearly every value it holds).
/// </summary>
public static class VariedInputs
{
    /// <summary>The most inputs that may differ between cases still taken as variants of one case.</summary>
    public const int MaximumInputs = 12;

    private static readonly HashSet<string> NotInputs = new(["$schema", "title", "description"], StringComparer.Ordinal);

    /// <summary>For each document, in the same order, its varied inputs in document order; empty for a null document.</summary>
    /// <param name="documents">The case documents; null for one that could not be read.</param>
    public static IReadOnlyList<IReadOnlyList<SweepValue>> Of(IReadOnlyList<string?> documents)
    {
        ArgumentNullException.ThrowIfNull(documents);
        var roots = documents.Select(Parse).ToList();
        var leaves = roots.Select(root => root is null ? null : Leaves(root)).ToList();
        var read = leaves.OfType<Dictionary<string, Leaf>>().ToList();
        if (read.Count < 2)
        {
            return documents.Select(_ => (IReadOnlyList<SweepValue>)[]).ToList();
        }

        // Paths in the order of the first document, so the columns follow the case's own order.
        var paths = read[0].Keys
            .Where(path => read.All(leaf => leaf.ContainsKey(path)) && read.Select(leaf => leaf[path].Text).Distinct(StringComparer.Ordinal).Skip(1).Any())
            .ToList();
        if (paths.Count > MaximumInputs || paths.Any(path => path.EndsWith(".name", StringComparison.Ordinal) || path.EndsWith(".kind", StringComparison.Ordinal)))
        {
            paths.Clear();
        }

        var labels = Labels(paths, roots.OfType<JsonObject>().FirstOrDefault());
        return leaves.Select(leaf => leaf is null ? (IReadOnlyList<SweepValue>)[] : paths.Select(path => Value(path, leaf[path], labels[path])).ToList()).ToList();
    }

    private static SweepValue Value(string path, Leaf leaf, string label) => SweepValues.Of(path, leaf.Text) with { Label = label };

    /// <summary>
    /// The people label of each path (<see cref="InputLabels"/>, "sealant thickness"), read from the first document:
    /// variants name their layers and media alike, as cases whose names differ get no inputs. Two paths that would share
    /// a label keep their paths.
    /// </summary>
    private static Dictionary<string, string> Labels(IReadOnlyList<string> paths, JsonObject? first)
    {
        var labels = paths.ToDictionary(path => path, path => InputLabels.Of(first, path), StringComparer.Ordinal);
        foreach (var group in labels.GroupBy(pair => pair.Value, StringComparer.Ordinal).Where(group => group.Count() > 1).ToList())
        {
            foreach (var (path, _) in group)
            {
                labels[path] = path.StartsWith("$.", StringComparison.Ordinal) ? path[2..] : path;
            }
        }

        return labels;
    }

    private static JsonNode? Parse(string? document)
    {
        if (document is null)
        {
            return null;
        }

        try
        {
            return JsonNode.Parse(document) as JsonObject;
        }
        catch (JsonException)
        {
            return null;
        }
    }

    /// <summary>
    /// A value as written; a list of plain values is one value, "[2 h, 1 d]", whose brackets keep it text (no number
    /// with a unit), in the summaries and when <c>layers merge</c> reads it back.
    /// </summary>
    private sealed record Leaf(string Text);

    /// <summary>Every written value by its path ("$.layers[2].thickness"), in document order.</summary>
    private static Dictionary<string, Leaf> Leaves(JsonNode root)
    {
        var leaves = new Dictionary<string, Leaf>(StringComparer.Ordinal);
        Walk(root, "$", leaves);
        return leaves;
    }

    private static void Walk(JsonNode? node, string path, Dictionary<string, Leaf> leaves)
    {
        switch (node)
        {
            case JsonObject members:
                foreach (var (name, value) in members.Where(member => !NotInputs.Contains(member.Key)))
                {
                    Walk(value, $"{path}.{name}", leaves);
                }

                break;
            case JsonArray items when items.All(item => item is null or JsonValue):
                leaves[path] = new Leaf($"[{string.Join(", ", items.Select(Written))}]");
                break;
            case JsonArray items:
                for (var i = 0; i < items.Count; i++)
                {
                    Walk(items[i], $"{path}[{i}]", leaves);
                }

                break;
            default:
                leaves[path] = new Leaf(Written(node));
                break;
        }
    }

    /// <summary>A plain value as written: a string without its quotes, a number or literal as in the file.</summary>
    private static string Written(JsonNode? node) => node switch
    {
        null => "null",
        JsonValue value when value.TryGetValue<string>(out var text) => text,
        _ => node.ToJsonString(),
    };
}
