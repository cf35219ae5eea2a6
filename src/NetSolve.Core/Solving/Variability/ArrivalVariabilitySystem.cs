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
        SquaredUtilisation = new double[unitCount];
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

    /// <summary>ρ_i², with ρ taken as 0 for unlimited servers and capped at 1.</summary>
    public double[] SquaredUtilisation { get; }

    /// <summary>ρ_i²(x_i − 1): the service part of the departure deviation.</summary>
    public double[] DepartureTerm { get; }

    /// <summary>Row starts of the incoming coefficients of each destination, length units + 1.</summary>
    public int[] IncomingStart { get; }

    /// <summary>Source unit of each incoming coefficient (never the destination itself).</summary>
    public int[] Source { get; private set; } = [];

    /// <summary>B_ji, aligned with <see cref="Source"/>.</summary>
    public double[] Coefficient { get; private set; } = [];

    public bool HasZeroConstant => Array.TrueForAll(Constant, value => value == 0.0);

    /// <summary>Builds the system from checked inputs (<see cref="ArrivalVariability.Solve(IReadOnlyList{ArrivalVariabilityUnit}, IReadOnlyList{ArrivalVariabilityRoute})"/> checks them).</summary>
    public static ArrivalVariabilitySystem Build(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes)
    {
        int n = units.Count;
        var system = new ArrivalVariabilitySystem(n);
        for (int i = 0; i < n; i++)
        {
            var unit = units[i];
            double rho = unit.Servers.IsUnlimited ? 0.0 : Math.Min(1.0, unit.Utilisation);
            system.SquaredUtilisation[i] = rho * rho;
            system.DepartureTerm[i] = rho * rho * ServiceDeviation(unit);
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
            weight[j] = system.IsReached[j] ? SuperpositionWeight(units[j], sumOfSquares[j]) : 0.0;
            system.Constant[j] *= weight[j];
            system.IncomingStart[j + 1] += system.IncomingStart[j];
        }

        system.FillCoefficients(routes, stream, weight);
        return system;
    }

    /// <summary>x_i − 1 = (cs²_i − 1)/√c_i, with cs² floored at <see cref="ArrivalVariability.MinimumDepartureServiceScv"/>; 0 for unlimited servers.</summary>
    private static double ServiceDeviation(ArrivalVariabilityUnit unit) => unit.Servers.IsUnlimited
        ? 0.0
        : (Math.Max(unit.ServiceScv, ArrivalVariability.MinimumDepartureServiceScv) - 1.0) / Math.Sqrt(unit.Servers.Count);

    /// <summary>w_j = 1 / (1 + 4(1 − ρ_j)²(v_j − 1)) with v_j = 1 / Σ shares²; ρ_j = 0 for unlimited servers.</summary>
    private static double SuperpositionWeight(ArrivalVariabilityUnit unit, double sumOfSquares)
    {
        double rho = unit.Servers.IsUnlimited ? 0.0 : Math.Min(1.0, unit.Utilisation);
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

            double coefficient = weight[to] * stream[r] * probability * (1.0 - SquaredUtilisation[from]);
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
