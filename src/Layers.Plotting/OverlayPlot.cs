using Layers.Core.Verification;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// A verification benchmark's computed curve over its analytic reference: the reference as a solid line, the
/// solver's values as markers, so agreement is seen at a glance and any departure stands out.
/// </summary>
public static class OverlayPlot
{
    /// <summary>The plot of one benchmark curve.</summary>
    public static PlotModel Create(BenchmarkResult benchmark, BenchmarkCurve curve, PlotOptions options)
    {
        var model = PlotFrame.Create(benchmark.Name, [benchmark.Source], options);
        var xAxis = PlotFrame.Logarithmic(AxisPosition.Bottom, Typeset(curve.XLabel));
        var yAxis = PlotFrame.Linear(AxisPosition.Left, Typeset(curve.YLabel));
        // Room beyond the first and last values, so that the markers there are drawn whole, not cut by the frame.
        (xAxis.MinimumPadding, xAxis.MaximumPadding) = (PlotStyle.EdgeMarkerPadding, PlotStyle.EdgeMarkerPadding);
        (yAxis.MinimumPadding, yAxis.MaximumPadding) = (PlotStyle.EdgeMarkerPadding, PlotStyle.EdgeMarkerPadding);
        model.Axes.Add(xAxis);
        model.Axes.Add(yAxis);
        var analytic = new LineSeries
        {
            Title = "analytic",
            Color = PlotStyle.Reference,
            StrokeThickness = PlotStyle.SeriesThickness,
        };
        var computed = new ScatterSeries
        {
            // A benchmark of the exact method has no cells nor steps: the settings would misname what computed it.
            Title = benchmark.Name.EndsWith(VerificationSuite.ExactSuffix, StringComparison.Ordinal)
                ? "computed (exact method in the Laplace domain)"
                : $"computed ({VerificationSuite.BenchmarkSettings})",
            MarkerType = MarkerType.Circle,
            MarkerSize = PlotStyle.MarkerSize,
            MarkerFill = PlotStyle.SeriesColor(1),
        };
        for (var i = 0; i < curve.X.Count; i++)
        {
            analytic.Points.Add(new DataPoint(curve.X[i], curve.Analytic[i]));
            if (i % 4 == 0)
            {
                computed.Points.Add(new ScatterPoint(curve.X[i], curve.Computed[i]));
            }
        }

        model.Series.Add(analytic);
        model.Series.Add(computed);
        return model;
    }

    // The benchmarks' axis labels are plain text ("D t / L^2 [-]", "Q [kg/m2]"); squares and cubes read better raised.
    private static string Typeset(string label) =>
        label.Replace("^2", "\u00B2", StringComparison.Ordinal)
            .Replace("/m2", "/m\u00B2", StringComparison.Ordinal)
            .Replace("/m3", "/m\u00B3", StringComparison.Ordinal);

    /// <summary>The PNG bytes of one benchmark curve.</summary>
    public static byte[] Render(BenchmarkResult benchmark, BenchmarkCurve curve, PlotOptions options)
        => PngRenderer.Render(Create(benchmark, curve, options), options);
}
