namespace NetSolve.Solving;

/// <summary>
/// A unit's load over the cycle in short blocks (<see cref="PerHour"/> to the hour): the mean offered load and
/// arrival rate in each, with the servers of its hour. MOL evaluates Erlang C once per block, not once per step.
/// </summary>
internal sealed class LoadBlocks
{
    /// <summary>Blocks per hour: five minutes, fine against hourly profiles and rosters, cheap for many servers.</summary>
    public const int PerHour = 12;

    private LoadBlocks(double[] load, double[] arrivals, int[] servers, int[] steps, int cycleHours)
    {
        Load = load;
        Arrivals = arrivals;
        Servers = servers;
        Steps = steps;
        CycleHours = cycleHours;
    }

    /// <summary>Mean offered load in each block.</summary>
    public double[] Load { get; }

    /// <summary>Mean arrival rate per hour in each block.</summary>
    public double[] Arrivals { get; }

    /// <summary>Servers in each block.</summary>
    public int[] Servers { get; }

    /// <summary>Grid steps in each block (its weight in the hour).</summary>
    public int[] Steps { get; }

    /// <summary>Hours in the cycle.</summary>
    public int CycleHours { get; }

    /// <summary>Number of blocks.</summary>
    public int Count => Load.Length;

    /// <summary>The hour a block lies in.</summary>
    public static int HourOf(int block) => block / PerHour;

    /// <summary>Splits a unit's load into blocks.</summary>
    public static LoadBlocks Of(UnitLoadOverCycle unit, ServerRoster roster)
    {
        int stepsPerHour = unit.StepsPerHour;
        int cycleHours = unit.ArrivalsByStep.Length / stepsPerHour;
        int count = cycleHours * PerHour;
        var load = new double[count];
        var arrivals = new double[count];
        var servers = new int[count];
        var steps = new int[count];
        for (int b = 0; b < count; b++)
        {
            int hour = HourOf(b);
            int within = b % PerHour;
            int first = (hour * stepsPerHour) + (within * stepsPerHour / PerHour);
            int end = (hour * stepsPerHour) + ((within + 1) * stepsPerHour / PerHour);
            for (int k = first; k < end; k++)
            {
                load[b] += 0.5 * (unit.LoadByNode[k] + unit.LoadByNode[k + 1]);
                arrivals[b] += unit.ArrivalsByStep[k];
            }

            steps[b] = end - first;
            load[b] /= Math.Max(1, steps[b]);
            arrivals[b] /= Math.Max(1, steps[b]);
            servers[b] = roster.At(hour);
        }

        return new LoadBlocks(load, arrivals, servers, steps, cycleHours);
    }
}
