using OxyPlot;

namespace Layers.Plotting;

/// <summary>
/// A rectangle of screen space cut into square cells, each marked or not: marking a point and asking whether a box
/// touches a marked cell cost the same however many points were marked before.
/// </summary>
internal sealed class OccupancyGrid
{
    private readonly OxyRect _area;
    private readonly double _cell;
    private readonly int _columns;
    private readonly int _rows;
    private readonly bool[] _marked;

    /// <summary>An empty grid over <paramref name="area"/> with cells <paramref name="cellPixels"/> wide.</summary>
    public OccupancyGrid(OxyRect area, double cellPixels)
    {
        _area = area;
        _cell = cellPixels;
        _columns = Math.Max(1, (int)Math.Ceiling(area.Width / cellPixels) + 1);
        _rows = Math.Max(1, (int)Math.Ceiling(area.Height / cellPixels) + 1);
        _marked = new bool[_columns * _rows];
    }

    /// <summary>Marks the cells within <paramref name="halfWidth"/> of the point; parts outside the area are ignored.</summary>
    public void Mark(double x, double y, double halfWidth)
    {
        var (left, top, right, bottom) = Cells(x - halfWidth, y - halfWidth, x + halfWidth, y + halfWidth);
        for (var row = top; row <= bottom; row++)
        {
            for (var column = left; column <= right; column++)
            {
                _marked[row * _columns + column] = true;
            }
        }
    }

    /// <summary>Whether any marked cell touches the box from (left, top) to (right, bottom).</summary>
    public bool AnyWithin(double left, double top, double right, double bottom)
    {
        var (first, upper, last, lower) = Cells(left, top, right, bottom);
        for (var row = upper; row <= lower; row++)
        {
            for (var column = first; column <= last; column++)
            {
                if (_marked[row * _columns + column])
                {
                    return true;
                }
            }
        }

        return false;
    }

    // The cell range a box covers, clamped to the grid; an empty range (first > last) when the box misses the area.
    private (int Left, int Top, int Right, int Bottom) Cells(double left, double top, double right, double bottom)
    {
        int Column(double x) => (int)Math.Clamp(Math.Floor((x - _area.Left) / _cell), -1, _columns);
        int Row(double y) => (int)Math.Clamp(Math.Floor((y - _area.Top) / _cell), -1, _rows);
        var (first, last) = (Math.Max(0, Column(left)), Math.Min(_columns - 1, Column(right)));
        var (upper, lower) = (Math.Max(0, Row(top)), Math.Min(_rows - 1, Row(bottom)));
        return first > last || upper > lower ? (0, 0, -1, -1) : (first, upper, last, lower);
    }
}
