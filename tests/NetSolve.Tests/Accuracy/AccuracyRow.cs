using NetSolve.Simulation;

namespace NetSolve.Tests.Accuracy;

/// <summary>One unit of the accuracy study: its inputs, the simulated mean wait and both formulas' mean waits, in hours.</summary>
/// <param name="Network">The network's name in the table.</param>
/// <param name="UnitId">The unit.</param>
/// <param name="ArrivalScv">The two-moment solver's squared cv of the unit's arrivals.</param>
/// <param name="ServiceScv">The squared cv of the unit's service (the groups' mixture).</param>
/// <param name="Servers">Servers, for the table.</param>
/// <param name="Utilisation">The formula's utilisation.</param>
/// <param name="MeanServiceHours">The unit's mean service time, for the rule on tiny waits.</param>
/// <param name="Simulated">The simulated mean wait.</param>
/// <param name="TwoMoment">The two-moment formula's mean wait (NetworkSolver with the network as given).</param>
/// <param name="Exponential">The exponential formula's mean wait (every service exponential, every arrival cv 1).</param>
/// <param name="Method">The two-moment solver's method for the unit.</param>
internal sealed record AccuracyRow(
    string Network,
    string UnitId,
    double ArrivalScv,
    double ServiceScv,
    int Servers,
    double Utilisation,
    double MeanServiceHours,
    Estimate Simulated,
    double TwoMoment,
    double Exponential,
    string Method)
{
    /// <summary>Units whose simulated wait is below this share of the mean service time are left out of the goal.</summary>
    public const double TinyWaitShare = 0.01;

    /// <summary>A squared cv this far from 1 counts as "differs from 1" for the strictly-better check.</summary>
    public const double ScvDifference = 0.05;

    /// <summary>The service distribution's family (gamma, lognormal, ...), for the table.</summary>
    public string Family { get; init; } = "";

    public double TwoMomentError => (TwoMoment - Simulated.Mean) / Simulated.Mean;

    public double ExponentialError => (Exponential - Simulated.Mean) / Simulated.Mean;

    /// <summary>The simulated wait is at least 1% of the mean service time, so the relative error means something.</summary>
    public bool Counts => Simulated.Mean >= TinyWaitShare * MeanServiceHours;

    /// <summary>The arrival or the service cv differs from 1, so the two formulas differ.</summary>
    public bool CvDiffers => Math.Abs(ArrivalScv - 1.0) > ScvDifference || Math.Abs(ServiceScv - 1.0) > ScvDifference;
}
