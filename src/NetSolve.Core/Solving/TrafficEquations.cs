using System.Runtime.InteropServices;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Double;
using MathNet.Numerics.LinearAlgebra.Double.Solvers;
using MathNet.Numerics.LinearAlgebra.Solvers;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Solves the traffic equations λ = γ + Pᵀλ over the reached units: the total flow into each unit.
/// </summary>
/// <remarks>
/// Up to <see cref="DenseLimit"/> reached units the system (I − Pᵀ)λ = γ is solved directly by LU on a dense
/// matrix (MathNet.Numerics). Above it memory must grow with the routes, not units squared: Gauss–Seidel sweeps
/// over the units in upstream-first order (<see cref="ComponentOrder"/>), which is exact after one sweep where
/// patients never return and converges geometrically inside feedback loops; if the sweeps stall, BiCGStab on a
/// MathNet sparse matrix takes over. Either way the residual is checked. Validation has already rejected sets of
/// units with no exit, so I − Pᵀ is non-singular on the reached units.
/// </remarks>
public static class TrafficEquations
{
    /// <summary>Largest number of reached units solved densely; chosen by measurement (docs/performance.md).</summary>
    public const int DenseLimit = 100;

    /// <summary>Iteration cap of the sparse solvers (sweeps, then BiCGStab iterations).</summary>
    public const int MaxIterations = 2_000;

    /// <summary>Relative to the largest flow: sweeping stops when no flow changes by more than this.</summary>
    public const double SweepTolerance = 1e-13;

    /// <summary>Flow into each unit per hour, by unit position; 0 for unreached units.</summary>
    /// <exception cref="TrafficEquationsException">The residual stays above <see cref="Tolerances.TrafficResidual"/>.</exception>
    public static double[] Solve(RoutingTable routing) => Solve(routing, TrafficSolveMethod.Automatic);

    /// <summary>As <see cref="Solve(RoutingTable)"/> with the method forced, so tests and benchmarks can compare both paths.</summary>
    internal static double[] Solve(RoutingTable routing, TrafficSolveMethod method)
    {
        ArgumentNullException.ThrowIfNull(routing);
        bool[] reached = routing.ReachedUnits();
        var position = new int[routing.UnitCount];
        var members = new List<int>();
        for (int i = 0; i < routing.UnitCount; i++)
        {
            position[i] = reached[i] ? members.Count : -1;
            if (reached[i])
            {
                members.Add(i);
            }
        }

        int n = members.Count;
        Vector<double> External() => Vector<double>.Build.Dense(n, k => routing.ExternalPerHour[members[k]]);
        double[] result;
        bool dense = method == TrafficSolveMethod.Dense || (method == TrafficSolveMethod.Automatic && n <= DenseLimit);
        if (dense)
        {
            result = Scatter(SolveDense(routing, members, position, External()), members, routing.UnitCount);
        }
        else
        {
            result = Sweep(routing, reached)
                ?? Scatter(SolveSparse(routing, members, position, External()), members, routing.UnitCount);
        }

        CheckResidual(routing, result);
        return result;
    }

    private static double[] Scatter(Vector<double> flows, List<int> members, int unitCount)
    {
        var result = new double[unitCount];
        for (int k = 0; k < members.Count; k++)
        {
            result[members[k]] = Math.Max(0.0, flows[k]);
        }

        return result;
    }

    /// <summary>Gauss–Seidel in upstream-first order; null when it has not converged within <see cref="MaxIterations"/> sweeps.</summary>
    /// <remarks>
    /// The units are renumbered in sweep order once, so each sweep reads the routes into a unit, its external arrivals
    /// and its flow from arrays walked front to back. Every flow is summed from the same terms in the same order as
    /// over the file's numbering (routes in by the unit they leave, then the file's order), so the flows are the same
    /// to the last bit.
    /// </remarks>
    private static double[]? Sweep(RoutingTable routing, bool[] reached)
    {
        int n = routing.UnitCount;
        int[] order = ComponentOrder.Upstream(routing, reached);
        var place = new int[n];
        for (int k = 0; k < order.Length; k++)
        {
            place[order[k]] = k;
        }

        var (incomingStart, incoming, selfRoute) = IncomingInSweepOrder(routing, reached, order, place);
        var external = new double[order.Length];
        for (int k = 0; k < order.Length; k++)
        {
            external[k] = routing.ExternalPerHour[order[k]];
        }

        var swept = new double[order.Length];
        for (int sweep = 0; sweep < MaxIterations; sweep++)
        {
            if (SweepOnce(incomingStart, incoming, selfRoute, external, swept))
            {
                var flows = new double[n];
                for (int k = 0; k < order.Length; k++)
                {
                    flows[order[k]] = swept[k];
                }

                return flows;
            }
        }

        return null;
    }

