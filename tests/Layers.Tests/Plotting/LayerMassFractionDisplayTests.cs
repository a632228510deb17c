using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Plotting;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Tests.Plotting;

/// <summary>
/// A layer loaded as a mass fraction is shown back in it (issue #20: "500 mg/kg is shown back as 460 mg/L"): the
/// case reader multiplies by the layer's density (w rho = c, the definition of a mass fraction), the display divides
/// by the same density, so the number written comes back.
/// </summary>
public sealed class LayerMassFractionDisplayTests
{
    private static string Case(string secondLayerDensity) => $$"""
        {
          "layers": [
            { "name": "sealant", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "initialConcentration": "500 mg/kg", "density": "0.92 g/cm3" },
            { "name": "barrier", "thickness": "12 um", "diffusionCoefficient": "1e-12 cm2/s"{{secondLayerDensity}} }
          ],
          "left": { "kind": "compartment", "name": "simulant", "mass": "1 kg", "density": "0.9 g/cm3", "area": "6 dm2" },
          "right": { "kind": "closed" },
          "reportTimes": [ "1 h", "10 h" ],
          "duration": "10 h"
        }
        """;

    [Fact]
    public void A_layer_written_in_mg_per_kg_reads_back_in_mg_per_kg_on_the_profile_axis_and_in_the_input_table()
    {
        var read = CaseReader.ReadText(Case(", \"density\": \"1.38 g/cm3\""), "mass.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);

        var model = ProfilePlot.Create(result, new PlotOptions());

        var axis = model.Axes.Single(axis => axis.Position == AxisPosition.Left);
        Assert.Contains("mg/kg", axis.Title, StringComparison.Ordinal);
        // The initial state is drawn one line per band (media and layers), all under one title.
        var initial = model.Series.OfType<LineSeries>().Where(line => line.Title == "t = 0 (initial)").SelectMany(line => line.Points).ToList();
        // 500 mg/kg x 920 kg/m3 = 0.46 kg/m3 inside the run (460 mg/L); 500 again on the axis.
        Assert.Contains(initial, point => Math.Abs(point.Y - 500) < 1e-9);
        Assert.DoesNotContain(initial, point => Math.Abs(point.Y - 460) < 1e-6);
        var table = InputTables.Layers(read.Case!);
        Assert.Contains("initial c [mg/kg]", table.Headers);
        Assert.Equal("500", table.Rows[0][4]);
    }

    [Fact]
    public void Without_every_layer_density_the_layers_are_shown_per_volume_and_the_reports_say_why()
    {
        var read = CaseReader.ReadText(Case(string.Empty), "mixed.json");
        Assert.True(read.IsValid, read.FormatErrors());

        var table = InputTables.Layers(read.Case!);

        Assert.Contains("initial c [mg/L]", table.Headers);
        Assert.Equal("460", table.Rows[0][4]);
        Assert.Contains("barrier gives no density", table.Title, StringComparison.Ordinal);
        var model = ProfilePlot.Create(Simulator.Run(read.Case!), new PlotOptions());
        Assert.Contains("barrier gives no density", model.Subtitle, StringComparison.Ordinal);
    }
}
