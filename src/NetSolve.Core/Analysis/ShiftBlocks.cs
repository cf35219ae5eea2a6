using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>
/// Which block each hour of the cycle belongs to: every hour its own, or shift blocks from each start hour to the next
/// (the last across midnight), repeated every day of a week-long cycle. Servers are the same throughout a block.
/// </summary>
internal static class ShiftBlocks
{
    /// <summary>The block of each hour of a cycle of <paramref name="hours"/> hours.</summary>
    public static int[] Of(ImmutableArray<int> starts, int hours)
    {
        var blocks = new int[hours];
        if (starts.IsDefaultOrEmpty)
        {
            for (int h = 0; h < hours; h++)
            {
                blocks[h] = h;
            }

            return blocks;
        }

        const int day = 24;
        for (int h = 0; h < hours; h++)
        {
            int hourOfDay = h % day;
            int index = starts.LastIndexOf(starts.LastOrDefault(start => start <= hourOfDay, -1));

            // Before the first start of the day: still the previous day's last shift.
            int dayIndex = h / day;
            if (index < 0)
            {
                (index, dayIndex) = (starts.Length - 1, dayIndex - 1);
            }

            int days = Math.Max(hours / day, 1);
            blocks[h] = (((dayIndex + days) % days) * starts.Length) + index;
        }

        return blocks;
    }

    /// <summary>Raises every hour of a block to the block's largest count.</summary>
    public static void Level(int[] blocks, int[] servers)
    {
        foreach (var group in Enumerable.Range(0, blocks.Length).GroupBy(h => blocks[h]))
        {
            int most = group.Max(h => servers[h]);
            foreach (int h in group)
            {
                servers[h] = most;
            }
        }
    }

    /// <summary>Adds <paramref name="change"/> servers to every hour of <paramref name="block"/>.</summary>
    public static void Add(int[] blocks, int[] servers, int block, int change)
    {
        for (int h = 0; h < blocks.Length; h++)
        {
            if (blocks[h] == block)
            {
                servers[h] += change;
            }
        }
    }

    /// <summary>True when every hour of <paramref name="block"/> has more servers than its floor.</summary>
    public static bool CanRemove(int[] blocks, int[] servers, int[] floor, int block)
    {
        for (int h = 0; h < blocks.Length; h++)
        {
            if (blocks[h] == block && servers[h] <= floor[h])
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>Blocks, the one whose worst hour is furthest inside its targets first.</summary>
    public static int[] BySlack(int[] blocks, double[] ratios) =>
        [.. Enumerable.Range(0, blocks.Length).GroupBy(h => blocks[h]).OrderBy(group => group.Max(h => ratios[h])).ThenBy(group => group.Key).Select(group => group.Key)];
}
