using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Solves one unit's queue over the whole cycle for a trial roster and scores each hour against the targets: the exact
/// chain up to <see cref="ExactChainOptions.MaxServers"/> servers when asked, else MOL (with the chain or the fluid
/// queue where MOL has no answer).
/// </summary>
internal sealed class CycleEvaluator(Unit unit, UnitLoadOverCycle load, StaffingTargets targets, double meanServiceHours, bool exactChain)
{
    private static readonly TimeVaryingOptions ExactWhereSmall = TimeVaryingOptions.Default with { ExactForSmallUnits = true };

    /// <summary>The waits and each hour's measure ÷ target with <paramref name="servers"/> (one count per hour of the cycle).</summary>
    public (HourlyWaits Waits, double[] Ratios) Evaluate(int[] servers)
    {
        var waits = TimeVaryingSolver.SolveUnit(unit, load, ServerRoster.ByHour(servers), exactChain ? ExactWhereSmall : TimeVaryingOptions.Default, ExactChainOptions.Default);
        return (waits, HourlyTargetCheck.Ratios(waits, load.OfferedLoadByHour, servers, meanServiceHours, targets));
    }
}
