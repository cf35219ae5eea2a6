namespace NetSolve.Presentation;

/// <summary>
/// The cells of a <see cref="TextTable"/>, kept as characters in blocks of 64 KB instead of one string each: a table
/// of 100,000 units holds about 1.3 million cells, which as strings cost about 40 bytes each besides their characters
/// (and a string array per row); here a cell costs its characters and one length. Blocks of characters and of lengths
/// stay under the large-object threshold (a growing list of 1.3 million lengths would be copied into ever larger
/// arrays there, each one able to start a full collection).
/// </summary>
/// <remarks>Mutable builder; not thread-safe. Cells are read back in the order they were added.</remarks>
internal sealed class TextCells
{
    /// <summary>Characters per block (64 KB; a longer cell gets a block of its own length).</summary>
    private const int BlockLength = 1 << 15;

    /// <summary>Lengths per block of lengths (64 KB).</summary>
    private const int LengthsPerBlock = 1 << 14;

    private readonly List<char[]> _blocks = [];
    private readonly List<int[]> _lengths = [];
    private int _used;
    private int _count;

    /// <summary>Appends a cell.</summary>
    public void Add(ReadOnlySpan<char> cell)
    {
        if (_blocks.Count == 0 || cell.Length > _blocks[^1].Length - _used)
        {
            _blocks.Add(new char[Math.Max(BlockLength, cell.Length)]);
            _used = 0;
        }

        cell.CopyTo(_blocks[^1].AsSpan(_used));
        _used += cell.Length;
        if (_count % LengthsPerBlock == 0)
        {
            _lengths.Add(new int[LengthsPerBlock]);
        }

        _lengths[^1][_count % LengthsPerBlock] = cell.Length;
        _count++;
    }

    /// <summary>A reader of the cells from the first, in the order they were added.</summary>
    public Reader Read() => new(this);

    /// <summary>Reads the cells in order: each one sits where <see cref="Add"/> put it, found by the same rule.</summary>
    internal struct Reader(TextCells cells)
    {
        private int _block = -1;
        private int _position;
        private int _cell;

        /// <summary>The next cell's characters, valid until the table changes.</summary>
        public ReadOnlySpan<char> Next()
        {
            int length = cells._lengths[_cell / LengthsPerBlock][_cell % LengthsPerBlock];
            _cell++;
            if (_block < 0 || length > cells._blocks[_block].Length - _position)
            {
                _block++;
                _position = 0;
            }

            var cell = cells._blocks[_block].AsSpan(_position, length);
            _position += length;
            return cell;
        }
    }
}
