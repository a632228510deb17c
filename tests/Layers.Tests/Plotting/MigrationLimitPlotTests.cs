using System.Text.Json;
using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Plotting;
using OxyPlot.Annotations;

namespace Layers.Tests.Plotting;

/// <summary>
/// The time the food reaches its specific migration limit is one number: the one the solver locates (and
/// summary.json and the console give), also on transfer.png.
/// </summary>
public sealed class MigrationLimitPlotTests
{
    // Invented: a loaded film straight on the food, limit 0.05 mg/kg, reached within seconds, long before the first
    // output time after t = 0; between output times the amount curve is far from straight (it grows as sqrt(t)).
    private const string Case = """
        {
          "title": "Film straight on the food",
          "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "1000 mg/kg", "density": "0.92 g/cm3" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "food", "mass": "1 kg", "density": "1 kg/L", "area": "6 dm2" },
          "foodContact": { "stages": [ { "name": "storage", "duration": "10 d", "temperature": "40 degC" } ], "specificMigrationLimit": "0.05 mg/kg" }
        }
        """;

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Transfer_plot_gives_the_time_the_limit_is_reached_that_summary_json_gives(bool logarithmicTime)
    {
        var read = CaseDocument.ReadText(Case, "food.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);
        using var summary = JsonDocument.Parse(SummaryJson.Write(result, "food.json"));
        var reached = summary.RootElement.GetProperty("foodContact").GetProperty("limitReachedSeconds").GetDouble();

        var model = TransferPlot.Create(result, new PlotOptions { LogTimeAxis = logarithmicTime });

        // The subtitle states the limit and the summary's time, in the display's own time format.
        var subtitle = model.Subtitle.Replace('\n', ' ');
        Assert.Contains($"food reaches it at {DisplayText.Time(reached, result.Case.Display.Time)}", subtitle, StringComparison.Ordinal);
        Assert.Contains("specific migration limit", subtitle, StringComparison.Ordinal);

        // The crossing is marked where the solver found it, on the limit line, when that time lies on the axis.
        var timeAxis = model.Axes.Single(axis => axis.IsHorizontal());
        var marker = model.Annotations.OfType<PointAnnotation>().SingleOrDefault();
        if (reached * (timeAxis.Maximum / result.Case.DurationSeconds) >= timeAxis.Minimum)
        {
            Assert.NotNull(marker);
            Assert.Equal(reached * (timeAxis.Maximum / result.Case.DurationSeconds), marker.X, 1e-9 * timeAxis.Maximum);
            Assert.Equal(model.Annotations.OfType<LineAnnotation>().Single().Y, marker.Y, 12);
        }
        else
        {
            Assert.Null(marker);
        }
    }
}

/// <summary>
/// An article for repeated use: the food is renewed, so what it received in all no longer reads as its concentration.
/// The limit is then drawn on the food's concentration, in the panel under the amounts, at the limit itself (a mass
/// fraction of food), and the subtitle gives the repeated-use verdict of the run.
/// </summary>
public sealed class RepeatedUseLimitPlotTests
{
    [Fact]
    public void The_limit_sits_on_the_food_concentration_and_each_renewal_drops_to_the_fresh_portion()
    {
        var read = CaseDocument.ReadFile(Layers.Tests.TestSupport.RepoRoot.File("cases", "reusable-container-three-contacts.json"));
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);
        var verdict = result.Schedule!.RepeatedUse!;

        var model = TransferPlot.Create(result, new PlotOptions());

        Assert.Equal(CompartmentConcentrations.Panel, TransferPlot.ConcentrationsShown(result));
        var line = model.Annotations.OfType<LineAnnotation>().Single(annotation => annotation.Type == LineAnnotationType.Horizontal);
        Assert.Equal("concentration", line.YAxisKey);
        Assert.Equal(verdict.LimitKgPerKg!.Value * 1e6, line.Y, 9);
        var subtitle = model.Subtitle.Replace('\n', ' ');
        Assert.Contains($"contact {verdict.JudgedContact} is judged: {(verdict.LimitExceeded ? "above" : "within")} the limit", subtitle, StringComparison.Ordinal);

        // At each renewal the curve drops straight down to the fresh portion (free of the substance here).
        var food = model.Series.OfType<OxyPlot.Series.LineSeries>().Single(series => series.YAxisKey == "concentration");
        foreach (var renewal in result.Case.Schedule!.RenewalTimes(Layers.Core.Domain.Side.Right))
        {
            var at = food.Points.Where(point => Math.Abs(point.X - (renewal / 86400)) <= 1e-9 * renewal).ToList();
            Assert.Equal(2, at.Count);
            Assert.True(at[0].Y > 0);
            Assert.Equal(0, at[1].Y);
        }
    }
}
