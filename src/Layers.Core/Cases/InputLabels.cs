using System.Text;
using System.Text.Json.Nodes;

namespace Layers.Core.Cases;

/// <summary>
/// The words a practitioner reads for a value of the case that a sweep, design, uncertainty study or fit varies:
/// "membrane thickness" for <c>$.layers[0].thickness</c>, "receiver volume" for <c>$.right.volume</c>, "storage
/// temperature" for <c>$.foodContact.stages[1].temperature</c>. The owner of the value is named by its own name in
/// the case (a layer's, a face's, a stage's), or by its place when the case gives none ("layer 2", "right medium");
/// the quantity by the words of its key. JSON paths stay the keys of JSON and CSV files; these words are for tables,
/// plot axes and legends only.
/// </summary>
public static class InputLabels
{
    /// <summary>The label of the value at <paramref name="path"/>; the owners' names are read from <paramref name="root"/> when given.</summary>
    /// <param name="root">The whole case document, or null when only the path is known (a summary file read back).</param>
    /// <param name="path">A JSON path such as <c>$.layers[0].thickness</c>.</param>
    public static string Of(JsonObject? root, string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        return JsonPathSteps.Parse(path) is { } steps ? Of(root, steps) : Trimmed(path);
    }

    /// <summary>The label of the value at the parsed steps of a path.</summary>
    internal static string Of(JsonObject? root, IReadOnlyList<object> steps)
    {
        if ((ByLayerName(root, steps) ?? ByRenewal(root, steps)) is { } named)
        {
            return named;
        }

        // The owner is the innermost object on the path that people know by a name; the words are those of the
        // steps after it (usually one key, "thickness"), with an index read as a position ("report times 2").
        var owner = string.Empty;
        var wordsFrom = 0;
        JsonNode? node = root;
        for (var i = 0; i < steps.Count; i++)
        {
            node = node is null ? null : JsonPathSteps.Find(node, [steps[i]]);
            if (OwnerName(steps, i, node) is { } name)
            {
                owner = name;
                wordsFrom = i + 1;
            }
        }

        var words = string.Join(" ", steps.Skip(wordsFrom).Select(step => step is int index ? (index + 1).ToString(System.Globalization.CultureInfo.InvariantCulture) : Words(step.ToString()!)));
        return owner.Length == 0 ? words : words.Length == 0 ? owner : $"{owner} {words}";
    }

    /// <summary>
    /// The food-contact settings keyed by a layer's name: <c>$.foodContact.layerDiffusion.sealant.activationEnergy</c>
    /// is "sealant activation energy", <c>$.foodContact.stages[1].diffusionCoefficients.sealant</c> is "sealant
    /// diffusion coefficient in storage"; null for other paths.
    /// </summary>
    private static string? ByLayerName(JsonObject? root, IReadOnlyList<object> steps) => steps switch
    {
        ["foodContact", "layerDiffusion", string layer, string key] => $"{layer} {Words(key)}",
        ["foodContact", "stages", int stage, "diffusionCoefficients" or "partitionCoefficients", string layer] =>
            $"{layer} {Words((string)steps[3])[..^1]} in {Of(root, ["foodContact", "stages", stage])}",
        _ => null,
    };

    /// <summary>
    /// A property of the fresh portion a schedule's renewal brings, named by its medium and its period:
    /// <c>$.schedule[1].renew[0].volume</c> is "simulant volume at refill"; null for other paths.
    /// </summary>
    private static string? ByRenewal(JsonObject? root, IReadOnlyList<object> steps)
    {
        var at = steps.Count switch
        {
            5 when steps is ["schedule", int, "renew", int, string] => 2,
            7 when steps is ["schedule", int, "periods", int, "renew", int, string] => 4,
            _ => -1,
        };
        if (at < 0)
        {
            return null;
        }

        var renewal = root is null ? null : JsonPathSteps.Find(root, [.. steps.Take(at + 2)]);
        var side = renewal is JsonObject entry && entry["face"] is JsonValue face && face.TryGetValue<string>(out var text) ? text : null;
        var medium = side is "left" or "right" ? Of(root, [side]) : "fresh portion";
        return $"{medium} {Words((string)steps[^1])} at {Of(root, [.. steps.Take(at)])}";
    }

    /// <summary>The name of the object reached by step <paramref name="i"/> when people know it by one, else null.</summary>
    private static string? OwnerName(IReadOnlyList<object> steps, int i, JsonNode? node)
    {
        var own = node is JsonObject value && value["name"] is JsonValue named && named.TryGetValue<string>(out var text) && text.Trim().Length > 0
            ? text.Trim()
            : null;
        return (i, steps[i]) switch
        {
            // $.layers[i]: a layer's name is required, its place stands in when the document is not at hand.
            (1, int index) when steps[0] is "layers" => own ?? $"layer {index + 1}",
            (0, "left" or "right") => own ?? $"{steps[0]} medium",
            (2, int index) when steps[0] is "foodContact" && steps[1] is "stages" => own ?? $"stage {index + 1}",
            (1, int index) when steps[0] is "schedule" => own ?? $"period {index + 1}",
            (3, int index) when steps[0] is "schedule" && steps[2] is "periods" => own ?? $"period {index + 1}",
            (0, "referenceMedium") => own ?? "reference medium",
            _ => null,
        };
    }

    /// <summary>A camelCase key in words: <c>diffusionCoefficient</c> → "diffusion coefficient".</summary>
    internal static string Words(string key)
    {
        var words = new StringBuilder();
        foreach (var letter in key)
        {
            if (char.IsUpper(letter) && words.Length > 0)
            {
                words.Append(' ');
            }

            words.Append(char.ToLowerInvariant(letter));
        }

        return words.ToString();
    }

    private static string Trimmed(string path) => path.StartsWith("$.", StringComparison.Ordinal) ? path[2..] : path;
}
