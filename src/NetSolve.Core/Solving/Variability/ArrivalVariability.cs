using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Double;
using MathNet.Numerics.LinearAlgebra.Double.Solvers;
using MathNet.Numerics.LinearAlgebra.Solvers;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// The squared coefficient of variation (SCV) of the arrival flow at every unit of an open network, by the two-moment
/// linear equations of W. Whitt, Bell System Technical Journal 62(9), 1983, pp. 2779–2815.
/// </summary>
/// <remarks>
/// <para>Per unit i with arrival SCV ca²_i, service SCV cs²_i, c_i servers at load ρ_i per server:</para>
/// <list type="bullet">
/// <item>departures: cd²_i = 1 + (1 − ρ_i²)(ca²_i − 1) + ρ_i²(max(cs²_i, 0.2) − 1)/√c_i;</item>
/// <item>splitting: the stream i → j with probability p_ij has SCV p_ij·cd²_i + 1 − p_ij;</item>
/// <item>merging (refined superposition): ca²_j = w_j Σ_k (λ_kj/λ_j) c²_kj + 1 − w_j, with
/// w_j = 1 / (1 + 4(1 − ρ_j)²(v_j − 1)) and v_j = 1 / Σ_k (λ_kj/λ_j)², the external stream counting as one k.</item>
/// </list>
/// <para>
/// The equations are linear in the ca² and are solved in the deviations ca² − 1, so that a network with Poisson
/// external arrivals and exponential service everywhere gets exactly 1.0 at every unit (the Jackson case). Up to
/// <see cref="DenseLimit"/> reached units by dense LU (MathNet.Numerics); above it by Gauss–Seidel sweeps in
/// upstream-first order, falling back to BiCGStab if they stall; the residual is always checked.
/// </para>
/// <para>
/// Unlimited servers: ρ is taken as 0 (the limit of the formula as c → ∞), so departures carry the arrival SCV
/// unchanged; with Poisson arrivals this is exact (the output of an M/G/∞ queue is Poisson). A load of 1 or more is
/// taken as 1: departures are then the service completions, with SCV x_i. A unit with no inflow gets ca² = cd² = 1.
/// Results are clamped to [0, <see cref="MaxScv"/>]; they are never NaN. Thread-safe: no shared state.
/// </para>
/// <para>
/// <see cref="ArrivalVariabilityMethod.VariabilityFunctions"/> solves the same equations once more per unit, at that
/// unit's time scale (<see cref="VariabilityFunctions"/>); an option, measured in docs/methods.md, not the default.
/// </para>
/// </remarks>
public static class ArrivalVariability
{
    /// <summary>Largest number of reached units solved densely (the traffic equations' measured limit, docs/performance.md).</summary>
    public const int DenseLimit = TrafficEquations.DenseLimit;

    /// <summary>Iteration cap of the sparse solvers (sweeps, then BiCGStab iterations).</summary>
    public const int MaxIterations = 2_000;

    /// <summary>Absolute, in SCV units (relative above an SCV of 1): sweeping stops when no SCV changes by more than this.</summary>
    public const double SweepTolerance = 1e-13;

    /// <summary>Absolute, in SCV units (relative above an SCV of 1): the largest residual of the equations accepted.</summary>
    public const double ResidualTolerance = 1e-9;

    /// <summary>Largest SCV returned (a coefficient of variation of 100); larger values are clamped to it.</summary>
    /// <remarks>The equations form weighted averages of 1, the external SCVs and the service terms, so this binds only for absurd inputs.</remarks>
    public const double MaxScv = 10_000.0;

    /// <summary>The service SCV below which departures are taken no smoother: Whitt (1983) floors cs² at 0.2 in the departure formula.</summary>
    public const double MinimumDepartureServiceScv = 0.2;

    /// <summary>The 4 in the superposition weight w = 1 / (1 + 4(1 − ρ)²(v − 1)) (Whitt 1983).</summary>
    public const double SuperpositionFactor = 4.0;

    /// <summary>The arrival and departure SCV of every unit.</summary>
    /// <param name="units">One entry per unit, by position; see <see cref="ArrivalVariabilityUnit"/> for the ranges.</param>
    /// <param name="routes">Routing fractions between units; at most one per (from, to) pair; out of a unit they add up to at most 1.</param>
    /// <exception cref="ArgumentNullException">An argument or unit is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A rate, load or SCV is negative or not finite, or a route is out of range.</exception>
    /// <exception cref="ArgumentException">A (from, to) pair is given twice, or a unit's routes add up to more than 1.</exception>
    /// <exception cref="ArrivalVariabilityException">The residual stays above <see cref="ResidualTolerance"/>.</exception>
    public static ArrivalVariabilitySolution Solve(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes) =>
        Solve(units, routes, TrafficSolveMethod.Automatic);

