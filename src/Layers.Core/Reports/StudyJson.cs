using System.Text.Json;

namespace Layers.Core.Reports;

/// <summary>Pieces shared by the study files (design.json, uncertainty.json).</summary>
internal static class StudyJson
{
    /// <summary>An indented JSON object that starts with the tool and the case file, then the body; with a final newline.</summary>
    public static string Write(string caseFile, Action<Utf8JsonWriter> body)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            json.WriteStartObject();
            Header(json, caseFile);
            body(json);
            json.WriteEndObject();
        }

        return System.Text.Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    /// <summary>The tool and case file.</summary>
    private static void Header(Utf8JsonWriter json, string caseFile)
    {
        json.WriteStartObject("tool");
        json.WriteString("name", ToolInfo.Name);
        json.WriteString("version", ToolInfo.Version);
        json.WriteEndObject();
        json.WriteString("caseFile", Path.GetFileName(caseFile));
    }

    /// <summary>A number, or null when missing or not finite (JSON has no infinity).</summary>
    public static void Number(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } number && double.IsFinite(number))
        {
            json.WriteNumber(name, number);
        }
        else
        {
            json.WriteNull(name);
        }
    }

    /// <summary>An array of numbers, non-finite ones as null; unnamed (an element of an array) when the name is null.</summary>
    public static void Numbers(Utf8JsonWriter json, string? name, IEnumerable<double> values)
    {
        if (name is null)
        {
            json.WriteStartArray();
        }
        else
        {
            json.WriteStartArray(name);
        }

        foreach (var value in values)
        {
            if (double.IsFinite(value))
            {
                json.WriteNumberValue(value);
            }
            else
            {
                json.WriteNullValue();
            }
        }

        json.WriteEndArray();
    }
}
