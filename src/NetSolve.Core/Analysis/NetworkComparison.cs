using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>Sets scenarios side by side with a base network, unit by unit, matching units by id.</summary>
/// <remarks>Thread-safe. Scenarios may add and close units; a unit present in only one side has null on the other.</remarks>
public static class NetworkComparison
{
    /// <summary>Compares every scenario in <paramref name="scenarios"/> with <paramref name="baseSolution"/>.</summary>
    /// <param name="baseName">The base's name in outputs.</param>
    /// <param name="baseSolution">The base solved.</param>
    /// <param name="scenarios">Each scenario's name and solution.</param>
    public static ComparisonResult Compare(string baseName, NetworkSolution baseSolution, IReadOnlyList<(string Name, NetworkSolution Solution)> scenarios)
    {
        ArgumentNullException.ThrowIfNull(baseName);
        ArgumentNullException.ThrowIfNull(baseSolution);
        ArgumentNullException.ThrowIfNull(scenarios);
        var compared = ImmutableArray.CreateBuilder<ScenarioComparison>(scenarios.Count);
        foreach (var (name, solution) in scenarios)
        {
            compared.Add(CompareOne(baseSolution, name, solution));
        }

        return new ComparisonResult(baseName, baseSolution, compared.MoveToImmutable());
    }

    private static ScenarioComparison CompareOne(NetworkSolution baseSolution, string name, NetworkSolution solution)
    {
        var after = solution.Units.ToDictionary(unit => unit.Unit.Id, StringComparer.Ordinal);
        var before = baseSolution.Units.ToDictionary(unit => unit.Unit.Id, StringComparer.Ordinal);
        var units = ImmutableArray.CreateBuilder<UnitComparison>();
        foreach (var unit in baseSolution.Units)
        {
            units.Add(new UnitComparison(unit.Unit.Id, unit, after.GetValueOrDefault(unit.Unit.Id)));
        }

        foreach (var unit in solution.Units.Where(unit => !before.ContainsKey(unit.Unit.Id)))
        {
            units.Add(new UnitComparison(unit.Unit.Id, null, unit));
        }

        return new ScenarioComparison(name, solution, units.ToImmutable()) { BaseTotals = baseSolution.Totals };
    }
}
