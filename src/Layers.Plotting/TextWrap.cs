using OxyPlot;
using OxyPlot.SkiaSharp;
using SkiaSharp;

namespace Layers.Plotting;

/// <summary>Breaks titles into lines that fit the picture, measured in the font the renderer uses.</summary>
internal static class TextWrap
{
    /// <summary>
    /// The lines, each broken at spaces so that no line is wider than <paramref name="width"/>; a single word wider
    /// than that stays whole.
    /// </summary>
    public static IReadOnlyList<string> Lines(IEnumerable<string> lines, double width, double fontSize, double weight = FontWeights.Normal)
    {
        using var canvas = new SKNoDrawCanvas(1, 1);
        using var context = new SkiaRenderContext { SkCanvas = canvas, RenderTarget = RenderTarget.PixelGraphic, UseTextShaping = true };
        double Measure(string text) =>
            context.MeasureText(text, PlotStyle.FontFamily, fontSize, weight).Width;
        var result = new List<string>();
        foreach (var line in lines)
        {
            result.AddRange(Wrap(line, width, Measure));
        }

        return result;
    }

    private static IEnumerable<string> Wrap(string line, double width, Func<string, double> measure)
    {
        var current = string.Empty;
        foreach (var word in line.Split(' '))
        {
            var candidate = current.Length == 0 ? word : current + " " + word;
            if (current.Length > 0 && measure(candidate) > width)
            {
                yield return current;
                current = word;
            }
            else
            {
                current = candidate;
            }
        }

        yield return current;
    }
}
