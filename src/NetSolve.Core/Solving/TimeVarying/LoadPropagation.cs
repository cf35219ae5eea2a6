using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// The time-varying traffic equations of a network of infinite-server units over one periodic cycle: per unit, the
/// arrival rate λ_j(t) = external_j(t) + Σ_i δ_i(t)·p_ij and the offered load m_j(t), the mean number of patients
/// who would be in service if nobody ever waited.
/// </summary>
/// <remarks>
/// <para>
/// Massey and Whitt, "Networks of infinite-server queues with nonstationary Poisson input", Queueing Systems 13
/// (1993) 183–250: with unlimited servers the units do not interact except through the departure rates δ_i, so the
/// offered loads solve linear equations. With service written as exponential stages (<see cref="ServiceStages"/>)
/// each stage s obeys x_s'(t) = u_s(t) − r_s·x_s(t), the unit's load is Σ_s x_s and its departure rate
/// Σ_s (1 − q_s)·r_s·x_s; for exponential service this is m'(t) = λ(t) − μ·m(t).
/// </para>
/// <para>
/// Each stage is solved to its periodic steady state exactly by <see cref="PeriodicStage"/>. Units are visited
/// upstream first (<see cref="ComponentOrder"/>), so a network without loops is exact after one sweep; the units of
/// a loop (a strongly connected set) are solved again with the latest flows (Gauss–Seidel over whole cycles), and
/// only while a flow into them changes by more than <see cref="TimeVaryingOptions.LoopTolerance"/> of the largest;
/// a loop settles before any unit below it is solved. Each sweep shrinks the error by the share of patients returning
/// round the loop, not by the service times, so long stays cost no more sweeps.
/// </para>
/// </remarks>
internal static class LoadPropagation
{
    /// <summary>Arrival rate per hour in each step (mean over the step) and offered load at each step boundary.</summary>
    public static (double[][] ArrivalsByStep, double[][] LoadByNode) Run(
        int unitCount, int steps, double stepHours, IReadOnlyList<FlowGroupPlan> groups, TimeVaryingOptions options, double[]?[]? admittedShare = null)
    {
        var arrivals = new double[unitCount][];
        var loads = new double[unitCount][];
        for (int j = 0; j < unitCount; j++)
        {
            arrivals[j] = new double[steps];
            loads[j] = new double[steps + 1];
        }

        var work = new Workspace(steps);
        foreach (var group in groups)
        {
            Propagate(group, steps, stepHours, options, work, arrivals, loads, admittedShare);
        }

        return (arrivals, loads);
    }

    private static void Propagate(FlowGroupPlan group, int steps, double stepHours, TimeVaryingOptions options, Workspace work, double[][] arrivals, double[][] loads, double[]?[]? admittedShare)
    {
        var routing = group.Routing;
        int n = routing.UnitCount;
        var reached = routing.ReachedUnits();
        var setSizes = new List<int>();
        int[] order = ComponentOrder.Upstream(routing, reached, setSizes);
        var incoming = IncomingRoutes.Build(routing);
        var departures = new double[n][];
        var groupArrivals = new double[n][];
        var groupLoads = new double[n][];
        foreach (int j in order)
        {
            departures[j] = new double[steps + 1];
            groupArrivals[j] = new double[steps];
            groupLoads[j] = new double[steps + 1];
        }

        // Strongly connected sets upstream first: a set without a loop is exact after one solve of its unit, since
        // everything above it is final; a loop is swept (Gauss–Seidel over whole cycles) until it settles, and only
        // then is anything below it solved.
        var changed = new bool[n];
        double largestFlow = 0.0;
        int first = 0;
        foreach (int size in setSizes)
        {
            var set = new ArraySegment<int>(order, first, size);
            first += size;
            bool isLoop = size > 1 || RoutesToItself(routing, set[0]);
            for (int sweep = 1; ; sweep++)
            {
                double largestChange = 0.0;
                foreach (int j in set)
                {
                    if (sweep > 1 && !incoming.AnySource(j, changed))
                    {
                        changed[j] = false;
                        continue;
                    }

                    SolveUnit(group, j, steps, stepHours, incoming, departures, work, groupArrivals[j], groupLoads[j], admittedShare?[j]);
                    double change = 0.0;
                    var previous = departures[j];
                    for (int k = 0; k <= steps; k++)
                    {
                        change = Math.Max(change, Math.Abs(work.Departures[k] - previous[k]));
                        largestFlow = Math.Max(largestFlow, Math.Abs(work.Departures[k]));
                        previous[k] = work.Departures[k];
                    }

                    changed[j] = change > options.LoopTolerance * largestFlow;
                    largestChange = Math.Max(largestChange, change);
                }

                if (!isLoop || largestChange <= options.LoopTolerance * largestFlow)
                {
                    break;
                }

                if (sweep >= options.MaxLoopSweeps)
                {
                    throw new TimeVaryingConvergenceException("the flows round loops of routes", largestChange / largestFlow);
                }
            }

            // The set is final: its flows count as unchanged for the sets below it, which are solved after it.
            foreach (int j in set)
            {
                changed[j] = false;
            }
        }

        foreach (int j in order)
        {
            Add(groupArrivals[j], arrivals[j]);
            Add(groupLoads[j], loads[j]);
        }
    }

    private static bool RoutesToItself(RoutingTable routing, int unit)
    {
        for (int e = routing.Offsets[unit]; e < routing.Offsets[unit + 1]; e++)
        {
            if (routing.Targets[e] == unit && routing.Probabilities[e] > 0.0)
            {
                return true;
            }
        }

        return false;
    }

    // The unit's arrivals and load are those offered to it; when it sends some away, its departures are those of the
    // admitted share only (the stages are linear, so they are solved again for the admitted input).
    private static void SolveUnit(FlowGroupPlan group, int j, int steps, double stepHours, IncomingRoutes incoming, double[][] departures, Workspace work, double[] unitArrivals, double[] unitLoads, double[]? admitted)
    {
        incoming.Sum(j, departures, work.Inflow);
        var external = group.ExternalByStep[j];
        for (int k = 0; k < steps; k++)
        {
            double outside = external is null ? 0.0 : external[k];
            work.InputStart[k] = outside + work.Inflow[k];
            work.InputEnd[k] = outside + work.Inflow[k + 1];
            unitArrivals[k] = outside + (0.5 * (work.Inflow[k] + work.Inflow[k + 1]));
        }

        UnitStages.Solve(group.Stages[j], stepHours, work, unitLoads, work.Departures);
        if (admitted is null)
        {
            return;
        }

        for (int k = 0; k < steps; k++)
        {
            work.InputStart[k] *= admitted[k];
            work.InputEnd[k] *= admitted[k];
        }

        UnitStages.Solve(group.Stages[j], stepHours, work, new double[steps + 1], work.Departures);
    }

    private static void Add(double[] from, double[] into)
    {
        for (int k = 0; k < from.Length; k++)
        {
            into[k] += from[k];
        }
    }
}
