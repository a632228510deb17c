using OxyPlot;

namespace Layers.Plotting;

/// <summary>
/// Places text boxes so that none overlaps another or leaves the plot area: each label offers candidate boxes in
/// order of preference and gets the first free one, or, when all are taken, its first candidate moved down until
/// it is free.
/// </summary>
internal sealed class LabelPlacer(OxyRect area)
{
    private const double Gap = 3;
    private readonly List<OxyRect> _taken = [];

    /// <summary>Marks a region as taken (e.g. a marker) so that no label covers it.</summary>
    public void Reserve(OxyRect region) => _taken.Add(region);

    /// <summary>Marks a drawn line as taken, as a chain of small boxes, so that no label covers it.</summary>
    public void ReserveLine(IReadOnlyList<ScreenPoint> points, double halfWidth)
    {
        const double Step = 3;
        for (var i = 0; i < points.Count; i++)
        {
            var (from, to) = (i == 0 ? points[0] : points[i - 1], points[i]);
            var length = Math.Sqrt((to.X - from.X) * (to.X - from.X) + (to.Y - from.Y) * (to.Y - from.Y));
            var steps = Math.Max(1, (int)Math.Ceiling(length / Step));
            for (var k = 1; k <= steps; k++)
            {
                var x = from.X + (to.X - from.X) * k / steps;
                var y = from.Y + (to.Y - from.Y) * k / steps;
                if (area.Contains(x, y))
                {
                    _taken.Add(new OxyRect(x - halfWidth, y - halfWidth, 2 * halfWidth, 2 * halfWidth));
                }
            }
        }
    }

    /// <summary>Gives the label the first free candidate, reserves it and returns it.</summary>
    public OxyRect Place(IReadOnlyList<OxyRect> candidates)
    {
        foreach (var candidate in candidates)
        {
            var inside = Inside(candidate);
            if (IsFree(inside))
            {
                _taken.Add(inside);
                return inside;
            }
        }

        var moved = Inside(candidates[0]);
        while (!IsFree(moved) && moved.Bottom < area.Bottom)
        {
            moved = new OxyRect(moved.Left, moved.Top + moved.Height / 2, moved.Width, moved.Height);
        }

        _taken.Add(moved);
        return moved;
    }

    /// <summary>The box shifted horizontally, then vertically, so that it lies inside the area where it fits.</summary>
    public OxyRect Inside(OxyRect box)
    {
        var left = Math.Max(area.Left + Gap, Math.Min(box.Left, area.Right - Gap - box.Width));
        var top = Math.Max(area.Top + Gap, Math.Min(box.Top, area.Bottom - Gap - box.Height));
        return new OxyRect(left, top, box.Width, box.Height);
    }

    private bool IsFree(OxyRect box) => !_taken.Any(other => Overlaps(box, other));

    private static bool Overlaps(OxyRect a, OxyRect b) =>
        a.Left < b.Right + Gap && b.Left < a.Right + Gap && a.Top < b.Bottom + Gap && b.Top < a.Bottom + Gap;
}
