using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Double;

namespace NetSolve.Solving;

/// <summary>
/// Solves the traffic equations λ = γ + Pᵀλ over the reached units: the total flow into each unit.
/// </summary>
/// <remarks>
/// Up to <see cref="DenseLimit"/> reached units the system (I − Pᵀ)λ = γ is solved directly by LU on a dense
/// matrix; above it, by Gauss-Seidel over the strongly connected sets of units in topological order
/// (<see cref="SparseTrafficSolver"/>), so memory grows with the number of routes. Either way the residual is checked. Validation has already rejected sets of units with no
/// exit, so I − Pᵀ is non-singular on the reached units.
/// </remarks>
public static class TrafficEquations
{
    /// <summary>Largest number of reached units solved densely; chosen by measurement (docs/performance.md).</summary>
    public const int DenseLimit = 400;

    /// <summary>Most Gauss-Seidel sweeps over one loop of units on the sparse path.</summary>
    public const int MaxIterations = 10_000;

    /// <summary>
    /// Relative to the largest flow in a loop: the sweep change at which the sparse path stops. Well below
    /// <see cref="Tolerances.TrafficResidual"/>, so the residual check that follows passes with margin.
    /// </summary>
    private const double SparseTolerance = Tolerances.TrafficResidual * 1e-4;

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
        bool dense = method == TrafficSolveMethod.Dense || (method == TrafficSolveMethod.Automatic && n <= DenseLimit);
        var flows = dense
            ? SolveDense(routing, members, position)
            : SparseTrafficSolver.Solve(routing, members, position, MaxIterations, SparseTolerance);

        var result = new double[routing.UnitCount];
        for (int k = 0; k < n; k++)
        {
            result[members[k]] = Math.Max(0.0, flows[k]);
        }

        CheckResidual(routing, result);
        return result;
    }

    private static double[] SolveDense(RoutingTable routing, List<int> members, int[] position)
    {
        var external = Vector<double>.Build.Dense(members.Count, k => routing.ExternalPerHour[members[k]]);
        var matrix = DenseMatrix.CreateIdentity(members.Count);
        foreach (var (row, column, value) in NegatedTransposeEntries(routing, members, position))
        {
            matrix[row, column] -= value;
        }

        return matrix.LU().Solve(external).ToArray();
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
        var inflow = (double[])routing.ExternalPerHour.ToArray().Clone();
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
