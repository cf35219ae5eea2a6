namespace NetSolve.Simulation;

/// <summary>What one finished replication hands to the <see cref="ReplicationPool"/>.</summary>
/// <param name="Row">Its metrics (<see cref="MetricLayout"/>).</param>
/// <param name="Events">Events it simulated.</param>
/// <param name="Tallies">Its counts behind the percentiles and tail probabilities.</param>
/// <param name="InNetworkSeries">The number in the network at each sampling moment, for the warm-up check.</param>
internal sealed record ReplicationOutput(double[] Row, long Events, ReplicationTallies Tallies, IReadOnlyList<double> InNetworkSeries);
