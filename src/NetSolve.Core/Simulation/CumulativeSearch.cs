using System.Runtime.CompilerServices;

namespace NetSolve.Simulation;

/// <summary>
/// Picks a route out of a unit from a uniform draw and the routes' cumulative probabilities, by binary search: the
/// first route whose cumulative probability is above the draw. It picks exactly what a scan from the first route
/// picks, so a network simulates the same patients whichever is used, and costs log₂ n comparisons instead of n for a
/// unit with many routes. (Entry units, thousands in a large network, are picked by an <see cref="AliasTable"/>.)
/// </summary>
internal static class CumulativeSearch
{
    /// <summary>Below this many outcomes a scan is as quick: the comparisons it saves are fewer than the jumps it adds.</summary>
    public const int ScanUpTo = 8;

    /// <summary>
    /// The index in [<paramref name="start"/>, <paramref name="stop"/>) of the first route whose cumulative probability
    /// is above <paramref name="draw"/>, or −1 when none is (the patient leaves the network).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int FirstAbove(RouteChoice[] routes, int start, int stop, double draw)
    {
        int low = start;
        int high = stop;
        while (low < high)
        {
            int middle = (int)((uint)(low + high) >> 1);
            if (draw < routes[middle].Cumulative)
            {
                high = middle;
            }
            else
            {
                low = middle + 1;
            }
        }

        return low < stop ? low : -1;
    }
}
