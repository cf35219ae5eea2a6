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
    private static double[]? Sweep(RoutingTable routing, bool[] reached)
    {
        int n = routing.UnitCount;
        var incomingStart = new int[n + 1];
        for (int from = 0; from < n; from++)
        {
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                if (reached[from] && routing.Probabilities[e] > 0.0)
                {
                    incomingStart[routing.Targets[e] + 1]++;
                }
            }
        }

        for (int i = 0; i < n; i++)
        {
            incomingStart[i + 1] += incomingStart[i];
        }

        var fill = (int[])incomingStart.Clone();
        var sources = new int[incomingStart[n]];
        var weights = new double[incomingStart[n]];
        var selfRoute = new double[n];
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
                    selfRoute[from] += p;
                }
                else
                {
                    int slot = fill[to]++;
                    sources[slot] = from;
                    weights[slot] = p;
                }
            }
        }

        int[] order = ComponentOrder.Upstream(routing, reached);
        var external = routing.ExternalPerHour.ToArray();
        var flows = new double[n];
        for (int sweep = 0; sweep < MaxIterations; sweep++)
        {
            double largestChange = 0.0;
            double largestFlow = 0.0;
            foreach (int unit in order)
            {
                double inflow = external[unit];
                for (int k = incomingStart[unit]; k < incomingStart[unit + 1]; k++)
                {
                    inflow += weights[k] * flows[sources[k]];
                }

                double updated = inflow / (1.0 - selfRoute[unit]);
                largestChange = Math.Max(largestChange, Math.Abs(updated - flows[unit]));
                largestFlow = Math.Max(largestFlow, updated);
                flows[unit] = updated;
            }

            if (largestChange <= SweepTolerance * Math.Max(1.0, largestFlow))
            {
                return flows;
            }
        }

        return null;
    }

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
