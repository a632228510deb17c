using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;

namespace Layers.Plotting;

/// <summary>Text labels placed in screen space and anchored in data space so that they land where measured.</summary>
internal static class Labels
{
    /// <summary>Room between a label's text and the edge of its box, device-independent units.</summary>
    public const double Padding = 3;

    /// <summary>The size of a label's box: its text plus padding.</summary>
    public static OxySize BoxSize(LayoutPass pass, string text)
    {
        var size = pass.Measure(text, PlotStyle.LabelFontSize);
        return new OxySize(size.Width + 2 * Padding, size.Height + 2 * Padding);
    }

    /// <summary>The size of a label's box for text of several lines (separated by "\n"): the widest line by the lines' heights, plus padding.</summary>
    public static OxySize MultilineBoxSize(LayoutPass pass, string text)
    {
        var sizes = text.Split('\n').Select(line => pass.Measure(line, PlotStyle.LabelFontSize)).ToList();
        return new OxySize(sizes.Max(size => size.Width) + 2 * Padding, sizes.Sum(size => size.Height) + 2 * Padding);
    }

    /// <summary>A box of a given size whose top left corner is at a screen point.</summary>
    public static OxyRect Box(double left, double top, OxySize size) => new(left, top, size.Width, size.Height);

    /// <summary>
    /// A label drawn centred in a screen box, anchored to the data point under the box's centre, turned clockwise by
    /// <c>rotationDegrees</c> (-90 reads upward, the text's width along the box's height).
    /// </summary>
    public static TextAnnotation At(
        OxyRect box, string text, OxyColor color, Axis xAxis, Axis yAxis, OxyColor background, double rotationDegrees = 0)
    {
        var centre = new DataPoint(
            xAxis.InverseTransform(box.Left + box.Width / 2),
            yAxis.InverseTransform(box.Top + box.Height / 2));
        return new TextAnnotation
        {
            Text = text,
            TextPosition = centre,
            TextHorizontalAlignment = HorizontalAlignment.Center,
            TextVerticalAlignment = VerticalAlignment.Middle,
            TextColor = color,
            TextRotation = rotationDegrees,
            Font = PlotStyle.FontFamily,
            FontSize = PlotStyle.LabelFontSize,
            Background = background,
            Stroke = OxyColors.Undefined,
            StrokeThickness = 0,
            Padding = new OxyThickness(Padding),
            Layer = AnnotationLayer.AboveSeries,
            ClipByXAxis = false,
            ClipByYAxis = false,
            XAxisKey = xAxis.Key,
            YAxisKey = yAxis.Key,
        };
    }
}
