using System.Text;
using System.Text.Json;

namespace Layers.Core.Cases;

/// <summary>
/// Where each JSON path of a document starts, as 1-based line and column (in characters, as editors count them),
/// so that every error can point at the text: a member at its key, an array item at its value.
/// </summary>
internal sealed class JsonPositions
{
    private readonly Dictionary<string, (long Line, long Column)> _positions = new(StringComparer.Ordinal);

    private JsonPositions()
    {
    }

    /// <summary>Indexes a document that has already parsed without error.</summary>
    public static JsonPositions Of(string json)
    {
        var index = new JsonPositions();
        var bytes = Encoding.UTF8.GetBytes(json);
        var lineStarts = LineStarts(bytes);
        var reader = new Utf8JsonReader(bytes, new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip });
        var containers = new Stack<(string Path, int NextIndex, bool IsArray)>();
        string? pendingProperty = null;
        while (reader.Read())
        {
            var (parentPath, nextIndex, parentIsArray) = containers.Count > 0 ? containers.Peek() : ("$", 0, false);
            switch (reader.TokenType)
            {
                case JsonTokenType.PropertyName:
                    pendingProperty = $"{parentPath}.{reader.GetString()}";
                    index.Record(pendingProperty, reader.TokenStartIndex, bytes, lineStarts);
                    continue;
                case JsonTokenType.EndObject or JsonTokenType.EndArray:
                    containers.Pop();
                    continue;
            }

            var path = parentIsArray ? $"{parentPath}[{nextIndex}]" : pendingProperty ?? "$";
            if (parentIsArray)
            {
                containers.Pop();
                containers.Push((parentPath, nextIndex + 1, true));
                index.Record(path, reader.TokenStartIndex, bytes, lineStarts);
            }
            else if (pendingProperty is null)
            {
                index.Record(path, reader.TokenStartIndex, bytes, lineStarts);
            }

            pendingProperty = null;
            if (reader.TokenType is JsonTokenType.StartObject or JsonTokenType.StartArray)
            {
                containers.Push((path, 0, reader.TokenType == JsonTokenType.StartArray));
            }
        }

        return index;
    }

    /// <summary>The position of a path, or of its nearest ancestor present in the document (for a missing key).</summary>
    public (long Line, long Column)? Find(string path)
    {
        for (var current = path; current.Length > 0; current = Parent(current))
        {
            if (_positions.TryGetValue(current, out var position))
            {
                return position;
            }
        }

        return null;
    }

    private static string Parent(string path)
    {
        var cut = Math.Max(path.LastIndexOf('.'), path.LastIndexOf('['));
        return cut > 0 ? path[..cut] : string.Empty;
    }

    private static List<int> LineStarts(byte[] bytes)
    {
        var starts = new List<int> { 0 };
        for (var i = 0; i < bytes.Length; i++)
        {
            if (bytes[i] == (byte)'\n')
            {
                starts.Add(i + 1);
            }
        }

        return starts;
    }

    private void Record(string path, long byteOffset, byte[] bytes, List<int> lineStarts)
    {
        if (_positions.ContainsKey(path))
        {
            return;
        }

        var line = lineStarts.BinarySearch((int)byteOffset);
        line = line >= 0 ? line : ~line - 1;
        var column = Encoding.UTF8.GetCharCount(bytes, lineStarts[line], (int)byteOffset - lineStarts[line]) + 1;
        _positions[path] = (line + 1, column);
    }
}
