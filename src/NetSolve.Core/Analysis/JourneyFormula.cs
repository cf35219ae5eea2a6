using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// The formula for a journey's time (docs/methods.md, "Journeys"): each visit to a unit of the set is a phase-type
/// block (<see cref="VisitPhases"/>) from the solver's chance of waiting, mean wait and the service's mean and SCV;
/// the blocks are joined by the routing fractions between units of the set, and the journey ends when the routing
/// leaves the set. The journey starts where patients enter the set from outside it, in proportion to that flow.
/// </summary>
/// <remarks>
/// Exact for M/M/1 and M/M/c units in a Jackson network whose patients visit the set once (the sojourn at an M/M/1
/// unit is exponential with rate μ − λ; in tandem, by Burke's theorem, the sojourns are independent). With returns
/// inside the set the visits are taken as independent, which gets the mean right (Little's law) but not the spread
/// exactly. Capacity limits and arrival profiles are not modelled; the simulator measures them.
/// With patient groups, each group follows its own routes and service times and waits in the same queues; the
/// figures for every patient mix the groups in proportion to the journeys they start.
/// </remarks>
public static class JourneyFormula
{
    /// <summary>The percentiles reported, as fractions.</summary>
    public static readonly ImmutableArray<double> Fractions = [0.50, 0.90, 0.95, 0.99];

    /// <summary>
    /// One estimate per journey of the solved network for every patient, followed, when the network has patient
    /// groups, by one per journey and named group whose patients enter the journey, in the order of <see cref="Network.Groups"/>.
    /// </summary>
    public static ImmutableArray<JourneyEstimate> Estimate(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var network = solution.Network;
        if (network.Journeys.IsDefaultOrEmpty)
        {
            return [];
        }

        var flows = JourneyFlow.All(solution);
        var index = network.BuildIndex();
        var results = ImmutableArray.CreateBuilder<JourneyEstimate>();
        foreach (var journey in network.Journeys)
        {
            int[] members = [.. journey.UnitIds.Select(id => index[id])];
            bool stable = members.All(u => solution.Units[u].IsStable && solution.Units[u].MeanWaitHours is not null);
            var parts = flows.Select(flow => (Flow: flow, Chain: stable ? Chain(solution, flow, members) : null)).ToList();
            results.Add(Result(journey, null, parts.Select(part => (part.Flow.EntriesPerHour(members), part.Chain)).ToList(), stable));
            foreach (var part in parts.Where(part => part.Flow.Group is not null && part.Flow.EntriesPerHour(members) > 0.0))
            {
                results.Add(Result(journey, part.Flow.Group, [(part.Flow.EntriesPerHour(members), part.Chain)], stable));
            }
        }

        return results.ToImmutable();
    }

    private static JourneyEstimate Result(Journey journey, PatientGroup? group, List<(double Weight, PhaseType? Chain)> parts, bool stable)
    {
        double perHour = parts.Sum(part => part.Weight);
        var used = parts.Where(part => part.Weight > 0.0 && part.Chain is not null).ToList();
        if (!stable || perHour <= 0.0 || used.Count == 0)
        {
            return new JourneyEstimate(journey, group, perHour, null, [], []);
        }

        var mixed = Mix(used.Select(part => (part.Weight / perHour, part.Chain!)).ToList());
        var quantiles = mixed.Quantiles(Fractions);
        return new JourneyEstimate(
            journey,
            group,
            perHour,
            mixed.Mean(),
            [.. Fractions.Select((fraction, q) => new JourneyPercentile(fraction * 100.0, quantiles[q]))],
            [.. journey.OverHours.Select(hours => new JourneyShareOver(hours, mixed.Survival(hours)))]);
    }

    /// <summary>The phase-type chain of one flow of patients through the set: visit blocks joined by the routes within it.</summary>
    private static PhaseType? Chain(NetworkSolution solution, JourneyFlow flow, int[] members)
    {
        var entries = members.Select(u => flow.EntryPerHour(u, members)).ToArray();
        double total = entries.Sum();
        if (total <= 0.0)
        {
            return null;
        }

        var blocks = members.Select(u => Visit(solution.Units[u], flow.Service(u))).ToArray();
        int[] offsets = new int[members.Length + 1];
        for (int m = 0; m < members.Length; m++)
        {
            offsets[m + 1] = offsets[m] + blocks[m].Count;
        }

        int n = offsets[^1];
        var start = Vector<double>.Build.Dense(n);
        var generator = Matrix<double>.Build.Dense(n, n);
        for (int m = 0; m < members.Length; m++)
        {
            var block = blocks[m];
            for (int i = 0; i < block.Count; i++)
            {
                int row = offsets[m] + i;
                start[row] = entries[m] / total * block.Start[i];
                double outRate = block.Exit[i];
                for (int j = 0; j < block.Count; j++)
                {
                    generator[row, offsets[m] + j] += block.Rates[i, j];
                    outRate += block.Rates[i, j];
                }

                generator[row, row] -= outRate;
                for (int next = 0; next < members.Length; next++)
                {
                    double p = flow.RouteProbability(members[m], members[next]);
                    for (int j = 0; p > 0.0 && j < blocks[next].Count; j++)
                    {
                        generator[row, offsets[next] + j] += block.Exit[i] * p * blocks[next].Start[j];
                    }
                }
            }
        }

        return new PhaseType(start, generator);
    }

    private static VisitPhases Visit(UnitResult unit, ServiceDistribution service)
    {
        bool unlimited = unit.Unit.Servers.IsUnlimited;
        return VisitPhases.Of(unlimited ? 0.0 : unit.WaitProbability, unlimited ? 0.0 : unit.MeanWaitHours ?? 0.0, service.MeanHours, service.Cv * service.Cv);
    }

    /// <summary>The mixture of phase-type distributions with the given weights: the chains side by side, each started with its weight.</summary>
    private static PhaseType Mix(List<(double Weight, PhaseType Chain)> parts)
    {
        if (parts.Count == 1)
        {
            return parts[0].Chain;
        }

        int n = parts.Sum(part => part.Chain.Start.Count);
        var start = Vector<double>.Build.Dense(n);
        var generator = Matrix<double>.Build.Dense(n, n);
        int offset = 0;
        foreach (var (weight, chain) in parts)
        {
            int size = chain.Start.Count;
            start.SetSubVector(offset, size, chain.Start * weight);
            generator.SetSubMatrix(offset, offset, chain.Generator);
            offset += size;
        }

        return new PhaseType(start, generator);
    }
}
