using System.Collections.Immutable;
using NetSolve.Simulation;

namespace NetSolve.Analysis;

/// <summary>The warm-up and run length of each replication, given or chosen from the units' relaxation times.</summary>
/// <param name="WarmupHours">Simulated time discarded at the start of each replication.</param>
/// <param name="DurationHours">Simulated time measured after the warm-up.</param>
/// <param name="IsWarmupFromModel">True when the warm-up was chosen here rather than given.</param>
/// <param name="IsDurationFromModel">True when the run length was chosen here rather than given.</param>
/// <param name="SlowUnits">
/// Units whose relaxation time is long against the run (the run measures fewer than
/// <see cref="RunLengthPlanner.RelaxationsWarned"/> of them, or the warm-up is shorter than
/// <see cref="RunLengthPlanner.WarmupRelaxations"/>), slowest first: their simulated means may be biased.
/// </param>
/// <param name="Replications">
/// The replications the run needs: the default, or more when the run length chosen here reached its bound before
/// the slowest unit's <see cref="RunLengthPlanner.DurationRelaxations"/> relaxation times, to make up the rest.
/// </param>
public sealed record RunLengthPlan(
    double WarmupHours,
    double DurationHours,
    bool IsWarmupFromModel,
    bool IsDurationFromModel,
    ImmutableArray<UnitRelaxation> SlowUnits,
    int Replications = SimulationOptions.DefaultReplications);
