namespace NetSolve.Fitting.Reading;

/// <summary>
/// Puts the stays read into journeys: each patient's stays in time order (ties broken by the data: arrival, then
/// leaving, then unit id, then start of service; never the line), exact duplicates dropped, a gap past the
/// new-journey limit starting a new journey, overlapping and nested stays settled by the documented rules, and
/// for each stay what followed it.
/// </summary>
internal sealed class JourneyBuilder(StayTable rows, long extractStartMs, long extractEndMs, long newJourneyAfterMs)
{
    /// <summary>The stays kept, in canonical order: by patient, then time.</summary>
    public int[] Order { get; private set; } = [];

    /// <summary>For each stay in <see cref="Order"/>: the next unit, or a <see cref="StayOutcome"/>.</summary>
    public int[] Next { get; private set; } = [];

    /// <summary>For each stay in <see cref="Order"/>: whether it begins a journey inside the extract (an external arrival).</summary>
    public bool[] Enters { get; private set; } = [];

    /// <summary>Journeys, counting each readmission as one.</summary>
    public long Journeys { get; private set; }

    /// <summary>Rows equal to another in every column.</summary>
    public long Duplicates { get; private set; }

    /// <summary>Journeys after a patient's first.</summary>
    public long Readmissions { get; private set; }

    /// <summary>Stays that start before the previous stay ends and outlast it.</summary>
    public long Overlapping { get; private set; }

    /// <summary>Stays inside another stay.</summary>
    public long Nested { get; private set; }

    /// <summary>Rows arriving after a row of the same patient that the file puts later: the file is not in time order.</summary>
    public long RowsOutOfOrder { get; private set; }

    /// <summary>Stays wholly outside the extract.</summary>
    public long OutsideExtract { get; private set; }

    /// <summary>One located example of each kind of problem found, in canonical order, for <c>--strict</c>.</summary>
    public List<(int Line, int Unit, string Message)> Examples { get; } = [];

    /// <summary>When a stay ends for the journey rules: its leaving, or never when still running.</summary>
    public long EndOf(in StayRow row) => row.IsCensored || row.LeftMs > extractEndMs ? long.MaxValue : row.LeftMs;

    /// <summary>Sorts, groups and labels the stays.</summary>
    public void Build()
    {
        int[] sorted = new int[rows.Count];
        int inside = 0;
        for (int i = 0; i < rows.Count; i++)
        {
            ref readonly var row = ref rows[i];
            // A stay ending at the extract's start is outside it unless it also began there (a stay of no length).
            bool endedBefore = !row.IsCensored && (row.LeftMs < extractStartMs || (row.LeftMs == extractStartMs && row.ArrivedMs < extractStartMs));
            if (endedBefore || row.ArrivedMs > extractEndMs)
            {
                OutsideExtract++;
                continue;
            }

            sorted[inside++] = i;
        }

        // Sorted and compacted in place: a 10-million-row log holds no second copy of its order.
        Array.Sort(sorted, 0, inside, Comparer<int>.Create(Compare));
        int kept = 0;
        for (int k = 0; k < inside; k++)
        {
            if (k > 0 && Compare(sorted[k - 1], sorted[k]) == 0)
            {
                Duplicates++;
                Example(sorted[k], "the row repeats another row exactly (a duplicate; dropped)");
                continue;
            }

            sorted[kept++] = sorted[k];
        }

        Array.Resize(ref sorted, kept);
        Order = sorted;
        Next = new int[Order.Length];
        Enters = new bool[Order.Length];
        for (int start = 0; start < Order.Length;)
        {
            int end = start + 1;
            while (end < Order.Length && rows[Order[end]].Patient == rows[Order[start]].Patient)
            {
                end++;
            }

            CountRowsOutOfOrder(start, end);
            Patient(start, end);
            start = end;
        }
    }

    /// <summary>Labels the stays of one patient, positions <paramref name="start"/> to <paramref name="end"/> (exclusive).</summary>
    private void Patient(int start, int end)
    {
        int main = start;
        Journeys++;
        Enters[start] = rows[Order[start]].ArrivedMs >= extractStartMs;
        for (int p = start + 1; p < end; p++)
        {
            ref readonly var current = ref rows[Order[p]];
            long mainEnd = EndOf(rows[Order[main]]);
            if (current.ArrivedMs >= mainEnd)
            {
                if (current.ArrivedMs - mainEnd > newJourneyAfterMs)
                {
                    Next[main] = StayOutcome.Exit;
                    Readmissions++;
                    Journeys++;
                    Enters[p] = true;
                    Example(Order[p], "a new journey of the same patient (a readmission after a long gap)");
                }
                else
                {
                    Next[main] = current.Unit;
                }

                main = p;
            }
            else if (EndOf(current) <= mainEnd)
            {
                Nested++;
                Next[p] = StayOutcome.SideVisit;
                Example(Order[p], "the stay lies inside another stay of the same patient (a side visit; kept out of routing)");
            }
            else
            {
                Overlapping++;
                Next[main] = current.Unit;
                Example(Order[p], "the stay begins before the patient's previous stay ends (an overlap; taken as a transfer)");
                main = p;
            }
        }

        Next[main] = EndOf(rows[Order[main]]) == long.MaxValue ? StayOutcome.StillRunning : StayOutcome.Exit;
    }

    /// <summary>
    /// Counts the stays of one patient that arrive earlier than a stay the file puts before them: walking back from
    /// the latest arrival, a stay is out of order when a later-arriving one has a smaller line.
    /// </summary>
    private void CountRowsOutOfOrder(int start, int end)
    {
        int earliestLineLater = int.MaxValue;
        for (int runEnd = end; runEnd > start;)
        {
            long arrived = rows[Order[runEnd - 1]].ArrivedMs;
            int runStart = runEnd - 1;
            while (runStart > start && rows[Order[runStart - 1]].ArrivedMs == arrived)
            {
                runStart--;
            }

            int earliestLineHere = int.MaxValue;
            for (int p = runStart; p < runEnd; p++)
            {
                int line = rows[Order[p]].Line;
                earliestLineHere = Math.Min(earliestLineHere, line);
                if (earliestLineLater < line)
                {
                    RowsOutOfOrder++;
                    Example(Order[p], "the row arrives before an earlier row of the same patient (rows out of order)");
                }
            }

            earliestLineLater = Math.Min(earliestLineLater, earliestLineHere);
            runEnd = runStart;
        }
    }

    private void Example(int index, string message)
    {
        if (Examples.Count < LogRowReader.MaxErrors)
        {
            Examples.Add((rows[index].Line, rows[index].Unit, message));
        }
    }

    private int Compare(int a, int b)
    {
        ref readonly var x = ref rows[a];
        ref readonly var y = ref rows[b];
        int c = x.Patient.CompareTo(y.Patient);
        if (c == 0)
        {
            c = x.ArrivedMs.CompareTo(y.ArrivedMs);
        }

        if (c == 0)
        {
            c = EndOf(x).CompareTo(EndOf(y));
        }

        if (c == 0)
        {
            c = x.Unit.CompareTo(y.Unit);
        }

        if (c == 0)
        {
            c = x.StartedMs.CompareTo(y.StartedMs);
        }

        return c == 0 ? x.LeftMs.CompareTo(y.LeftMs) : c;
    }
}
