using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// Picks one of n outcomes with given weights from one uniform draw in constant time: Walker's alias method (A. J.
/// Walker, "An efficient method for generating discrete random variables with general distributions", ACM
/// Transactions on Mathematical Software 3(3), 1977), built by Vose's numerically stable pairing (M. D. Vose, "A linear
/// algorithm for generating random numbers with a given distribution", IEEE Transactions on Software Engineering
/// 17(9), 1991). Immutable; shared by replications.
/// </summary>
/// <remarks>
/// The draw's integer part of u·n names a column and its fraction decides between the column's own outcome and its
/// alias: one read of one 16-byte entry, where a search over cumulative shares reads about log₂ n places with a branch
/// at each that the processor cannot predict (a hospital group with thousands of entry units, or a generated network
/// of 100,000 units with 10,000 entries).
/// </remarks>
internal sealed class AliasTable
{
    private readonly Column[] _columns;

    private AliasTable(Column[] columns) => _columns = columns;

    /// <summary>How many outcomes.</summary>
    public int Count => _columns.Length;

    /// <summary>
    /// Builds the table for <paramref name="weights"/>, each finite and not negative, at least one positive; outcome i
    /// then comes with probability weights[i] / Σ weights (to rounding).
    /// </summary>
    public static AliasTable Of(ReadOnlySpan<double> weights)
    {
        int n = weights.Length;
        double total = 0.0;
        foreach (double weight in weights)
        {
            if (!(weight >= 0.0) || double.IsPositiveInfinity(weight))
            {
                throw new ArgumentOutOfRangeException(nameof(weights), weight, "A weight is finite and not negative.");
            }

            total += weight;
        }

        if (!(total > 0.0))
        {
            throw new ArgumentException("At least one weight is positive.", nameof(weights));
        }

        // Scaled so that the average is 1: a column below 1 keeps its own share and lends the rest of its height to
        // an outcome above 1, until every column is full.
        var scaled = new double[n];
        var small = new Stack<int>();
        var large = new Stack<int>();
        for (int i = n - 1; i >= 0; i--)
        {
            scaled[i] = weights[i] * n / total;
            (scaled[i] < 1.0 ? small : large).Push(i);
        }

        var columns = new Column[n];
        while (small.Count > 0 && large.Count > 0)
        {
            int less = small.Pop();
            int more = large.Pop();
            columns[less] = new Column(scaled[less], more);
            scaled[more] = scaled[more] + scaled[less] - 1.0;
            (scaled[more] < 1.0 ? small : large).Push(more);
        }

        // What is left is full up to rounding: kept whole.
        foreach (int i in large.Concat(small))
        {
            columns[i] = new Column(1.0, i);
        }

        return new AliasTable(columns);
    }

    /// <summary>The outcome for a uniform draw in [0, 1).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public int Pick(double uniform)
    {
        var columns = _columns;
        double scaled = uniform * columns.Length;
        int column = Math.Min((int)scaled, columns.Length - 1);
        ref readonly var entry = ref columns[column];
        return scaled - column < entry.Keep ? column : entry.Alias;
    }

    /// <summary>The probability of each outcome that the table gives, summed from its columns: for tests.</summary>
    public double[] Probabilities()
    {
        var probabilities = new double[_columns.Length];
        for (int i = 0; i < _columns.Length; i++)
        {
            probabilities[i] += _columns[i].Keep / _columns.Length;
            probabilities[_columns[i].Alias] += (1.0 - _columns[i].Keep) / _columns.Length;
        }

        return probabilities;
    }

    /// <summary>A column: the share of its height that picks its own outcome, and the outcome the rest picks.</summary>
    [StructLayout(LayoutKind.Sequential)]
    private readonly record struct Column(double Keep, int Alias);
}
