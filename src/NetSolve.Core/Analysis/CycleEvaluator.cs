using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Solves one unit's queue over the whole cycle for a trial roster and scores each hour against the targets: the exact
/// chain up to <see cref="ExactChainOptions.MaxServers"/> servers when asked, else the solver's own choice (MOL, or
/// the chain for heavily loaded small units and where MOL has no answer). A roster tried before is not solved again:
/// the search comes back to the same rosters when it adds and then removes a server.
/// </summary>
internal sealed class CycleEvaluator(Unit unit, UnitLoadOverCycle load, StaffingTargets targets, double meanServiceHours, bool exactChain)
{
    private static readonly TimeVaryingOptions ExactWhereSmall = TimeVaryingOptions.Default with { ExactForSmallUnits = true };

    private readonly Dictionary<string, (HourlyWaits Waits, double[] Ratios)> _solved = new(StringComparer.Ordinal);

    /// <summary>Rosters solved so far (tries answered from the cache not counted): the work of the search.</summary>
    public int Solves { get; private set; }

    /// <summary>The waits and each hour's measure ÷ target with <paramref name="servers"/> (one count per hour of the cycle).</summary>
    public (HourlyWaits Waits, double[] Ratios) Evaluate(int[] servers)
    {
        string key = string.Join(',', servers);
        if (_solved.TryGetValue(key, out var known))
        {
            return (known.Waits, [.. known.Ratios]);
        }

        Solves++;
        if (unit.Capacity is null && CycleSettling.Hours(load.OfferedLoadByHour, servers, meanServiceHours) > CycleSettling.MostHours)
        {
            // Judged as missing every target without a solve: a roster whose queue settles only after years is not one
            // a planner could run, and the chain would take minutes to find its pattern.
            var never = Enumerable.Repeat(double.PositiveInfinity, servers.Length).ToArray();
            _solved[key] = (HourlyWaits.Unstable, never);
            return (HourlyWaits.Unstable, [.. never]);
        }

        var waits = TimeVaryingSolver.SolveUnit(unit, load, ServerRoster.ByHour(servers), exactChain ? ExactWhereSmall : TimeVaryingOptions.Default, ExactChainOptions.Default);
        var ratios = HourlyTargetCheck.Ratios(waits, load.OfferedLoadByHour, servers, meanServiceHours, targets);
        _solved[key] = (waits, ratios);
        return (waits, [.. ratios]);
    }
}
