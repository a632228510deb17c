using System.Text.Json;
using System.Text.RegularExpressions;
using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Reports;

/// <summary>
/// summary.json and its reference, docs/outputs.md, list the same keys: every key the demos write is documented,
/// and every documented key is written by at least one demo (common practice, no source: a documented file format).
/// </summary>
public sealed partial class SummaryKeysTests
{
    private static readonly string[] Demos =
        [
            "laminate-fatty-food", "patch-on-skin", "diffusion-cell-membrane", "two-liquid-layers", "membrane-time-lag",
            "hot-fill-barrier-shelf-life", "skin-diffusion-cell-sampling", "dispersed-matrix-patch", "reusable-container-three-contacts",
            "daily-patch-week", "donor-concentration-steps",
        ];

    [Fact]
    public void Summary_keys_of_the_demos_and_the_documented_keys_are_the_same_set()
    {
        var written = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var demo in Demos.Where(demo => File.Exists(RepoRoot.File("cases", demo + ".json"))))
        {
            var read = CaseDocument.ReadFile(RepoRoot.File("cases", demo + ".json"));
            var json = SummaryJson.Write(Simulator.Run(read.Case!), demo + ".json");
            using var document = JsonDocument.Parse(json);
            Collect(document.RootElement, string.Empty, written);
        }

        var documented = DocumentedKeys();
        var leaves = documented.Where(key => !documented.Any(other => other.StartsWith(key + ".", StringComparison.Ordinal))).ToHashSet();
        // A null written where an object is documented (permeation in a closed case), or an empty list where its items
        // are (the solves of a run of the exact method), is not an undocumented key.
        var writtenLeaves = written.Where(key => !documented.Any(other =>
            other.StartsWith(key + ".", StringComparison.Ordinal) || other.StartsWith(key + "[].", StringComparison.Ordinal)));

        Assert.Empty(writtenLeaves.Except(leaves));
        Assert.Empty(leaves.Except(written));
    }

    private static SortedSet<string> DocumentedKeys()
    {
        var text = File.ReadAllText(RepoRoot.File("docs", "outputs.md"));
        var table = text[text.IndexOf("## summary.json", StringComparison.Ordinal)..text.IndexOf("## timeseries.csv", StringComparison.Ordinal)];
        var keys = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var line in table.Split('\n').Where(line => line.StartsWith("| `", StringComparison.Ordinal)))
        {
            var firstCell = line.Split('|')[1];
            foreach (Match match in KeyPattern().Matches(firstCell))
            {
                keys.Add(match.Groups[1].Value);
            }
        }

        return keys;
    }

    private static void Collect(JsonElement element, string path, ISet<string> keys)
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object when element.EnumerateObject().Any():
                foreach (var property in element.EnumerateObject())
                {
                    var name = path == "faces" ? "*" : property.Name;
                    Collect(property.Value, path.Length == 0 ? name : $"{path}.{name}", keys);
                }

                break;
            case JsonValueKind.Array when element.GetArrayLength() > 0 && element[0].ValueKind == JsonValueKind.Object:
                foreach (var item in element.EnumerateArray())
                {
                    Collect(item, path + "[]", keys);
                }

                break;
            default:
                keys.Add(path);
                break;
        }
    }

    [GeneratedRegex("`([A-Za-z][A-Za-z0-9.\\[\\]*]*)`")]
    private static partial Regex KeyPattern();
}
