using System.Collections.Immutable;
using NetSolve.Fitting.Estimation;
using NetSolve.Model;

namespace NetSolve.Fitting;

/// <summary>A network estimated from a movement log, with the per-unit evidence behind it.</summary>
/// <param name="Network">The estimated network, ready to solve or simulate.</param>
/// <param name="Units">Per-unit estimates, in the network's unit order.</param>
/// <param name="Patients">Patients in the log.</param>
/// <param name="WindowHours">Span of time the entry rates are measured over.</param>
/// <param name="Log">The log the network was fitted to: its stays, window and messy rows.</param>
/// <param name="Evidence">Counts, 95% intervals, distribution choices, arrival profiles and thin-data warnings per unit.</param>
public sealed record FittedNetwork(Network Network, ImmutableArray<FittedUnit> Units, int Patients, double WindowHours, MovementLog Log, NetworkEvidence Evidence);
