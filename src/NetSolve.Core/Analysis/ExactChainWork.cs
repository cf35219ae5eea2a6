using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// A rough count, before any work is done, of what <see cref="HourlyStaffingSearch"/> costs when every trial roster
/// is judged by the exact periodic chain (<see cref="HourlyStaffingOptions.ExactChain"/>), in state-steps: one step of
/// the chain over one state. The chain's cost is its states times its steps per cycle times the cycles it runs to
/// settle; a unit with fast service and many servers needs many steps per hour (each step covers at most half an
/// expected jump), and a unit near saturation many states, so a planner's slip there can ask for hours of work.
/// </summary>
/// <remarks>
/// The count takes each unit's busiest hour at the roster the search starts from (one server above the offered load),
/// the cycles the chain runs to settle from the relaxation time there (1 / (c·μ·(1 − √ρ)²), as <see cref="RelaxationTime"/>
/// takes it, times ln(1/tolerance) ≈ 23 time constants, in cycles; at least <see cref="FewestCycles"/>) and
/// <see cref="TypicalEvaluations"/> trial rosters per unit (one pass adding servers and one removing them, an hour
/// each); units whose servers exceed
/// <see cref="ExactChainOptions.MaxServers"/> are solved by MOL and cost nothing here. It is an order of magnitude,
/// meant to tell a run of seconds from one of hours, not a forecast.
/// </remarks>
public static class ExactChainWork
{
    /// <summary>Cycles the chain runs at least before it is seen to settle.</summary>
    public const double FewestCycles = 3.0;

    /// <summary>Trial rosters per unit in a typical search: an adding pass and a removing pass over 24 hours, and the first.</summary>
    public const double TypicalEvaluations = 49.0;

    /// <summary>Largest expected jumps in one step of the chain, as <see cref="ExactChainOptions.MaxJumpsPerStep"/>.</summary>
    private static readonly double JumpsPerStep = ExactChainOptions.Default.MaxJumpsPerStep;

    /// <summary>The estimated state-steps of an exact-chain roster search over every unit with finite servers of <paramref name="network"/>.</summary>
    public static double Estimate(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var traffic = TimeVaryingTraffic.Solve(network);
        double work = 0.0;
        for (int i = 0; i < network.Units.Length; i++)
        {
            if (!network.Units[i].Servers.IsUnlimited)
            {
                work += ForUnit(traffic.Units[i]);
            }
        }

        return work;
    }

    /// <summary>The estimated state-steps of the search for one unit.</summary>
    public static double ForUnit(UnitLoadOverCycle load)
    {
        ArgumentNullException.ThrowIfNull(load);
        double mostLoad = load.OfferedLoadByHour.DefaultIfEmpty(0.0).Max();
        double mostArrivals = load.ArrivalsPerHourByHour.DefaultIfEmpty(0.0).Max();
        double meanArrivals = load.ArrivalsPerHourByHour.DefaultIfEmpty(0.0).Average();
        if (!(mostLoad > 0.0) || !(meanArrivals > 0.0) || !double.IsFinite(mostLoad) || !double.IsFinite(mostArrivals))
        {
            return 0.0;
        }

        double servers = Math.Floor(mostLoad) + 1.0;
        if (servers > ExactChainOptions.Default.MaxServers)
        {
            return 0.0;
        }

        double meanServiceHours = load.OfferedLoadByHour.Average() / meanArrivals;
        double stepsPerHour = Math.Max(1.0, Math.Ceiling((mostArrivals + (servers / meanServiceHours)) / JumpsPerStep));
        double busiest = Math.Clamp(mostLoad / servers, 0.5, 0.999);
        double states = servers + Math.Ceiling(Math.Log(ExactChainOptions.Default.TruncationMass) / Math.Log(busiest));
        double relaxationHours = meanServiceHours / (servers * Math.Pow(1.0 - Math.Sqrt(busiest), 2.0));
        double cycleHours = load.OfferedLoadByHour.Length;
        double cycles = Math.Max(FewestCycles, Math.Ceiling(relaxationHours * -Math.Log(ExactChainOptions.Default.Tolerance) / cycleHours));
        return TypicalEvaluations * cycles * states * stepsPerHour * cycleHours;
    }
}
