using System.Text;
using System.Text.Json;

namespace Layers.Core.Cases;

/// <summary>
/// Where each JSON path of a document starts, as 1-based line and column (in characters, as editors count them),
/// so that every error can point at the text: a member at its key, an array item at its value.
/// </summary>
internal sealed class JsonPositions
{
    // Byte offsets only: the column is counted when an error asks for it, because counting it for every token costs
    // the length of its line each time, which grows with the square of a one-line file's length.
    private readonly Dictionary<string, int> _offsets = new(StringComparer.Ordinal);
    private readonly byte[] _bytes;
    private readonly List<int> _lineStarts;

    private JsonPositions(byte[] bytes)
    {
        _bytes = bytes;
        _lineStarts = LineStarts(bytes);
    }

    /// <summary>Indexes a document that has already parsed without error.</summary>
    public static JsonPositions Of(string json)
    {
        var bytes = Encoding.UTF8.GetBytes(json);
        var index = new JsonPositions(bytes);
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
                    index.Record(pendingProperty, reader.TokenStartIndex);
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
                index.Record(path, reader.TokenStartIndex);
            }
            else if (pendingProperty is null)
            {
                index.Record(path, reader.TokenStartIndex);
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
            if (_offsets.TryGetValue(current, out var offset))
            {
                var line = _lineStarts.BinarySearch(offset);
                line = line >= 0 ? line : ~line - 1;
                var column = Encoding.UTF8.GetCharCount(_bytes, _lineStarts[line], offset - _lineStarts[line]) + 1;
                return (line + 1, column);
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

    private void Record(string path, long byteOffset) => _offsets.TryAdd(path, (int)byteOffset);
}
