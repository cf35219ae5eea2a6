using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary>
/// The mean waits the fitted network predicts, per unit id, to set beside the waits observed in the log: the fitting
/// stage does not solve, so the command solves the network it wrote. Null for a unit the fit makes unstable.
/// </summary>
internal static class FitPredictedWaits
{
    public static IReadOnlyDictionary<string, double?> Of(NetworkSolution solution) =>
        solution.Units.ToDictionary(unit => unit.Unit.Id, unit => unit.MeanWaitHours, StringComparer.Ordinal);
}
