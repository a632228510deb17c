using System.Globalization;
using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// Names chosen by a user end up in files other people open: text cells of the CSV files must not start with a
/// character that makes a spreadsheet evaluate a formula (= + - @, tab, carriage return: OWASP, CSV Injection), and
/// summary.md must show a file name as text, not as HTML or a link. Numbers stay numbers.
/// </summary>
public sealed class SpreadsheetSafetyTests
{
    private static readonly string LayerNamedLikeAFormula = CaseJson.With(
        CaseJson.Minimal,
        ("$.layers[0].name", "\"=HYPERLINK(\\\"http://x\\\",\\\"y\\\")\""),
        ("$.layers[1]", """{ "name": "-core", "thickness": "20 um", "diffusionCoefficient": "1e-9 cm2/s" }"""),
        ("$.right.name", "\"@juice\""));

    [Fact]
    public void Case_names_that_start_like_a_formula_get_an_apostrophe_in_summary_csv_and_timing_csv()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "=1+2.json"), CaseJson.Minimal);
        temp.WriteFile(Path.Combine("in", "+cmd.json"), CaseJson.Minimal);
        temp.WriteFile(Path.Combine("in", "plain.json"), CaseJson.Minimal);

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "--jobs", "1");

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal(["'+cmd", "'=1+2", "plain"], rows.Select(row => row["case"]));
        var timing = File.ReadAllLines(temp.Combine("out", "timing.csv")).Skip(1).Select(line => line[..line.IndexOf(',', StringComparison.Ordinal)]);
        Assert.Equal(["'+cmd", "'=1+2", "plain"], timing);
        // The numbers are still numbers: every filled numeric cell reads as one, with no apostrophe.
        foreach (var row in rows)
        {
            foreach (var column in new[] { "rightReceivedKgPerSquareMeter", "timeTo90PercentSeconds", "worstMassBalanceError" })
            {
                Assert.True(double.TryParse(row[column], NumberStyles.Float, CultureInfo.InvariantCulture, out _), $"{column} = '{row[column]}'");
            }
        }
    }

    [Fact]
    public void Merge_reads_the_solve_times_of_cases_whose_names_start_like_a_formula()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "=1+2.json"), CaseJson.Minimal);
        temp.WriteFile(Path.Combine("in", "plain.json"), CaseJson.Minimal);
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("shard"), "--no-plots", "-q").ExitCode);

        var outcome = CliRun.Invoke("merge", temp.Combine("shard"), "--out", temp.Combine("merged"), "--no-plots", "-q");

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        var timing = File.ReadAllLines(temp.Combine("merged", "timing.csv"));
        Assert.Matches(@"^'=1\+2,\d+\.\d{3}$", timing[1]);
    }

    [Fact]
    public void Layer_and_medium_names_that_start_like_a_formula_get_an_apostrophe_in_timeseries_and_profiles()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("named.json", LayerNamedLikeAFormula);

        var outcome = CliRun.Invoke("run", file, "--out", temp.Combine("out"), "--no-plots", "-q");

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
        var series = File.ReadAllLines(temp.Combine("out", "named", "timeseries.csv"));
        Assert.Contains("'@juice: transferred into medium [kg/m2]", series[0], StringComparison.Ordinal);
        Assert.Contains("\"'=HYPERLINK(\"\"http://x\"\",\"\"y\"\"): mass [kg/m2]\"", series[0], StringComparison.Ordinal);
        Assert.Contains(",'-core: mass [kg/m2],", series[0], StringComparison.Ordinal);
        // Every data cell is a plain number (negative mass balance errors included) or empty (a value not applicable,
        // such as the fraction of the final state of this unloaded stack, which starts at it), never text.
        Assert.All(series.Skip(1).SelectMany(line => line.Split(',')), cell =>
            Assert.True(cell.Length == 0 || double.TryParse(cell, NumberStyles.Float, CultureInfo.InvariantCulture, out _), cell));
        var profiles = File.ReadAllLines(temp.Combine("out", "named", "profiles.csv")).Skip(1).ToList();
        Assert.Contains(profiles, line => line.Contains(",'-core,", StringComparison.Ordinal));
        Assert.DoesNotContain(profiles, line => line.Contains(",-core,", StringComparison.Ordinal));
    }

    [Fact]
    public void A_file_name_holding_html_shows_as_text_in_summary_md()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "<img src=x onerror=alert(1)>.json"), CaseJson.Minimal);
        temp.WriteFile(Path.Combine("in", "[link](http:x).json"), CaseJson.Minimal);

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "-q");

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
        var markdown = File.ReadAllText(temp.Combine("out", "summary.md"));
        Assert.DoesNotContain("<img", markdown, StringComparison.Ordinal);
        Assert.Contains("&lt;img src=x onerror=alert\\(1\\)&gt;", markdown, StringComparison.Ordinal);
        Assert.DoesNotContain("[link](", markdown, StringComparison.Ordinal);
        Assert.Contains("\\[link\\]\\(http:x\\)", markdown, StringComparison.Ordinal);
    }
}
