using System.Text.Json;
using Layers.Cli;
using Layers.Core.Batch;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>docs/outputs.md says how the keys of summary.json's cases relate to the columns of summary.csv; that must hold.</summary>
public sealed class SummaryJsonKeysTests
{
    [Fact]
    public void Every_summary_csv_column_is_a_summary_json_key_except_those_the_docs_map_to_other_keys()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "one.json"), CaseJson.Minimal);
        temp.WriteFile(Path.Combine("in", "two.json"), CaseJson.Minimal);
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "-q").ExitCode);
        var columns = File.ReadLines(temp.Combine("out", "summary.csv")).First().Split(',');
        using var json = JsonDocument.Parse(File.ReadAllText(temp.Combine("out", "summary.json")));
        var entry = json.RootElement.GetProperty("cases")[0];
        var keys = entry.EnumerateObject().Select(member => member.Name)
            .Concat(entry.GetProperty("results").EnumerateObject().Select(member => member.Name))
            .ToHashSet(StringComparer.Ordinal);

        var missing = columns.Where(column => !keys.Contains(column)).ToList();

        // limitVerdict is the "exceeded" member of the limit object in summary.json, as the docs' limit row says; the
        // trade-unit columns are the SI keys in other units, as the docs' trade-unit paragraph says.
        Assert.Equal(["case", "limitVerdict", .. BatchColumns.TradeUnitColumns.Select(column => column.Name)], missing);
        Assert.Contains("name", keys);
        var docs = File.ReadAllText(RepoRoot.File("docs", "outputs.md")).ReplaceLineEndings(" ");
        Assert.Contains("except that the case name is under `name` rather than `case`", docs, StringComparison.Ordinal);
        Assert.Contains("`{ quantity, limit, value, exceeded }`", docs, StringComparison.Ordinal);
        Assert.Contains("summary.json holds only their SI columns", docs, StringComparison.Ordinal);
    }

    [Fact]
    public void Each_case_of_a_batch_carries_its_accuracy_status_as_its_own_summary_json_gives_it()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "one.json"), CaseJson.Minimal);
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "-q").ExitCode);
        using var batch = JsonDocument.Parse(File.ReadAllText(temp.Combine("out", "summary.json")));
        using var single = JsonDocument.Parse(File.ReadAllText(temp.Combine("out", "one", "summary.json")));
        var results = batch.RootElement.GetProperty("cases")[0].GetProperty("results");
        var error = single.RootElement.GetProperty("numericalError");

        Assert.Equal(error.GetProperty("worstRelativeError").GetDouble(), results.GetProperty("worstEstimatedError").GetDouble());
        var above = error.GetProperty("figures").EnumerateArray().Count(figure => figure.GetProperty("withinAccuracy").ValueKind == JsonValueKind.False);
        Assert.Equal(above, results.GetProperty("figuresAboveAccuracy").GetInt32());
    }
}
