using OxyPlot;
using OxyPlot.SkiaSharp;
using SkiaSharp;

namespace Layers.Plotting;

/// <summary>
/// Lays a model out without drawing it, exactly as <see cref="PngRenderer"/> will, so that labels can be placed
/// against the real plot area and axis transforms before the picture is made. Annotations added afterwards do not
/// move the plot area; changing axis ranges or series does, and calls for another pass.
/// </summary>
internal sealed class LayoutPass : IDisposable
{
    private readonly SKNoDrawCanvas _canvas;
    private readonly SkiaRenderContext _context;
    private readonly OxyRect _bounds;

    private LayoutPass(PlotModel model, PlotOptions options)
    {
        var scale = PlotStyle.Scale(options);
        _canvas = new SKNoDrawCanvas(options.WidthPixels, options.HeightPixels);
        _context = new SkiaRenderContext
        {
            SkCanvas = _canvas,
            RenderTarget = RenderTarget.PixelGraphic,
            DpiScale = (float)scale,
            UseTextShaping = true,
        };
        Model = model;
        _bounds = new OxyRect(0, 0, options.WidthPixels / scale, options.HeightPixels / scale);
        Run();
    }

    /// <summary>The model laid out.</summary>
    public PlotModel Model { get; }

    /// <summary>The plot area after the last pass, device-independent units.</summary>
    public OxyRect PlotArea => Model.PlotArea;

    /// <summary>Lays the model out once.</summary>
    public static LayoutPass Run(PlotModel model, PlotOptions options) => new(model, options);

    /// <summary>Lays the model out again after its axes or series changed.</summary>
    public void Run()
    {
        ((IPlotModel)Model).Update(true);
        ((IPlotModel)Model).Render(_context, _bounds);
    }

    /// <summary>The size of a one-line text in the plot font, device-independent units.</summary>
    public OxySize Measure(string text, double fontSize) =>
        _context.MeasureText(text, PlotStyle.FontFamily, fontSize, FontWeights.Normal);

    /// <inheritdoc />
    public void Dispose()
    {
        _context.Dispose();
        _canvas.Dispose();
    }
}