    /// <summary>
    /// The arrival and departure SCV of every unit of the top-level patient flow of <paramref name="network"/>: service
    /// SCV from each unit's <see cref="Unit.EffectiveService"/>, external SCV from each <see cref="Arrival.Cv"/>.
    /// </summary>
    /// <param name="network">A validated network.</param>
    /// <param name="arrivalsPerHour">Flow into each unit from the traffic equations, by unit position.</param>
    /// <param name="utilisations">Load per server of each unit, by unit position (ignored for unlimited servers).</param>
    /// <exception cref="ArgumentException">A list's length differs from the number of units.</exception>
    public static ArrivalVariabilitySolution SolveNetwork(Network network, IReadOnlyList<double> arrivalsPerHour, IReadOnlyList<double> utilisations)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(arrivalsPerHour);
        ArgumentNullException.ThrowIfNull(utilisations);
        int n = network.Units.Length;
        if (arrivalsPerHour.Count != n || utilisations.Count != n)
        {
            throw new ArgumentException("One flow and one utilisation per unit are needed.", nameof(arrivalsPerHour));
        }

        var index = network.BuildIndex();
        var units = new ArrivalVariabilityUnit[n];
        for (int i = 0; i < n; i++)
        {
            double cv = network.Units[i].EffectiveService.Cv;
            units[i] = new ArrivalVariabilityUnit(arrivalsPerHour[i], network.Units[i].Servers, utilisations[i], cv * cv);
        }

        foreach (var arrival in network.Arrivals)
        {
            int i = index[arrival.UnitId];
            double external = units[i].ExternalPerHour + arrival.PerHour;
            double scv = external > 0.0
                ? ((units[i].ExternalPerHour * units[i].ExternalScv) + (arrival.PerHour * arrival.Cv * arrival.Cv)) / external
                : 1.0;
            units[i] = units[i] with { ExternalPerHour = external, ExternalScv = scv };
        }

