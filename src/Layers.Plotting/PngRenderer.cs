using OxyPlot;
using OxyPlot.SkiaSharp;

namespace Layers.Plotting;

/// <summary>Renders a plot model to PNG bytes through SkiaSharp, with text shaped by HarfBuzz.</summary>
public static class PngRenderer
{
    /// <summary>Renders a model at the size of <paramref name="options"/>.</summary>
    /// <param name="model">The plot.</param>
    /// <param name="options">Size of the picture; text and lines scale with it.</param>
    /// <returns>The PNG file's bytes.</returns>
    public static byte[] Render(PlotModel model, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        var exporter = new PngExporter
        {
            Width = options.WidthPixels,
            Height = options.HeightPixels,
            Dpi = (float)(Dpi * PlotStyle.Scale(options)),
            UseTextShaping = true,
        };
        using var stream = new MemoryStream();
        exporter.Export(model, stream);
        return stream.ToArray();
    }

    /// <summary>Dots per inch at which one device-independent unit is one pixel.</summary>
    internal const double Dpi = 96;
}
