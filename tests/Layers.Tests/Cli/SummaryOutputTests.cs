using System.Text.Json;
using Layers.Cli;
using Layers.Core.Reports;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Cli;

/// <summary>The files <c>layers run</c> writes for the demo case: their documented keys and headers.</summary>
public sealed class SummaryOutputTests : IClassFixture<SummaryOutputTests.DemoRun>
{
    private readonly DemoRun _run;

    public SummaryOutputTests(DemoRun run) => _run = run;

    [Theory]
    [InlineData("tool")]
    [InlineData("case")]
    [InlineData("caution")]
    [InlineData("reportTimesSeconds")]
    [InlineData("layers")]
    [InlineData("faces")]
    [InlineData("massBalance")]
    [InlineData("finalState")]
    [InlineData("permeation")]
    [InlineData("solver")]
    public void Summary_has_the_documented_top_level_key(string key)
    {
        using var summary = JsonDocument.Parse(_run.Read("summary.json"));

        Assert.True(summary.RootElement.TryGetProperty(key, out _), $"summary.json lacks \"{key}\"");
    }

    [Fact]
    public void Summary_describes_the_demo_case()
    {
        using var summary = JsonDocument.Parse(_run.Read("summary.json"));
        var root = summary.RootElement;

        Assert.Equal("layers", root.GetProperty("tool").GetProperty("name").GetString());
        Assert.Equal("laminate-fatty-food.json", root.GetProperty("case").GetProperty("file").GetString());
        // The demo lasts 10 d = 864000 s (SI Brochure 9th ed., Table 8) and reports at 2 h, 1 d, 3 d, 10 d.
        Assert.Equal(864000, root.GetProperty("case").GetProperty("durationSeconds").GetDouble(), 6);
        Assert.Equal(
            [7200.0, 86400, 259200, 864000],
            root.GetProperty("reportTimesSeconds").EnumerateArray().Select(time => time.GetDouble()));
        Assert.Equal(CautionText.Paragraph, root.GetProperty("caution").GetString());
        Assert.Equal(
            ["print layer", "adhesive", "sealant"],
            root.GetProperty("layers").EnumerateArray().Select(layer => layer.GetProperty("name").GetString()));
    }

    [Fact]
    public void Mass_balance_of_the_demo_holds_to_1e_9()
    {
        // Common practice, no source: a conservative finite-volume scheme keeps the total mass to round-off.
        using var summary = JsonDocument.Parse(_run.Read("summary.json"));

        var worst = summary.RootElement.GetProperty("massBalance").GetProperty("worstRelativeError").GetDouble();

        Assert.True(Math.Abs(worst) < 1e-9, $"worst relative mass balance error {worst:G3}");
    }

    [Fact]
    public void Every_timeseries_column_header_carries_a_unit_in_square_brackets()
    {
        var header = FirstLine(_run.Read("timeseries.csv"));

        var columns = header.Split(',');
        Assert.Equal("time [s]", columns[0]);
        Assert.All(columns, column => Assert.Matches(@"\[[^\[\]]+\]$", column));
    }

    [Fact]
    public void Profiles_header_carries_units_in_square_brackets_for_time_position_and_concentration()
    {
        var header = FirstLine(_run.Read("profiles.csv"));

        Assert.Equal(["time [s]", "layer", "position [m]", "concentration [kg/m3]"], header.Split(','));
    }

    [Fact]
    public void Every_row_of_the_csv_files_has_as_many_fields_as_the_header()
    {
        foreach (var file in new[] { "timeseries.csv", "profiles.csv" })
        {
            var lines = _run.Read(file).Split('\n', StringSplitOptions.RemoveEmptyEntries);
            Assert.True(lines.Length > 1, $"{file} has no data rows");
            // No name in the demo contains a comma, so a plain split counts the fields.
            var width = lines[0].Split(',').Length;
            Assert.All(lines, line => Assert.Equal(width, line.Split(',').Length));
        }
    }

    private static string FirstLine(string text) => text[..text.IndexOf('\n', StringComparison.Ordinal)];

    /// <summary>Runs the demo once for the whole class.</summary>
    public sealed class DemoRun : IDisposable
    {
        private readonly TempFolder _temp = new();

        public DemoRun()
        {
            var outcome = CliRun.Invoke("run", RepoRoot.File("cases", "laminate-fatty-food.json"), "--out", _temp.Path);
            if (outcome.ExitCode != ExitCodes.Success)
            {
                throw new InvalidOperationException($"the demo run failed with exit code {outcome.ExitCode}: {outcome.Error}");
            }

            Folder = Path.Combine(_temp.Path, "laminate-fatty-food");
        }

        public string Folder { get; }

        public string Read(string name) => File.ReadAllText(Path.Combine(Folder, name));

        public void Dispose() => _temp.Dispose();
    }
}
