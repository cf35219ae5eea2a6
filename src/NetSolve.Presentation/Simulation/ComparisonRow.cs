using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Simulation;

/// <summary>One metric of one unit, formula against simulation, with the time unit its file is in.</summary>
/// <param name="UnitId">The unit's id.</param>
/// <param name="Metric">The compared metric and its verdict.</param>
/// <param name="TimeUnit">The network's time unit, which CSV rows name so each stands on its own when filtered.</param>
/// <param name="Method">The method the unit's formula values come from (<see cref="UnitResult.Method"/>).</param>
public sealed record ComparisonRow(string UnitId, ComparedMetric Metric, TimeUnit TimeUnit, string Method)
{
    /// <summary>The rows of one unit of <paramref name="network"/>, in the contract's order of metrics.</summary>
    public static ImmutableArray<ComparisonRow> OfUnit(SimulatedUnit simulated, UnitResult formula, Network network)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        ArgumentNullException.ThrowIfNull(network);
        bool exact = FormulaSimulationComparison.IsExact(network, formula);
        return [.. FormulaSimulationComparison.ForUnit(simulated, formula, exact).Select(metric => new ComparisonRow(simulated.Unit.Id, metric, network.TimeUnit, formula.Method))];
    }

    /// <summary>The rows of every unit in file order.</summary>
    /// <exception cref="ArgumentException"><paramref name="formula"/> is not a solution of the simulated network.</exception>
    public static ImmutableArray<ComparisonRow> Of(SimulationResult simulated, NetworkSolution formula)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        if (formula.Units.Length != simulated.Units.Length)
        {
            throw new ArgumentException("The formula solution must be of the simulated network: one result per unit.", nameof(formula));
        }

        return [.. simulated.Units.SelectMany((unit, i) => OfUnit(unit, formula.Units[i], simulated.Network))];
    }
}
