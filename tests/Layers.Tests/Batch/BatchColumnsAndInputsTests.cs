using System.Text.Json;
using Layers.Core.Batch;
using Layers.Core.Cases;
using Layers.Core.Results;
using Layers.Plotting;
using Layers.Tests.TestSupport;
using OxyPlot.Annotations;
using OxyPlot.Axes;

namespace Layers.Tests.Batch;

/// <summary>
/// The structure of the batch summary: the inputs a folder of variants varies, their columns, the diffusion-cell
/// figures a single run reports, the sweep plot's limit line and scale, and the docs that list the columns.
/// </summary>
public sealed class BatchColumnsAndInputsTests
{
    [Fact]
    public void The_inputs_that_differ_between_variants_are_found_and_labelled_by_layer_and_quantity()
    {
        string[] documents =
        [
            CaseJson.With(BatchCases.Membrane, ("$.layers[0].thickness", "\"20 um\""), ("$.title", "\"first\"")),
            CaseJson.With(BatchCases.Membrane, ("$.layers[0].thickness", "\"0.05 mm\""), ("$.duration", "\"3 h\"")),
            CaseJson.With(BatchCases.Membrane, ("$.layers[0].thickness", "\"30 um\"")),
        ];

        var inputs = VariedInputs.Of([.. documents, null]);

        // The title is documentation, not an input; the thickness and the duration differ, in document order.
        Assert.Equal(["$.layers[0].thickness", "$.duration"], inputs[0].Select(value => value.Path));
        Assert.Equal(["membrane thickness", "duration"], inputs[0].Select(value => value.Label));
        Assert.Equal(["20 um", "0.05 mm", "30 um"], inputs.Take(3).Select(row => row[0].Written));
        Assert.Empty(inputs[3]);
        var rows = inputs.Take(3).Select((values, i) => new BatchRow($"c{i}", $"c{i}.json", [], BatchStatus.Succeeded, string.Empty, null) { Inputs = values }).ToList();
        var columns = BatchInputColumns.Of(rows, Layers.Core.Reports.CsvText.Number);
        Assert.Equal(["membrane thickness [um]", "duration [h]"], columns.Select(column => column.Name));
        // 0.05 mm = 50 um (SI prefixes: 1 mm = 1000 um), shown in the column's unit.
        Assert.Equal(["20", "50", "30"], rows.Select(row => columns[0].Cell(row)));
    }

    [Fact]
    public void Cases_that_are_not_variants_of_one_case_get_no_input_columns()
    {
        var other = CaseJson.With(BatchCases.Membrane, ("$.layers[0].name", "\"skin\""), ("$.layers[0].thickness", "\"40 um\""));

        var inputs = VariedInputs.Of([BatchCases.Membrane, other]);

        Assert.All(inputs, values => Assert.Empty(values));
    }

    [Fact]
    public void A_diffusion_cell_in_a_batch_reports_the_steady_flux_and_lag_time_of_its_own_summary()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "cell.json"), File.ReadAllText(RepoRoot.File("cases", "skin-diffusion-cell-sampling.json")));
        temp.WriteFile(Path.Combine("in", "skin-diffusion-cell-measured.csv"), File.ReadAllText(RepoRoot.File("cases", "skin-diffusion-cell-measured.csv")));

        CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots", "-q");

        var row = Assert.Single(SummaryCsv.Read(temp.Combine("out", "summary.csv")));
        using var single = JsonDocument.Parse(File.ReadAllText(temp.Combine("out", "cell", "summary.json")));
        var simulated = single.RootElement.GetProperty("diffusionCell").GetProperty("simulated");
        Assert.True(simulated.GetProperty("steadyLineReached").GetBoolean());
        // summary.csv writes ten significant digits.
        Tolerance.Relative(simulated.GetProperty("steadyFluxKgPerSquareMeterSecond").GetDouble(), double.Parse(row["steadyFluxKgPerSquareMeterSecond"], System.Globalization.CultureInfo.InvariantCulture), 1e-9, "steady flux");
        Tolerance.Relative(simulated.GetProperty("lagTimeSeconds").GetDouble(), double.Parse(row["lagTimeSeconds"], System.Globalization.CultureInfo.InvariantCulture), 1e-9, "lag time");
    }

    [Fact]
    public void A_sweep_of_the_food_concentration_draws_the_limit_and_stops_its_log_axis_a_thousandth_below_it()
    {
        // Values in kg/kg from 1e-6 (1 mg/kg) down to 1e-50, the limit 5e-8 kg/kg = 0.05 mg/kg (1 mg/kg = 1e-6 kg/kg).
        double[] values = [1e-6, 1e-8, 1e-20, 1e-50];
        var rows = values.Select((value, i) => new BatchRow(
            $"s.{i}", "s.json", [SweepValues.Of("$.layers[0].thickness", $"{(i + 1) * 10} um")], BatchStatus.Succeeded, string.Empty,
            new BatchKeyResults("closedEquilibrium", null, null, null, null, null, 0) { FoodConcentrationKgPerKg = value })
        {
            Limit = new LimitCheck(NamedResult.FoodConcentration, 5e-8, value),
        }).ToList();
        var sweep = new SweepGroup("s", "s.json", NamedResult.FoodConcentration, [.. rows.Select(row => row.Name)]);

        var model = SweepPlot.Create(sweep, rows, new PlotOptions())!;

        var limit = Assert.Single(model.Annotations.OfType<LineAnnotation>());
        Assert.Equal(0.05, limit.Y, 12);
        Assert.Contains("specific migration limit", limit.Text, StringComparison.Ordinal);
        var axis = Assert.IsType<LogarithmicAxis>(model.Axes.Single(axis => axis.Position == AxisPosition.Left));
        Assert.Contains("(mg/kg)", axis.Title, StringComparison.Ordinal);
        // The floor: the larger of six decades below the top (1 mg/kg / 1e6) and a thousandth of the limit (5e-5 mg/kg).
        Assert.Equal(5e-5, SweepPlot.LowestShown(1, 0.05), 15);
        Assert.Equal(1e-6, SweepPlot.LowestShown(1, null), 15);
        Assert.True(axis.Minimum >= 5e-5 / 2 && axis.Minimum < 5e-5, $"axis from {axis.Minimum}");
    }

    [Fact]
    public void The_console_table_never_cuts_a_case_name()
    {
        using var temp = new TempFolder();
        const string name = "a-case-name-long-enough-that-a-narrow-column-would-have-cut-it-in-two";
        temp.WriteFile(Path.Combine("in", $"{name}.json"), BatchCases.Membrane);
        temp.WriteFile(Path.Combine("in", "short.json"), BatchCases.Membrane);

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--out", temp.Combine("out"), "--no-plots");

        Assert.Contains($"  {name}  ", outcome.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Docs_list_every_fixed_column_of_summary_csv()
    {
        var docs = File.ReadAllText(RepoRoot.File("docs", "outputs.md"));
        var section = docs[docs.IndexOf("## Batch summary", StringComparison.Ordinal)..docs.IndexOf("## Design", StringComparison.Ordinal)];

        Assert.All(BatchColumns.FixedNames, name => Assert.Contains($"`{name}`", section, StringComparison.Ordinal));
    }
}
