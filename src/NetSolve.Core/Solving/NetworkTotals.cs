namespace NetSolve.Solving;

/// <summary>Network totals by Little's law. The last three are null when any unit is unstable.</summary>
/// <param name="ExternalArrivalsPerHour">Sum of external arrival rates.</param>
/// <param name="ThroughputPerHour">Patients leaving per hour after care: external arrivals minus those turned away.</param>
/// <param name="MeanInSystem">Sum of the units' mean number present.</param>
/// <param name="MeanTimeInSystemHours">Mean time from entry to exit: mean in system / external arrivals.</param>
public sealed record NetworkTotals(
    double ExternalArrivalsPerHour,
    double? ThroughputPerHour,
    double? MeanInSystem,
    double? MeanTimeInSystemHours)
{
    /// <summary>Patients turned away per hour by full units (they leave the network); 0 without capacities.</summary>
    public double TurnedAwayPerHour { get; init; }

    /// <summary>Patients diverted per hour from full units to other units; 0 without capacities.</summary>
    public double DivertedPerHour { get; init; }
}
