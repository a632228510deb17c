using System.Globalization;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Legends;

namespace Layers.Plotting;

/// <summary>The parts every plot shares: the styled model with title and legend, and styled axes.</summary>
internal static class PlotFrame
{
    /// <summary>
    /// Room kept free of subtitle text on each side, device-independent units: at least as wide as an axis with its
    /// tick labels and title, so that the subtitle's lines stay within the plot area below them.
    /// </summary>
    public const double SubtitleMargin = 110;

    /// <summary>
    /// A model with the case title, a subtitle, white background and the legend under the plot area; the title is
    /// broken into lines that fit the picture, the subtitle into lines that fit over the plot area.
    /// </summary>
    public static PlotModel Create(string title, IEnumerable<string> subtitleLines, PlotOptions options)
    {
        var width = options.WidthPixels / PlotStyle.Scale(options) - 4 * PlotStyle.Padding;
        var subtitleWidth = SubtitleWidth(options);
        var model = new PlotModel
        {
            Title = string.Join("\n", TextWrap.Lines([title], width, PlotStyle.TitleFontSize, FontWeights.Bold)),
            Subtitle = string.Join("\n", TextWrap.Lines(subtitleLines.Where(line => line.Length > 0), subtitleWidth, PlotStyle.SubtitleFontSize)),
            Culture = CultureInfo.InvariantCulture,
            DefaultFont = PlotStyle.FontFamily,
            DefaultFontSize = PlotStyle.TickFontSize,
            TitleFont = PlotStyle.FontFamily,
            TitleFontSize = PlotStyle.TitleFontSize,
            TitleFontWeight = FontWeights.Bold,
            SubtitleFont = PlotStyle.FontFamily,
            SubtitleFontSize = PlotStyle.SubtitleFontSize,
            TitleColor = PlotStyle.Text,
            SubtitleColor = PlotStyle.SubtleText,
            TextColor = PlotStyle.Text,
            TitlePadding = 8,
            TitleClippingLength = 1,
            Padding = new OxyThickness(PlotStyle.Padding, PlotStyle.Padding, PlotStyle.Padding * 2, PlotStyle.Padding),
            Background = OxyColors.White,
            PlotAreaBackground = OxyColors.White,
            PlotAreaBorderColor = PlotStyle.Axis,
            PlotAreaBorderThickness = new OxyThickness(1),
        };
        model.Legends.Add(new Legend
        {
            LegendPlacement = LegendPlacement.Outside,
            LegendPosition = LegendPosition.BottomCenter,
            LegendOrientation = LegendOrientation.Horizontal,
            LegendFont = PlotStyle.FontFamily,
            LegendFontSize = PlotStyle.LegendFontSize,
            LegendTextColor = PlotStyle.Text,
            LegendBackground = OxyColors.Undefined,
            LegendBorder = OxyColors.Undefined,
            LegendSymbolLength = 34,
            LegendItemSpacing = 28,
            LegendColumnSpacing = 18,
            LegendMargin = 6,
            LegendPadding = 4,
        });
        return model;
    }

    /// <summary>The widest a subtitle line may be, device-independent units: the picture less a margin on each side.</summary>
    public static double SubtitleWidth(PlotOptions options) =>
        options.WidthPixels / PlotStyle.Scale(options) - 2 * (PlotStyle.Padding + SubtitleMargin);

    /// <summary>A styled linear axis.</summary>
    public static LinearAxis Linear(AxisPosition position, string title) => Style(new LinearAxis(), position, title);

    /// <summary>A styled base-10 logarithmic axis.</summary>
    public static LogarithmicAxis Logarithmic(AxisPosition position, string title) =>
        Style(new LogarithmicAxis { Base = 10, UseSuperExponentialFormat = false }, position, title);

    /// <summary>A linear or logarithmic axis.</summary>
    public static Axis Axis(bool logarithmic, AxisPosition position, string title) =>
        logarithmic ? Logarithmic(position, title) : Linear(position, title);

    private static T Style<T>(T axis, AxisPosition position, string title)
        where T : Axis
    {
        axis.Position = position;
        axis.Title = title;
        axis.TitleFont = PlotStyle.FontFamily;
        axis.TitleFontSize = PlotStyle.AxisTitleFontSize;
        axis.FontSize = PlotStyle.TickFontSize;
        axis.AxislineColor = PlotStyle.Axis;
        axis.TicklineColor = PlotStyle.Axis;
        axis.TextColor = PlotStyle.Text;
        axis.TitleColor = PlotStyle.Text;
        axis.MajorGridlineStyle = LineStyle.Solid;
        axis.MajorGridlineColor = PlotStyle.Gridline;
        axis.MajorGridlineThickness = 1;
        axis.MinorGridlineStyle = LineStyle.None;
        axis.TickStyle = TickStyle.Outside;
        AxisTicks.OneFormat(axis);
        axis.AxisTitleDistance = 8;
        axis.IsPanEnabled = false;
        axis.IsZoomEnabled = false;
        return axis;
    }
}
