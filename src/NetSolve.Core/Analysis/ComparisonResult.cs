using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>A base network and one or more scenarios, each compared with the base.</summary>
/// <param name="BaseName">The base's name in outputs.</param>
/// <param name="Base">The base solved.</param>
/// <param name="Scenarios">One comparison per scenario, in the order given.</param>
public sealed record ComparisonResult(string BaseName, NetworkSolution Base, ImmutableArray<ScenarioComparison> Scenarios)
{
    /// <summary>The base's bottleneck unit(s), in file order.</summary>
    public ImmutableArray<string> BaseBottlenecks => [.. Base.Units.Where(unit => unit.Status == UnitStatus.Bottleneck).Select(unit => unit.Unit.Id)];
}
