using NetSolve.Solving;

namespace NetSolve.Rendering.Report;

/// <summary>An alternative already solved, compared with the baseline in the report.</summary>
/// <param name="Name">How the report names it (for example the file name).</param>
/// <param name="Solution">Its solution.</param>
/// <param name="Changes">
/// What it changes from its base network, one phrase each (<see cref="Presentation.Scenarios.ChangeWords"/>); null or
/// empty for a network file compared as it is.
/// </param>
public sealed record ReportScenario(string Name, NetworkSolution Solution, IReadOnlyList<string>? Changes = null);
