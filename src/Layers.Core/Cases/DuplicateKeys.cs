using System.Text.Json;

namespace Layers.Core.Cases;

/// <summary>
/// Finds a key written twice in one object. The JSON parser keeps both, but the editable document model used to
/// expand sweeps refuses them, so a sweep checks for them first and reports the key at its path instead.
/// </summary>
internal static class DuplicateKeys
{
    /// <summary>The path of the first repeated key (document order), or null when there is none.</summary>
    public static string? First(JsonElement element, string path = "$")
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                var seen = new HashSet<string>(StringComparer.Ordinal);
                foreach (var property in element.EnumerateObject())
                {
                    var at = $"{path}.{property.Name}";
                    if (!seen.Add(property.Name))
                    {
                        return at;
                    }

                    if (First(property.Value, at) is { } inner)
                    {
                        return inner;
                    }
                }

                return null;
            case JsonValueKind.Array:
                var index = 0;
                foreach (var item in element.EnumerateArray())
                {
                    if (First(item, FormattableString.Invariant($"{path}[{index++}]")) is { } inner)
                    {
                        return inner;
                    }
                }

                return null;
            default:
                return null;
        }
    }
}