        var routes = network.Routes.Select(route => new ArrivalVariabilityRoute(index[route.From], index[route.To], route.Probability)).ToArray();
        return Solve(units, routes);
    }

    /// <summary>
    /// As <see cref="Solve(IReadOnlyList{ArrivalVariabilityUnit}, IReadOnlyList{ArrivalVariabilityRoute})"/>, with the
    /// arrival SCV of each unit from the chosen method (docs/methods.md, "Arrival variability through the network").
    /// </summary>
    /// <param name="units">One entry per unit, by position.</param>
    /// <param name="routes">Routing fractions between units.</param>
    /// <param name="method">The decomposition (the default) or its variability functions.</param>
    public static ArrivalVariabilitySolution Solve(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes, ArrivalVariabilityMethod method) =>
        Solve(units, routes, TrafficSolveMethod.Automatic, method);

    /// <summary>As <see cref="Solve(IReadOnlyList{ArrivalVariabilityUnit}, IReadOnlyList{ArrivalVariabilityRoute})"/> with the method forced, for tests.</summary>
    internal static ArrivalVariabilitySolution Solve(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes, TrafficSolveMethod method,
        ArrivalVariabilityMethod variability = ArrivalVariabilityMethod.Decomposition)
    {
        ArrivalVariabilityChecks.Check(units, routes);
        var system = ArrivalVariabilitySystem.Build(units, routes);
        int reached = system.IsReached.Count(value => value);
        bool dense = method == TrafficSolveMethod.Dense || (method == TrafficSolveMethod.Automatic && reached <= DenseLimit);
        int[]? order = null;
        int[] Order() => order ??= ArrivalVariabilityOrder.Upstream(units.Count, routes);
        var decomposition = Results(system, Deviations(system, dense, Order), dense);
        return variability switch
        {
            ArrivalVariabilityMethod.VariabilityFunctions => VariabilityFunctions.Solve(units, routes, decomposition, system => Deviations(system, dense, Order)),
            ArrivalVariabilityMethod.MarkovianDepartures => MarkovianDepartures.Solve(units, routes, decomposition),
            ArrivalVariabilityMethod.IndicesOfDispersion => DispersionNetwork.Solve(units, routes, decomposition),
            _ => decomposition,
        };
    }

    /// <summary>The deviations y = ca² − 1 solving <paramref name="system"/>, its residual checked.</summary>
    private static double[] Deviations(ArrivalVariabilitySystem system, bool dense, Func<int[]> order)
    {
        double[] deviation;
        if (system.HasZeroConstant)
        {
            // Poisson arrivals everywhere and every service term 0: y = 0 solves the system exactly.
            deviation = new double[system.UnitCount];
        }
        else if (dense)
        {
            deviation = SolveDense(system);
        }
        else
        {
            deviation = Sweep(system, order()) ?? SolveSparse(system);
        }

        CheckResidual(system, deviation);
        return deviation;
    }

    private static ArrivalVariabilitySolution Results(ArrivalVariabilitySystem system, double[] deviation, bool dense)
    {
        var arrival = ImmutableArray.CreateBuilder<double>(system.UnitCount);
        var departure = ImmutableArray.CreateBuilder<double>(system.UnitCount);
        for (int i = 0; i < system.UnitCount; i++)
        {
            double y = system.IsReached[i] ? deviation[i] : 0.0;
            double departed = system.IsReached[i] ? system.DepartureTerm[i] + ((1.0 - system.ServiceWeight[i]) * y) : 0.0;
            arrival.Add(Clamp(1.0 + y));
            departure.Add(Clamp(1.0 + departed));
        }

        return new ArrivalVariabilitySolution(arrival.MoveToImmutable(), departure.MoveToImmutable(), dense);
    }

    /// <summary>An SCV clamped to [0, <see cref="MaxScv"/>], 1 for NaN.</summary>
    internal static double Clamp(double scv) => double.IsNaN(scv) ? 1.0 : Math.Clamp(scv, 0.0, MaxScv);

    private static double[] SolveDense(ArrivalVariabilitySystem system)
    {
        var (members, position) = Members(system);
        var matrix = DenseMatrix.CreateIdentity(members.Count);
        var constant = Vector<double>.Build.Dense(members.Count, k => system.Constant[members[k]]);
        for (int k = 0; k < members.Count; k++)
        {
            int j = members[k];
            matrix[k, k] -= system.SelfCoefficient[j];
            for (int e = system.IncomingStart[j]; e < system.IncomingStart[j + 1]; e++)
            {
                int column = position[system.Source[e]];
                if (column >= 0)
                {
                    matrix[k, column] -= system.Coefficient[e];
                }
            }
        }

        return Scatter(matrix.LU().Solve(constant), members, system.UnitCount);
    }

    private static double[] SolveSparse(ArrivalVariabilitySystem system)
    {
        var (members, position) = Members(system);
        var entries = new List<Tuple<int, int, double>>();
        for (int k = 0; k < members.Count; k++)
        {
            int j = members[k];
            entries.Add(Tuple.Create(k, k, 1.0 - system.SelfCoefficient[j]));
            for (int e = system.IncomingStart[j]; e < system.IncomingStart[j + 1]; e++)
            {
                int column = position[system.Source[e]];
                if (column >= 0)
                {
                    entries.Add(Tuple.Create(k, column, -system.Coefficient[e]));
                }
            }
        }

        var matrix = SparseMatrix.OfIndexed(members.Count, members.Count, entries);
        var constant = Vector<double>.Build.Dense(members.Count, k => system.Constant[members[k]]);
        var iterator = new Iterator<double>(
            new IterationCountStopCriterion<double>(MaxIterations),
            new ResidualStopCriterion<double>(ResidualTolerance * 1e-3));
        return Scatter(matrix.SolveIterative(constant, new BiCgStab(), iterator, new DiagonalPreconditioner()), members, system.UnitCount);
    }

    /// <summary>Gauss–Seidel; null when it has not converged within <see cref="MaxIterations"/> sweeps.</summary>
    private static double[]? Sweep(ArrivalVariabilitySystem system, int[] order)
    {
        var y = new double[system.UnitCount];
        for (int sweep = 0; sweep < MaxIterations; sweep++)
        {
            double largestChange = 0.0;
            double largest = 0.0;
            foreach (int j in order)
            {
                if (!system.IsReached[j])
                {
                    continue;
                }

                double sum = system.Constant[j];
                for (int e = system.IncomingStart[j]; e < system.IncomingStart[j + 1]; e++)
                {
                    sum += system.Coefficient[e] * y[system.Source[e]];
                }

                double updated = sum / (1.0 - system.SelfCoefficient[j]);
                largestChange = Math.Max(largestChange, Math.Abs(updated - y[j]));
                largest = Math.Max(largest, Math.Abs(updated));
                y[j] = updated;
            }

            if (largestChange <= SweepTolerance * Math.Max(1.0, largest))
            {
                return y;
            }
        }

        return null;
    }

    private static (List<int> Members, int[] Position) Members(ArrivalVariabilitySystem system)
    {
        var members = new List<int>();
        var position = new int[system.UnitCount];
        for (int i = 0; i < system.UnitCount; i++)
        {
            position[i] = system.IsReached[i] ? members.Count : -1;
            if (system.IsReached[i])
            {
                members.Add(i);
            }
        }

        return (members, position);
    }

    private static double[] Scatter(Vector<double> values, List<int> members, int unitCount)
    {
        var result = new double[unitCount];
        for (int k = 0; k < members.Count; k++)
        {
            result[members[k]] = values[k];
        }

        return result;
    }

    private static void CheckResidual(ArrivalVariabilitySystem system, double[] y)
    {
        double worst = 0.0;
        double largest = 1.0;
        for (int j = 0; j < system.UnitCount; j++)
        {
            if (!system.IsReached[j])
            {
                continue;
            }

            double sum = system.Constant[j] + (system.SelfCoefficient[j] * y[j]);
            for (int e = system.IncomingStart[j]; e < system.IncomingStart[j + 1]; e++)
            {
                sum += system.Coefficient[e] * y[system.Source[e]];
            }

            double residual = Math.Abs(sum - y[j]);
            worst = double.IsFinite(residual) ? Math.Max(worst, residual) : double.PositiveInfinity;
            largest = Math.Max(largest, Math.Abs(1.0 + y[j]));
        }

        if (!(worst <= ResidualTolerance * largest))
        {
            throw new ArrivalVariabilityException(worst / largest);
        }
    }
}
