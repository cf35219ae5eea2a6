namespace NetSolve.Fitting.Reading;

/// <summary>
/// The stays of a log in blocks of 65,536 rows: it grows without copying (a doubling array would need twice the
/// memory at the moment it grows), and a row is found by its number in constant time.
/// </summary>
internal sealed class StayTable
{
    private const int BlockBits = 16;
    private const int BlockSize = 1 << BlockBits;
    private readonly List<StayRow[]> _blocks = [];

    /// <summary>Rows held.</summary>
    public int Count { get; private set; }

    /// <summary>The row numbered <paramref name="index"/> (0-based, in the order added).</summary>
    public ref readonly StayRow this[int index] => ref _blocks[index >> BlockBits][index & (BlockSize - 1)];

    /// <summary>Adds a row at the end.</summary>
    public void Add(in StayRow row)
    {
        if ((Count & (BlockSize - 1)) == 0)
        {
            _blocks.Add(new StayRow[BlockSize]);
        }

        _blocks[^1][Count & (BlockSize - 1)] = row;
        Count = checked(Count + 1);
    }

    /// <summary>Replaces every row's unit number by <paramref name="renumber"/>[unit].</summary>
    public void RenumberUnits(int[] renumber)
    {
        for (int i = 0; i < Count; i++)
        {
            ref var row = ref _blocks[i >> BlockBits][i & (BlockSize - 1)];
            row = row with { Unit = renumber[row.Unit] };
        }
    }
}
