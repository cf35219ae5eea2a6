namespace NetSolve.Solving;

/// <summary>
/// The linear system y = d + B·y in the deviations y_j = ca²_j − 1, with B kept by destination in compressed rows.
/// </summary>
/// <remarks>
/// Working in deviations from 1 is what makes the all-Poisson, all-exponential network come out exactly 1: every term
/// of d is then a product with a factor that is exactly 0, so d = 0 and every solver returns y = 0 (see
/// docs/methods.md, "Arrival variability through the network").
/// </remarks>
internal sealed class ArrivalVariabilitySystem
{
    private ArrivalVariabilitySystem(int unitCount)
    {
        Constant = new double[unitCount];
        SelfCoefficient = new double[unitCount];
        IsReached = new bool[unitCount];
        ServiceWeight = new double[unitCount];
        DepartureTerm = new double[unitCount];
        IncomingStart = new int[unitCount + 1];
    }

    public int UnitCount => Constant.Length;

    /// <summary>d_j: what unit j's arrival deviation would be if every upstream arrival stream were Poisson.</summary>
    public double[] Constant { get; }

    /// <summary>B_jj: the coefficient of a unit's own deviation through its repeat-visit route.</summary>
    public double[] SelfCoefficient { get; }

    /// <summary>True for units with a positive inflow; the others keep ca² = 1.</summary>
    public bool[] IsReached { get; }

    /// <summary>
    /// The weight of a unit's service in its departures: ρ_i² (ρ taken as 0 for unlimited servers and capped at 1),
    /// or as given by the caller (<see cref="VariabilityFunctions"/>).
    /// </summary>
    public double[] ServiceWeight { get; }

    /// <summary>ω_i(x_i − 1), ω_i the <see cref="ServiceWeight"/>: the service part of the departure deviation.</summary>
    public double[] DepartureTerm { get; }

    /// <summary>Row starts of the incoming coefficients of each destination, length units + 1.</summary>
    public int[] IncomingStart { get; }

    /// <summary>Source unit of each incoming coefficient (never the destination itself).</summary>
    public int[] Source { get; private set; } = [];

    /// <summary>B_ji, aligned with <see cref="Source"/>.</summary>
    public double[] Coefficient { get; private set; } = [];

    public bool HasZeroConstant => Array.TrueForAll(Constant, value => value == 0.0);

    /// <summary>Builds the system from checked inputs (<see cref="ArrivalVariability.Solve(IReadOnlyList{ArrivalVariabilityUnit}, IReadOnlyList{ArrivalVariabilityRoute})"/> checks them).</summary>
    /// <param name="units">The units.</param>
    /// <param name="routes">The routes.</param>
    /// <param name="serviceWeight">Each unit's weight of its service in its departures; null for ρ² (Whitt 1983).</param>
    /// <param name="mergingLoad">The load at which every merged stream is weighed; null for each destination's own load (Whitt 1983).</param>
    public static ArrivalVariabilitySystem Build(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes,
        IReadOnlyList<double>? serviceWeight = null, double? mergingLoad = null)
    {
        int n = units.Count;
        var system = new ArrivalVariabilitySystem(n);
        for (int i = 0; i < n; i++)
        {
            var unit = units[i];
            double rho = Load(unit);
            system.ServiceWeight[i] = serviceWeight?[i] ?? rho * rho;
            system.DepartureTerm[i] = system.ServiceWeight[i] * ServiceDeviation(unit);
        }

        // Inflow components of each destination: the external stream, then one stream per route into it.
        var inflow = new double[n];
        var sumOfSquares = new double[n];
        for (int j = 0; j < n; j++)
        {
            inflow[j] = units[j].ExternalPerHour;
        }

        foreach (var route in routes)
        {
            inflow[route.To] += units[route.From].ArrivalsPerHour * route.Probability;
        }

        for (int j = 0; j < n; j++)
        {
            system.IsReached[j] = inflow[j] > 0.0;
            double share = system.IsReached[j] ? units[j].ExternalPerHour / inflow[j] : 0.0;
            sumOfSquares[j] = share * share;
            system.Constant[j] = share * (units[j].ExternalScv - 1.0);
        }

        var stream = new double[routes.Count];
        for (int r = 0; r < routes.Count; r++)
        {
            var route = routes[r];
            if (system.IsReached[route.To])
            {
                double share = units[route.From].ArrivalsPerHour * route.Probability / inflow[route.To];
                stream[r] = share;
                sumOfSquares[route.To] += share * share;
                system.Constant[route.To] += share * route.Probability * system.DepartureTerm[route.From];
                if (route.From != route.To)
                {
                    system.IncomingStart[route.To + 1]++;
                }
            }
        }

        var weight = new double[n];
        for (int j = 0; j < n; j++)
        {
            weight[j] = system.IsReached[j] ? SuperpositionWeight(mergingLoad ?? Load(units[j]), sumOfSquares[j]) : 0.0;
            system.Constant[j] *= weight[j];
            system.IncomingStart[j + 1] += system.IncomingStart[j];
        }

        system.FillCoefficients(routes, stream, weight);
        return system;
    }

    /// <summary>ρ per server, 0 for unlimited servers, at most 1.</summary>
    public static double Load(ArrivalVariabilityUnit unit) => unit.Servers.IsUnlimited ? 0.0 : Math.Min(1.0, unit.Utilisation);

    /// <summary>x_i − 1 = (cs²_i − 1)/√c_i, with cs² floored at <see cref="ArrivalVariability.MinimumDepartureServiceScv"/>; 0 for unlimited servers.</summary>
    private static double ServiceDeviation(ArrivalVariabilityUnit unit) => unit.Servers.IsUnlimited
        ? 0.0
        : (Math.Max(unit.ServiceScv, ArrivalVariability.MinimumDepartureServiceScv) - 1.0) / Math.Sqrt(unit.Servers.Count);

    /// <summary>w = 1 / (1 + 4(1 − ρ)²(v − 1)) with v = 1 / Σ shares², ρ the load the merged stream is weighed at.</summary>
    internal static double SuperpositionWeight(double rho, double sumOfSquares)
    {
        double v = 1.0 / sumOfSquares;
        double idle = 1.0 - rho;
        return 1.0 / (1.0 + (ArrivalVariability.SuperpositionFactor * idle * idle * (v - 1.0)));
    }

    private void FillCoefficients(IReadOnlyList<ArrivalVariabilityRoute> routes, double[] stream, double[] weight)
    {
        int n = UnitCount;
        Source = new int[IncomingStart[n]];
        Coefficient = new double[IncomingStart[n]];
        var fill = (int[])IncomingStart.Clone();
        for (int r = 0; r < routes.Count; r++)
        {
            var (from, to, probability) = routes[r];
            if (!IsReached[to])
            {
                continue;
            }

            double coefficient = weight[to] * stream[r] * probability * (1.0 - ServiceWeight[from]);
            if (from == to)
            {
                SelfCoefficient[to] += coefficient;
            }
            else
            {
                int slot = fill[to]++;
                Source[slot] = from;
                Coefficient[slot] = coefficient;
            }
        }
    }
}