    /// <summary>One Gauss–Seidel sweep over the units in sweep order; true when no flow changed by more than <see cref="SweepTolerance"/>.</summary>
    private static bool SweepOnce(int[] incomingStart, IncomingRoute[] incoming, double[] selfRoute, double[] external, double[] flows)
    {
        double largestChange = 0.0;
        double largestFlow = 0.0;
        for (int unit = 0; unit < flows.Length; unit++)
        {
            double inflow = external[unit];
            for (int k = incomingStart[unit]; k < incomingStart[unit + 1]; k++)
            {
                inflow += incoming[k].Probability * flows[incoming[k].Source];
            }

            double updated = inflow / (1.0 - selfRoute[unit]);
            largestChange = Math.Max(largestChange, Math.Abs(updated - flows[unit]));
            largestFlow = Math.Max(largestFlow, updated);
            flows[unit] = updated;
        }

        return largestChange <= SweepTolerance * Math.Max(1.0, largestFlow);
    }

    /// <summary>
    /// The positive routes between reached units by the sweep position of the unit they enter (self-routes apart), each
    /// unit's in the order of the unit they leave, then of the routing table.
    /// </summary>
    private static (int[] Start, IncomingRoute[] Routes, double[] SelfRoute) IncomingInSweepOrder(
        RoutingTable routing, bool[] reached, int[] order, int[] place)
    {
        int n = routing.UnitCount;
        var start = new int[order.Length + 1];
        var selfRoute = new double[order.Length];
        for (int from = 0; from < n; from++)
        {
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                int to = routing.Targets[e];
                double p = routing.Probabilities[e];
                if (!reached[from] || p <= 0.0)
                {
                    continue;
                }

                if (to == from)
                {
                    selfRoute[place[from]] += p;
                }
                else
                {
                    start[place[to] + 1]++;
                }
            }
        }

        for (int k = 0; k < order.Length; k++)
        {
            start[k + 1] += start[k];
        }

        var fill = (int[])start.Clone();
        var routes = new IncomingRoute[start[order.Length]];
        for (int from = 0; from < n; from++)
        {
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                int to = routing.Targets[e];
                double p = routing.Probabilities[e];
                if (reached[from] && p > 0.0 && to != from)
                {
                    routes[fill[place[to]]++] = new IncomingRoute(place[from], p);
                }
            }
        }

        return (start, routes, selfRoute);
    }

    /// <summary>A route into a unit: the sweep position of the unit it leaves and its fraction.</summary>
    [StructLayout(LayoutKind.Sequential)]
    private readonly record struct IncomingRoute(int Source, double Probability);

    private static Vector<double> SolveDense(RoutingTable routing, List<int> members, int[] position, Vector<double> external)
    {
        var matrix = DenseMatrix.CreateIdentity(members.Count);
        foreach (var (row, column, value) in NegatedTransposeEntries(routing, members, position))
        {
            matrix[row, column] -= value;
        }

        return matrix.LU().Solve(external);
    }

    private static Vector<double> SolveSparse(RoutingTable routing, List<int> members, int[] position, Vector<double> external)
    {
        var entries = new List<Tuple<int, int, double>>(routing.Targets.Count + members.Count);
        for (int k = 0; k < members.Count; k++)
        {
            entries.Add(Tuple.Create(k, k, 1.0));
        }

        foreach (var (row, column, value) in NegatedTransposeEntries(routing, members, position))
        {
            entries.Add(Tuple.Create(row, column, -value));
        }

        // OfIndexed sums duplicate (row, column) entries, so a self-route lands on the diagonal correctly.
        var matrix = SparseMatrix.OfIndexed(members.Count, members.Count, entries);
        var iterator = new Iterator<double>(
            new IterationCountStopCriterion<double>(MaxIterations),
            new ResidualStopCriterion<double>(Tolerances.TrafficResidual * 1e-3));
        return matrix.SolveIterative(external, new BiCgStab(), iterator, new DiagonalPreconditioner());
    }

    private static IEnumerable<(int Row, int Column, double Value)> NegatedTransposeEntries(
        RoutingTable routing, List<int> members, int[] position)
    {
        for (int k = 0; k < members.Count; k++)
        {
            int from = members[k];
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                int to = position[routing.Targets[e]];
                if (to >= 0 && routing.Probabilities[e] > 0.0)
                {
                    yield return (to, k, routing.Probabilities[e]);
                }
            }
        }
    }

    private static void CheckResidual(RoutingTable routing, double[] flows)
    {
        var inflow = routing.ExternalPerHour.ToArray();
        for (int from = 0; from < routing.UnitCount; from++)
        {
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                inflow[routing.Targets[e]] += routing.Probabilities[e] * flows[from];
            }
        }

        double scale = Math.Max(1.0, flows.Length == 0 ? 0.0 : flows.Max());
        double worst = 0.0;
        for (int i = 0; i < flows.Length; i++)
        {
            double residual = Math.Abs(inflow[i] - flows[i]);
            if (!double.IsFinite(residual) || residual > worst)
            {
                worst = double.IsFinite(residual) ? residual : double.PositiveInfinity;
            }
        }

        if (!(worst <= Tolerances.TrafficResidual * scale))
        {
            throw new TrafficEquationsException(worst / scale);
        }
    }
}
