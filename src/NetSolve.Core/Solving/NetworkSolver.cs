using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>Solves a validated network as a Jackson network: traffic equations, then each unit on its own.</summary>
public static class NetworkSolver
{
    /// <summary>Solves <paramref name="network"/> with the given strain threshold.</summary>
    public static NetworkSolution Solve(Network network, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(network);
        double[] flows = TrafficEquations.Solve(RoutingTable.Build(network));
        return FromFlows(network, flows, strainThreshold);
    }

    /// <summary>Builds the solution from flows already solved (for example, solved flows scaled by a growth factor).</summary>
    public static NetworkSolution FromFlows(Network network, IReadOnlyList<double> flowsPerHour, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(flowsPerHour);
        double external = network.ExternalArrivalsPerHour;
        var units = new UnitResult[network.Units.Length];
        for (int i = 0; i < units.Length; i++)
        {
            units[i] = UnitMetrics.Compute(network.Units[i], flowsPerHour[i], external);
        }

        var results = StatusRule.Apply(units, strainThreshold);
        return new NetworkSolution(network, results, Totals(results, external), strainThreshold);
    }

    private static NetworkTotals Totals(ImmutableArray<UnitResult> units, double external)
    {
        if (units.Any(unit => !unit.IsStable))
        {
            return new NetworkTotals(external, null, null, null);
        }

        double inSystem = units.Sum(unit => unit.MeanInUnit ?? 0.0);
        // With no arrivals (growth from a factor of 0) no patient passes through, so there is no mean time to report.
        return new NetworkTotals(external, external, inSystem, external > 0.0 ? inSystem / external : null);
    }
}
