using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>
/// Indices of dispersion through the network: every flow described by its index of dispersion for counts
/// I(t) = Var N(t) / E N(t) as a function of the window t, one linear system per window over the whole network, and
/// each unit's arrival SCV from the robust-queueing supremum over windows (<see cref="RobustQueueingScv"/>). After
/// W. Whitt and W. You, Naval Research Logistics 69(1), 2022, pp. 36–56 (from memory), with the covariances between
/// flows carried so that loops of routes amplify the counts as they do (docs/methods.md, "Indices of dispersion").
/// </summary>
/// <remarks>
/// <para>
/// Per window t, with counts scaled per hour (the covariance of the counts over t, divided by t), a vector A of the
/// arrival counts of the units, D of their departures:
/// </para>
/// <list type="bullet">
/// <item>splitting (exact for counts): routing the departures of unit i independently adds the multinomial noise
/// λ_i(diag(p_i) − p_i p_iᵀ), so one routed stream has index p·I_d + 1 − p;</item>
/// <item>merging (exact for counts): A_j is the sum of its external stream and the routed streams, covariances
/// included; for independent streams its index is the rate-weighted average;</item>
/// <item>departures: D_i = √w_i(t)·A_i + √(1 − w_i(t))·S_i with S_i the service completions (index I_s,i(t),
/// independent of the rest), so I_d = w·I_a + (1 − w)·I_s, w from <see cref="DepartureDispersionWeight"/>.</item>
/// </list>
/// <para>
/// Hence A = (I − PᵀΩ)⁻¹(A₀ + PᵀΓS + R) with Ω = diag(√w), Γ = diag(√(1 − w)), and the covariance
/// C = M(C₀ + PᵀΓC_SΓP + C_R)Mᵀ, M = (I − PᵀΩ)⁻¹; I_a,j(t) = C_jj/λ_j. Over long windows (w = 1) this is the
/// exact long-run index of counts from the routing's visit counts (a unit with repeat-visit probability p and
/// Poisson arrivals: (1 + p)/(1 − p)). Unlimited servers keep no queue: w = 1 at every window (their departures are
/// their arrivals, exactly so for Poisson arrivals). A unit at a load of 1 or more passes on its service: w = 0.
/// </para>
/// <para>
/// Poisson external arrivals and exponential service everywhere give exactly the Jackson answer, ca² = 1 at every unit,
/// loops included (the product form makes every unit wait as with Poisson arrivals, although feedback makes its
/// arrival counts over-dispersed). Dense algebra, one inverse per window: networks of more than
/// <see cref="ArrivalVariability.DenseLimit"/> reached units keep the decomposition's SCVs. Departure SCVs in the
/// output stay the decomposition's. Thread-safe: no shared state.
/// </para>
/// </remarks>
internal static class DispersionNetwork
{
    /// <summary>Windows per factor of 10 on the log grid the indices are computed on.</summary>
    public const int WindowsPerDecade = 12;

    /// <summary>The shortest window, as a fraction of the shortest mean gap between arrivals at any unit.</summary>
    public const double ShortestWindowGaps = 1e-3;

    /// <summary>The longest window, as a multiple of the longest relaxation time of any unit (the robust-queueing window is below half of it).</summary>
    public const double LongestWindowRelaxations = 100.0;

    /// <summary>The arrival SCVs by indices of dispersion; departures as the decomposition gives them.</summary>
    public static ArrivalVariabilitySolution Solve(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes,
        ArrivalVariabilitySolution decomposition)
    {
        int reached = units.Count(unit => unit.ArrivalsPerHour > 0.0);
        if (reached == 0 || reached > ArrivalVariability.DenseLimit)
        {
            return decomposition;
        }

        var flows = DispersionFlows.Build(units, routes);
        if (flows.IsJackson)
        {
            return decomposition;
        }

        double[] windows = Windows(flows);
        var dispersion = new double[windows.Length][];
        for (int k = 0; k < windows.Length; k++)
        {
            dispersion[k] = flows.ArrivalDispersion(windows[k]);
        }

        var arrival = decomposition.ArrivalScv.ToBuilder();
        for (int a = 0; a < flows.Members.Length; a++)
        {
            int j = flows.Members[a];
            var unit = units[j];
            double rho = ArrivalVariabilitySystem.Load(unit);
            double[] index = [.. dispersion.Select(row => row[a])];
            arrival[j] = unit.Servers.IsUnlimited || rho >= 1.0 || rho <= 0.0
                ? ArrivalVariability.Clamp(flows.LongRun[a])
                : RobustQueueingScv.Equivalent(windows, index, unit.ArrivalsPerHour, flows.MeanServiceHours[a], unit.Servers.Count, rho, unit.ServiceScv);
        }

        return decomposition with { ArrivalScv = arrival.MoveToImmutable() };
    }

    /// <summary>Each unit's index of dispersion of arrivals over <paramref name="hours"/> (+∞ for the long run), by unit position; 1 for units no patient reaches.</summary>
    internal static ImmutableArray<double> ArrivalDispersion(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes, double hours)
    {
        ArrivalVariabilityChecks.Check(units, routes);
        var flows = DispersionFlows.Build(units, routes);
        double[] index = double.IsPositiveInfinity(hours) ? flows.LongRun : flows.ArrivalDispersion(hours);
        var result = Enumerable.Repeat(1.0, units.Count).ToArray();
        for (int a = 0; a < flows.Members.Length; a++)
        {
            result[flows.Members[a]] = index[a];
        }

        return [.. result];
    }

    /// <summary>A log grid from a thousandth of the shortest gap to a hundred relaxation times of the slowest unit.</summary>
    private static double[] Windows(DispersionFlows flows)
    {
        double shortest = ShortestWindowGaps * flows.ShortestGapHours;
        double longest = Math.Max(1e3 * shortest, LongestWindowRelaxations * flows.LongestRelaxationHours);
        int count = (int)Math.Ceiling(WindowsPerDecade * Math.Log10(longest / shortest)) + 1;
        double step = Math.Log(longest / shortest) / (count - 1);
        return [.. Enumerable.Range(0, count).Select(k => shortest * Math.Exp(k * step))];
    }
}
