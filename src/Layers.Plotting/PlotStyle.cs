using OxyPlot;

namespace Layers.Plotting;

/// <summary>
/// Every visual constant of the plots in one place: fonts, sizes, colours and line widths. Sizes are in
/// device-independent units of a 1200 x 800 picture; other picture sizes scale them (see <see cref="Scale"/>).
/// </summary>
internal static class PlotStyle
{
    /// <summary>Font family, named explicitly so that output does not depend on the machine's default font.</summary>
    public const string FontFamily = "DejaVu Sans";

    /// <summary>Picture size the sizes below are chosen for.</summary>
    public const double ReferenceWidth = 1200;

    /// <summary>Picture size the sizes below are chosen for.</summary>
    public const double ReferenceHeight = 800;

    public const double TitleFontSize = 19;
    public const double SubtitleFontSize = 13.5;
    public const double AxisTitleFontSize = 15;
    public const double TickFontSize = 13;
    public const double LegendFontSize = 13.5;
    public const double LabelFontSize = 12.5;

    public const double SeriesThickness = 2.4;
    public const double ReferenceThickness = 1.6;
    public const double InterfaceThickness = 1.0;
    public const double MarkerSize = 5;

    /// <summary>
    /// Padding of an axis whose range is set by its data, as a fraction of the plot area, where markers sit at the
    /// ends: more than a marker's radius, so that the frame does not cut them.
    /// </summary>
    public const double EdgeMarkerPadding = 0.03;

    /// <summary>Room around the picture, device-independent units.</summary>
    public const double Padding = 14;

    /// <summary>Gap between a label and the point it names, device-independent units.</summary>
    public const double LabelGap = 7;

    /// <summary>
    /// Series colours, in order of use: eight hues that stay apart for the common colour-vision deficiencies and
    /// in greyscale, each dark enough to read against the light layer bands. Based on the Okabe-Ito hues, reordered
    /// and with the yellow replaced by a dark ochre, which is legible on white.
    /// </summary>
    public static IReadOnlyList<OxyColor> Palette { get; } =
    [
        OxyColor.FromRgb(0x00, 0x72, 0xB2), // blue
        OxyColor.FromRgb(0xD5, 0x5E, 0x00), // vermilion
        OxyColor.FromRgb(0x00, 0x9E, 0x73), // bluish green
        OxyColor.FromRgb(0xCC, 0x79, 0xA7), // reddish purple
        OxyColor.FromRgb(0x1A, 0x1A, 0x1A), // near black
        OxyColor.FromRgb(0x56, 0xB4, 0xE9), // sky blue
        OxyColor.FromRgb(0xE6, 0x9F, 0x00), // orange
        OxyColor.FromRgb(0x8C, 0x6D, 0x1F), // dark ochre
    ];

    /// <summary>Line styles cycled once the palette is used up, so that no two series look alike.</summary>
    public static IReadOnlyList<LineStyle> LineStyles { get; } = [LineStyle.Solid, LineStyle.Dash, LineStyle.DashDot];

    /// <summary>Marker shapes for series that carry threshold markers, in the order of the palette.</summary>
    public static IReadOnlyList<MarkerType> Markers { get; } =
        [MarkerType.Circle, MarkerType.Square, MarkerType.Diamond, MarkerType.Triangle];

    /// <summary>Alternating fills of the layer bands on the profile plot.</summary>
    public static IReadOnlyList<OxyColor> BandFills { get; } =
        [OxyColor.FromRgb(0xF4, 0xF4, 0xF2), OxyColor.FromRgb(0xE3, 0xE4, 0xE6)];

    /// <summary>Fill of the strips standing for the face media on the profile plot: a faint blue, unlike the layers.</summary>
    public static OxyColor MediumFill { get; } = OxyColor.FromRgb(0xE4, 0xEE, 0xF6);

    public static OxyColor Text { get; } = OxyColor.FromRgb(0x22, 0x22, 0x22);
    public static OxyColor SubtleText { get; } = OxyColor.FromRgb(0x4A, 0x4A, 0x4A);
    public static OxyColor Axis { get; } = OxyColor.FromRgb(0x55, 0x55, 0x55);
    public static OxyColor Gridline { get; } = OxyColor.FromArgb(0x55, 0xA0, 0xA0, 0xA0);
    public static OxyColor Interface { get; } = OxyColor.FromRgb(0x70, 0x70, 0x70);
    public static OxyColor Initial { get; } = OxyColor.FromRgb(0x7A, 0x7A, 0x7A);
    public static OxyColor Reference { get; } = OxyColor.FromRgb(0x33, 0x33, 0x33);
    public static OxyColor Limit { get; } = OxyColor.FromRgb(0xB0, 0x1E, 0x1E);
    public static OxyColor LabelBackground { get; } = OxyColor.FromArgb(0xE6, 0xFF, 0xFF, 0xFF);
    public static OxyColor ThresholdLine { get; } = OxyColor.FromArgb(0x90, 0x80, 0x80, 0x80);

    /// <summary>The colour of the series at a position in the order of series.</summary>
    public static OxyColor SeriesColor(int index) => Palette[index % Palette.Count];

    /// <summary>The line style of the series at a position: solid for the first round of colours, then dashed.</summary>
    public static LineStyle SeriesLineStyle(int index) => LineStyles[index / Palette.Count % LineStyles.Count];

    /// <summary>
    /// How much to enlarge everything for a picture of the given size: 1 at 1200 x 800, proportionally more or less
    /// for larger or smaller pictures, within limits so that text stays legible on small pictures.
    /// </summary>
    public static double Scale(PlotOptions options) =>
        Math.Clamp(Math.Min(options.WidthPixels / ReferenceWidth, options.HeightPixels / ReferenceHeight), 0.75, 4);
}
