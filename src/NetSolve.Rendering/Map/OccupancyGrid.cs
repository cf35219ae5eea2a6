namespace NetSolve.Rendering.Map;

/// <summary>
/// Rectangles already on the map, filed by grid cell, so asking whether a new one overlaps any of them looks at a
/// few neighbours instead of every box and label: what keeps rate labels on a 2,000-unit map in linear time.
/// </summary>
internal sealed class OccupancyGrid
{
    /// <summary>Cell side in map units: about a box, so a label or box touches a handful of cells.</summary>
    private const double CellSize = 128.0;

    private readonly Dictionary<(int Column, int Row), List<(double Left, double Top, double Right, double Bottom)>> _cells = [];

    public void Add(double left, double top, double right, double bottom)
    {
        foreach (var cell in Cells(left, top, right, bottom))
        {
            if (!_cells.TryGetValue(cell, out var list))
            {
                list = [];
                _cells[cell] = list;
            }

            list.Add((left, top, right, bottom));
        }
    }

    public bool Overlaps(double left, double top, double right, double bottom) =>
        Cells(left, top, right, bottom).Any(cell => _cells.TryGetValue(cell, out var list)
            && list.Exists(other => left < other.Right && other.Left < right && top < other.Bottom && other.Top < bottom));

    private static IEnumerable<(int Column, int Row)> Cells(double left, double top, double right, double bottom)
    {
        for (int column = (int)Math.Floor(left / CellSize); column <= (int)Math.Floor(right / CellSize); column++)
        {
            for (int row = (int)Math.Floor(top / CellSize); row <= (int)Math.Floor(bottom / CellSize); row++)
            {
                yield return (column, row);
            }
        }
    }
}
