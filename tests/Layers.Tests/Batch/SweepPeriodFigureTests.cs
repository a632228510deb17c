using Layers.Core.Batch;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Plotting;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// A sweep that plots a figure of one period of a schedule (docs/case-format.md, "Sweeps"): each sub-case's row holds
/// that figure, equal to what the sub-case's own run gives for the period (the same solve, read the same way), it comes
/// back from summary.json for a merge, and the sweep plot draws it; mistakes are reported at their paths.
/// </summary>
public sealed class SweepPeriodFigureTests
{
    // Invented: a sheet releasing into a medium renewed daily, swept over its thickness.
    private const string Sweep = """
        {
          "layers": [ { "name": "sheet", "thickness": "100 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "400 mg/L" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "medium", "volume": "0.5 mL", "area": "1 cm2" },
          "schedule": [ { "name": "day", "duration": "1 d", "renew": ["right"], "repeat": 3 } ],
          "sweep": {
            "parameters": [ { "path": "$.layers[0].thickness", "values": ["50 um", "100 um"] } ],
            "result": RESULT
          }
        }
        """;

    [Fact]
    public void Each_row_holds_its_sub_case_s_figure_which_summary_json_keeps_and_the_plot_draws()
    {
        using var temp = new TempFolder();
        var file = temp.Combine("film.json");
        File.WriteAllText(file, Sweep.Replace("RESULT", """{ "name": "rightPeriodReceived", "period": "day 2 of 3" }""", StringComparison.Ordinal));
        var collection = BatchCollector.Collect([file], recursive: false);
        var sweep = Assert.Single(collection.Sweeps);
        Assert.Equal("day 2 of 3", sweep.ResultPeriod);

        var rows = BatchRunner.Run(collection.Items, new BatchRunOptions(temp.Combine("out"), Jobs: 1), (_, _) => new Dictionary<string, byte[]>(), null, CancellationToken.None);

        foreach (var (item, row) in collection.Items.Zip(rows.OrderBy(row => row.Name, StringComparer.Ordinal)))
        {
            var alone = Simulator.Run(CaseReader.ReadText(item.Json!, file).Case!);
            var expected = alone.Schedule!.Periods.Single(period => period.Period.Label == "day 2 of 3").Media.Single().ReceivedKgPerSquareMeter;
            Tolerance.Relative(expected, row.PeriodFigure!.ValueSi!.Value, 1e-12, $"{row.Name}: received in day 2 of 3");
        }

        var back = BatchSummaryJson.Read(BatchSummaryJson.Write(rows));
        Assert.Equal(rows.Select(row => (row.PeriodFigure!.Measure.Name, row.PeriodFigure.Measure.Period, row.PeriodFigure.ValueSi)),
            back.Select(row => (row.PeriodFigure!.Measure.Name, row.PeriodFigure.Measure.Period, row.PeriodFigure.ValueSi)));

        var model = SweepPlot.Create(sweep, back, new PlotOptions())!;
        var points = model.Series.OfType<OxyPlot.Series.LineSeries>().First().Points;
        Assert.Equal(2, points.Count);
        Assert.Contains("'day 2 of 3'", model.Title, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("""{ "name": "rightPeriodReceived", "period": "day 9 of 3" }""", "$.sweep.result.period: no period is labelled 'day 9 of 3' in the first sub-case; the last is 'day 3 of 3'")]
    [InlineData("""{ "name": "lagTime" }""", "$.sweep.result.name: must be a figure of one period")]
    [InlineData("""{ "name": "rightPeriodReceived", "at": "1 d" }""", "$.sweep.result.at: unknown key; expected one of name, period")]
    [InlineData("""{ "name": "rightPeriodReceived", "period": 2 }""", "$.sweep.result.period: expected the label of a period")]
    public void A_mistake_in_the_swept_figure_is_reported_at_its_path(string result, string expected)
    {
        var expansion = SweepExpander.Expand(Sweep.Replace("RESULT", result, StringComparison.Ordinal), "film.json");

        Assert.Contains(expansion.Errors, error => $"{error.JsonPath}: {error.Message}".StartsWith(expected, StringComparison.Ordinal));
    }

    [Fact]
    public void A_figure_of_one_period_needs_a_schedule()
    {
        var json = Sweep.Replace("RESULT", "\"rightPeriodLowestFlux\"", StringComparison.Ordinal)
            .Replace("""  "schedule": [ { "name": "day", "duration": "1 d", "renew": ["right"], "repeat": 3 } ],""", """  "duration": "3 d",""", StringComparison.Ordinal);

        var expansion = SweepExpander.Expand(json, "film.json");

        Assert.Contains(expansion.Errors, error => $"{error.JsonPath}: {error.Message}" == "$.sweep.result: rightPeriodLowestFlux needs $.schedule");
    }
}
