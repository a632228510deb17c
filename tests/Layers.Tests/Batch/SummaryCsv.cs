namespace Layers.Tests.Batch;

/// <summary>Reads summary.csv into rows keyed by column name (RFC 4180 quoting, as the file uses).</summary>
internal static class SummaryCsv
{
    public static IReadOnlyList<IReadOnlyDictionary<string, string>> Read(string path)
    {
        var lines = File.ReadAllLines(path);
        var headers = Fields(lines[0]);
        return lines.Skip(1).Select(line =>
        {
            var fields = Fields(line);
            return (IReadOnlyDictionary<string, string>)headers.Select((header, i) => (header, value: fields[i])).ToDictionary(pair => pair.header, pair => pair.value);
        }).ToList();
    }

    private static List<string> Fields(string line)
    {
        var fields = new List<string>();
        var current = new System.Text.StringBuilder();
        var quoted = false;
        for (var i = 0; i < line.Length; i++)
        {
            var c = line[i];
            if (quoted && c == '"' && i + 1 < line.Length && line[i + 1] == '"')
            {
                current.Append('"');
                i++;
            }
            else if (c == '"')
            {
                quoted = !quoted;
            }
            else if (c == ',' && !quoted)
            {
                fields.Add(current.ToString());
                current.Clear();
            }
            else
            {
                current.Append(c);
            }
        }

        fields.Add(current.ToString());
        return fields;
    }
}
