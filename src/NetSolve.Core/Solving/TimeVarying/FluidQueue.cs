namespace NetSolve.Solving;

/// <summary>
/// The fallback for a large unit whose offered load reaches its servers for a while: MOL where it holds, and a fluid
/// queue where the load reaches the servers and while the backlog drains.
/// </summary>
/// <remarks>
/// The fluid x(t) of patients in the unit obeys x' = λ(t) − μ·min(x, c(t)) (the deterministic limit of the queue:
/// Newell, <i>Applications of Queueing Theory</i>, 2nd ed., Chapman and Hall 1982, chapter 2; Mandelbaum, Massey and
/// Reiman, "Strong approximations for Markovian service networks", Queueing Systems 30, 1998), solved on the grid
/// cycle after cycle until it repeats. In a block where x ≥ c or m ≥ c, every arrival waits and the queue is x − c;
/// elsewhere the queue is the larger of Erlang C at m and x − c. The fluid leaves out chance, so it understates the
/// queue near the turning points where load and servers are close. Thread-safe.
/// </remarks>
public static class FluidQueue
{
    // Cycles of the fluid before giving up: once the backlog empties within a cycle it repeats exactly next cycle.
    private const int MaxCycles = 10_000;

    // Relative: the fluid repeats when the start of the cycle moves less than this share of the servers.
    private const double RepeatTolerance = 1e-9;

    /// <summary>Hourly waits of one unit; the caller has checked that arrivals over the cycle are below capacity.</summary>
    /// <param name="unit">The unit's load over the cycle.</param>
    /// <param name="roster">Servers by hour.</param>
    /// <param name="meanServiceHours">1/μ, positive.</param>
    public static HourlyWaits Evaluate(UnitLoadOverCycle unit, ServerRoster roster, double meanServiceHours)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(roster);
        double[] fluid = PeriodicFluid(unit, roster, 1.0 / meanServiceHours);
        var blocks = LoadBlocks.Of(unit, roster);
        var hours = new HourAccumulator(blocks.CycleHours);
        int step = 0;
        for (int b = 0; b < blocks.Count; b++)
        {
            double content = 0.0;
            for (int k = 0; k < blocks.Steps[b]; k++, step++)
            {
                content += 0.5 * (fluid[step] + fluid[step + 1]);
            }

            content /= Math.Max(1, blocks.Steps[b]);
            double load = blocks.Load[b];
            int servers = blocks.Servers[b];
            double backlog = Math.Max(0.0, content - servers);
            double queue;
            double allBusy;
            if (load >= servers || backlog > 0.0)
            {
                queue = backlog;
                allBusy = 1.0;
            }
            else
            {
                allBusy = load > 0.0 ? ErlangFormulas.WaitProbability(servers, load) : 0.0;
                queue = load > 0.0 ? allBusy * load / (servers - load) : 0.0;
            }

            double inService = Math.Min(Math.Max(content, load), servers);
            hours.Add(LoadBlocks.HourOf(b), blocks.Steps[b], queue, queue + inService, allBusy, blocks.Arrivals[b]);
        }

        return hours.ToWaits(TimeVaryingMethodNames.ModifiedOfferedLoadWithFluid, unit.StepsPerHour);
    }

    private static double[] PeriodicFluid(UnitLoadOverCycle unit, ServerRoster roster, double servicePerHour)
    {
        int steps = unit.ArrivalsByStep.Length;
        double stepHours = 1.0 / unit.StepsPerHour;
        var x = new double[steps + 1];
        x[0] = unit.LoadByNode[0];
        for (int cycle = 1; cycle <= MaxCycles; cycle++)
        {
            for (int k = 0; k < steps; k++)
            {
                int servers = roster.At(k / unit.StepsPerHour);
                double served = servicePerHour * Math.Min(x[k], servers);
                x[k + 1] = Math.Max(0.0, x[k] + (stepHours * (unit.ArrivalsByStep[k] - served)));
            }

            double moved = Math.Abs(x[steps] - x[0]);
            x[0] = x[steps];
            if (moved <= RepeatTolerance * Math.Max(1.0, roster.Max))
            {
                return x;
            }
        }

        throw new TimeVaryingConvergenceException("the fluid queue", Math.Abs(x[steps] - x[0]));
    }
}
