using OxyPlot;

namespace Layers.Plotting;

/// <summary>
/// Finds curves drawn wholly under a later one, so that the legend can say where they are ("t = 2 h (under
/// t = 12 h)") instead of showing an entry the reader cannot find on the plot.
/// </summary>
internal static class HiddenCurves
{
    /// <summary>
    /// How close a curve must lie to a later one everywhere to count as hidden, device-independent units: under
    /// half the width of a drawn line, so that what shows of it is a sliver at most.
    /// </summary>
    public const double TolerancePixels = 1.0;

    /// <summary>
    /// For each curve, in drawing order, the index of the last-drawn later curve that covers it, or null when it shows.
    /// A curve is a list of pieces (polylines in screen coordinates); it is covered when every point of every piece
    /// lies within <see cref="TolerancePixels"/> of the later curve's piece of the same place in the list. Only
    /// curves for which <paramref name="opaque"/> holds can cover: a dashed line lets what is under it show.
    /// </summary>
    public static IReadOnlyList<int?> Coverers(
        IReadOnlyList<IReadOnlyList<IReadOnlyList<ScreenPoint>>> curves, Func<int, bool> opaque)
    {
        var coverers = new int?[curves.Count];
        for (var i = 0; i < curves.Count; i++)
        {
            for (var j = curves.Count - 1; j > i; j--)
            {
                if (opaque(j) && Covers(curves[j], curves[i]))
                {
                    coverers[i] = j;
                    break;
                }
            }
        }

        return coverers;
    }

    /// <summary>The legend text of a curve drawn under another.</summary>
    public static string Under(string title, string coverer) => $"{title} (under {coverer})";

    private static bool Covers(IReadOnlyList<IReadOnlyList<ScreenPoint>> upper, IReadOnlyList<IReadOnlyList<ScreenPoint>> lower)
    {
        if (upper.Count != lower.Count || lower.Count == 0)
        {
            return false;
        }

        for (var k = 0; k < lower.Count; k++)
        {
            if (upper[k].Count == 0 || lower[k].Any(point => Distance(point, upper[k]) > TolerancePixels))
            {
                return false;
            }
        }

        return true;
    }

    // Distance from a point to a polyline.
    private static double Distance(ScreenPoint point, IReadOnlyList<ScreenPoint> line)
    {
        if (line.Count == 1)
        {
            return Math.Sqrt(Square(point.X - line[0].X) + Square(point.Y - line[0].Y));
        }

        var least = double.PositiveInfinity;
        for (var i = 1; i < line.Count; i++)
        {
            least = Math.Min(least, ToSegment(point, line[i - 1], line[i]));
        }

        return least;
    }

    private static double ToSegment(ScreenPoint p, ScreenPoint a, ScreenPoint b)
    {
        var (dx, dy) = (b.X - a.X, b.Y - a.Y);
        var length = dx * dx + dy * dy;
        var t = length == 0 ? 0 : Math.Clamp(((p.X - a.X) * dx + (p.Y - a.Y) * dy) / length, 0, 1);
        return Math.Sqrt(Square(p.X - (a.X + t * dx)) + Square(p.Y - (a.Y + t * dy)));
    }

    private static double Square(double value) => value * value;
}
