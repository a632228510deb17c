using OxyPlot;

namespace Layers.Plotting;

/// <summary>
/// Places text boxes so that none overlaps another or leaves the plot area: each label offers candidate boxes in
/// order of preference and gets the first free one, or, when all are taken, its first candidate moved down until
/// it is free.
/// </summary>
/// <remarks>
/// Drawn lines are kept as a grid of occupied cells over the plot area, and each segment is clipped to the area
/// before it is walked, so that the cost depends on the picture's size and the number of points, never on how far
/// off the plot a value lies nor on how many labels came before.
/// </remarks>
internal sealed class LabelPlacer
{
    private const double Gap = 3;
    private const double CellPixels = 3;
    private readonly OxyRect _area;
    private readonly List<OxyRect> _taken = [];
    private readonly OccupancyGrid _lines;

    /// <summary>A placer for labels inside <paramref name="area"/> (screen coordinates).</summary>
    public LabelPlacer(OxyRect area)
    {
        _area = area;
        _lines = new OccupancyGrid(area, CellPixels);
    }

    /// <summary>Marks a region as taken (e.g. a marker) so that no label covers it.</summary>
    public void Reserve(OxyRect region) => _taken.Add(region);

    /// <summary>Marks a drawn line as taken, the part of it inside the plot area, so that no label covers it.</summary>
    public void ReserveLine(IReadOnlyList<ScreenPoint> points, double halfWidth)
    {
        for (var i = 0; i < points.Count; i++)
        {
            var (from, to) = (i == 0 ? points[0] : points[i - 1], points[i]);
            if (SegmentClip.ToRect(from, to, _area) is not { } inside)
            {
                continue;
            }

            var (a, b) = inside;
            var length = Math.Sqrt((b.X - a.X) * (b.X - a.X) + (b.Y - a.Y) * (b.Y - a.Y));
            var steps = Math.Max(1, (int)Math.Ceiling(length / CellPixels));
            for (var k = 0; k <= steps; k++)
            {
                _lines.Mark(a.X + (b.X - a.X) * k / steps, a.Y + (b.Y - a.Y) * k / steps, halfWidth);
            }
        }
    }

    /// <summary>Gives the label the first free candidate, reserves it and returns it.</summary>
    public OxyRect Place(IReadOnlyList<OxyRect> candidates)
    {
        if (TryPlace(candidates) is { } free)
        {
            return free;
        }

        var moved = Inside(candidates[0]);
        while (!IsFree(moved) && moved.Bottom < _area.Bottom)
        {
            moved = new OxyRect(moved.Left, moved.Top + moved.Height / 2, moved.Width, moved.Height);
        }

        _taken.Add(moved);
        return moved;
    }

    /// <summary>Gives the label the first free candidate and reserves it; null (nothing reserved) when none is free.</summary>
    public OxyRect? TryPlace(IReadOnlyList<OxyRect> candidates)
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

        return null;
    }

    /// <summary>The box shifted horizontally, then vertically, so that it lies inside the area where it fits.</summary>
    public OxyRect Inside(OxyRect box)
    {
        var left = Math.Max(_area.Left + Gap, Math.Min(box.Left, _area.Right - Gap - box.Width));
        var top = Math.Max(_area.Top + Gap, Math.Min(box.Top, _area.Bottom - Gap - box.Height));
        return new OxyRect(left, top, box.Width, box.Height);
    }

    private bool IsFree(OxyRect box) =>
        !_lines.AnyWithin(box.Left - Gap, box.Top - Gap, box.Right + Gap, box.Bottom + Gap)
        && !_taken.Any(other => Overlaps(box, other));

    private static bool Overlaps(OxyRect a, OxyRect b) =>
        a.Left < b.Right + Gap && b.Left < a.Right + Gap && a.Top < b.Bottom + Gap && b.Top < a.Bottom + Gap;
}
