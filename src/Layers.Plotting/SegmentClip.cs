using OxyPlot;

namespace Layers.Plotting;

/// <summary>The part of a straight segment inside a rectangle (Liang-Barsky parametric clipping, from memory).</summary>
internal static class SegmentClip
{
    /// <summary>
    /// The ends of the part of the segment from <paramref name="from"/> to <paramref name="to"/> that lies in
    /// <paramref name="rect"/>; null when no part does or an end is not a finite point.
    /// </summary>
    public static (ScreenPoint From, ScreenPoint To)? ToRect(ScreenPoint from, ScreenPoint to, OxyRect rect)
    {
        if (!double.IsFinite(from.X) || !double.IsFinite(from.Y) || !double.IsFinite(to.X) || !double.IsFinite(to.Y))
        {
            return null;
        }

        var (dx, dy) = (to.X - from.X, to.Y - from.Y);
        var (enter, leave) = (0.0, 1.0);
        // Each pair (p, q) is one edge: the segment is inside that edge where p t <= q.
        (double P, double Q)[] edges =
        [
            (-dx, from.X - rect.Left),
            (dx, rect.Right - from.X),
            (-dy, from.Y - rect.Top),
            (dy, rect.Bottom - from.Y),
        ];
        foreach (var (p, q) in edges)
        {
            if (p == 0)
            {
                if (q < 0)
                {
                    return null;
                }

                continue;
            }

            var t = q / p;
            if (p < 0)
            {
                enter = Math.Max(enter, t);
            }
            else
            {
                leave = Math.Min(leave, t);
            }
        }

        if (enter > leave)
        {
            return null;
        }

        return (new ScreenPoint(from.X + enter * dx, from.Y + enter * dy), new ScreenPoint(from.X + leave * dx, from.Y + leave * dy));
    }
}
