using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Pathways through the network from the routing matrix: expected visits and the chance of ever visiting a unit for
/// a patient entering at a given unit, and the mean time along a named sequence of units.
/// </summary>
/// <remarks>
/// With routing matrix P (substochastic, the rest leaving), the expected visits to j of a patient entering at i are
/// N_ij with N = (I − P)⁻¹, the fundamental matrix of the absorbing chain; row i is the traffic equations solved
/// with a single external arrival of rate 1 at i. The chance of ever visiting j is the expected visits to j in the
/// chain where j is made absorbing (its routes removed), since j is then visited at most once. Cost: one traffic
/// solve per row and one per probability. Thread-safe.
/// </remarks>
public static class PathwayAnalysis
{
    /// <summary>Expected visits and time per unit for patients entering at <paramref name="fromUnitId"/>.</summary>
    /// <param name="solution">The solved network (for mean time per visit).</param>
    /// <param name="fromUnitId">The unit patients enter at.</param>
    /// <param name="probabilityFor">Units to compute the chance of visiting for; null for every unit reached.</param>
    /// <exception cref="ArgumentException">An id is not a unit, or patients entering there could never leave.</exception>
    public static PathwayResult From(NetworkSolution solution, string fromUnitId, IReadOnlyCollection<string>? probabilityFor = null)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(fromUnitId);
        var network = solution.Network;
        var index = network.BuildIndex();
        Require(index, fromUnitId);
        foreach (var id in probabilityFor ?? [])
        {
            Require(index, id);
        }

        double[] visits = ExpectedVisits(network, fromUnitId);
        var builder = ImmutableArray.CreateBuilder<PathwayVisit>();
        for (int j = 0; j < visits.Length; j++)
        {
            var result = solution.Units[j];
            string id = result.Unit.Id;
            if (!(visits[j] > 0.0))
            {
                if (probabilityFor?.Contains(id, StringComparer.Ordinal) == true)
                {
                    builder.Add(new PathwayVisit(id, 0.0, 0.0, 0.0)); // asked for, and never reached from here
                }

                continue;
            }

            double? probability = probabilityFor is null || probabilityFor.Contains(id, StringComparer.Ordinal) ? VisitProbability(network, fromUnitId, id) : null;
            double? time = result.MeanTimeInUnitHours is double perVisit ? visits[j] * perVisit : null;
            builder.Add(new PathwayVisit(id, visits[j], probability, time));
        }

        return new PathwayResult(fromUnitId, builder.ToImmutable());
    }

    /// <summary>Expected visits to each unit, by position, per patient entering at <paramref name="fromUnitId"/>.</summary>
    /// <exception cref="ArgumentException">Not a unit, or patients entering there could never leave.</exception>
    public static double[] ExpectedVisits(Network network, string fromUnitId)
    {
        ArgumentNullException.ThrowIfNull(network);
        var entering = network with { Arrivals = [new Arrival(fromUnitId, 1.0)] };
        Require(network.BuildIndex(), fromUnitId);
        var routing = RoutingTable.Build(entering);
        if (ClosedUnitSets.Find(routing, routing.ReachedUnits()) is [var closed, ..])
        {
            string subject = closed.Count == 1
                ? $"unit '{network.Units[closed[0]].Id}'"
                : "units " + string.Join(", ", closed.Select(i => $"'{network.Units[i].Id}'"));
            throw new ArgumentException($"Patients entering at '{fromUnitId}' can reach {subject} and never leave.", nameof(fromUnitId));
        }

        return TrafficEquations.Solve(routing);
    }

    /// <summary>The chance that a patient entering at <paramref name="fromUnitId"/> ever visits <paramref name="toUnitId"/> (1 when they are the same).</summary>
    /// <exception cref="ArgumentException">An id is not a unit, or patients entering there could never leave.</exception>
    public static double VisitProbability(Network network, string fromUnitId, string toUnitId)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(toUnitId);
        var index = network.BuildIndex();
        Require(index, toUnitId);
        if (string.Equals(fromUnitId, toUnitId, StringComparison.Ordinal))
        {
            Require(index, fromUnitId);
            return 1.0;
        }

        // Making the target absorbing only adds exits, so no new closed set can appear.
        var absorbing = network with { Routes = [.. network.Routes.Where(route => !string.Equals(route.From, toUnitId, StringComparison.Ordinal))] };
        double[] visits = ExpectedVisits(absorbing, fromUnitId);
        return Math.Clamp(visits[index[toUnitId]], 0.0, 1.0);
    }

    /// <summary>Mean time along <paramref name="unitIds"/> and the chance of following it step by step.</summary>
    /// <exception cref="ArgumentException">The sequence is empty or names a unit that does not exist.</exception>
    public static PathResult Path(NetworkSolution solution, IReadOnlyList<string> unitIds)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(unitIds);
        if (unitIds.Count == 0)
        {
            throw new ArgumentException("A path names at least one unit.", nameof(unitIds));
        }

        var network = solution.Network;
        var index = network.BuildIndex();
        var times = ImmutableArray.CreateBuilder<double?>(unitIds.Count);
        double probability = 1.0;
        for (int k = 0; k < unitIds.Count; k++)
        {
            Require(index, unitIds[k]);
            times.Add(solution.Units[index[unitIds[k]]].MeanTimeInUnitHours);
            if (k > 0)
            {
                string from = unitIds[k - 1];
                string to = unitIds[k];
                probability *= network.Routes
                    .Where(route => string.Equals(route.From, from, StringComparison.Ordinal) && string.Equals(route.To, to, StringComparison.Ordinal))
                    .Sum(route => route.Probability);
            }
        }

        return new PathResult([.. unitIds], times.MoveToImmutable(), probability);
    }

    private static void Require(IReadOnlyDictionary<string, int> index, string unitId)
    {
        if (!index.ContainsKey(unitId))
        {
            throw new ArgumentException($"No unit '{unitId}'{NearestName.Hint(unitId, index.Keys)}", nameof(unitId));
        }
    }
}
