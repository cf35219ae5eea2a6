using NetSolve.Fitting.Reading;

namespace NetSolve.Fitting;

/// <summary>Counts, in one pass over the stays of a log, what each unit shows and the moves between units.</summary>
internal static class UnitCounter
{
    /// <summary>Per-unit observations and the move counts between units (from, to).</summary>
    public static (UnitCounts[] Units, Dictionary<(int From, int To), int> Moves) Count(MovementLog log)
    {
        var units = log.Units.Select(_ => new UnitCounts()).ToArray();
        var moves = new Dictionary<(int From, int To), int>();
        long start = log.ExtractStartMs;
        long end = log.ExtractEndMs;
        for (int p = 0; p < log.Order.Length; p++)
        {
            ref readonly var row = ref log.Rows[log.Order[p]];
            var unit = units[row.Unit];
            int next = log.Next[p];
            bool stillRunning = next == StayOutcome.StillRunning || row.IsCensored || row.LeftMs > end;
            long serviceStart = row.ServiceStartMs;
            long serviceEnd = stillRunning ? end : row.LeftMs;
            unit.Stays++;
            unit.Entries += log.Enters[p] ? 1 : 0;
            unit.ObservedServiceMs += serviceEnd - Math.Max(serviceStart, start);
            if (stillRunning)
            {
                unit.StillRunning++;
            }
            else
            {
                unit.Completed++;
                if (serviceStart >= start)
                {
                    long service = serviceEnd - serviceStart;
                    unit.WholeStays++;
                    unit.WholeServiceMs += service;
                    unit.WholeServiceSquaresMs += (Int128)service * service;
                }
            }

            if (row.StartedMs != StayRow.NotRecorded && row.ArrivedMs >= start)
            {
                unit.Timed++;
                unit.Waited += row.StartedMs > row.ArrivedMs ? 1 : 0;
                unit.WaitMs += row.StartedMs - row.ArrivedMs;
            }

            if (next >= StayOutcome.Exit && !stillRunning)
            {
                unit.Routed++;
                if (next >= 0)
                {
                    moves[(row.Unit, next)] = moves.GetValueOrDefault((row.Unit, next)) + 1;
                }
            }
        }

        for (int u = 0; u < units.Length; u++)
        {
            units[u].PeakInService = Peak(log, u, units[u].Stays);
        }

        return (units, moves);
    }

    /// <summary>
    /// Most stays of unit <paramref name="unit"/> in service at once; a stay ending exactly when another starts does not
    /// overlap it, and a stay still running holds its server to the extract's end. One unit at a time, so that only
    /// that unit's times are held twice.
    /// </summary>
    private static int Peak(MovementLog log, int unit, int stays)
    {
        long[] starts = new long[stays];
        long[] ends = new long[stays];
        int n = 0;
        for (int p = 0; p < log.Order.Length; p++)
        {
            ref readonly var row = ref log.Rows[log.Order[p]];
            if (row.Unit == unit)
            {
                starts[n] = row.ServiceStartMs;
                ends[n] = row.IsCensored || row.LeftMs > log.ExtractEndMs ? log.ExtractEndMs : row.LeftMs;
                n++;
            }
        }

        Array.Sort(starts);
        Array.Sort(ends);
        int current = 0;
        int peak = 0;
        int e = 0;
        foreach (long s in starts)
        {
            while (e < ends.Length && ends[e] <= s)
            {
                e++;
                current--;
            }

            current++;
            peak = Math.Max(peak, current);
        }

        return peak;
    }
}
