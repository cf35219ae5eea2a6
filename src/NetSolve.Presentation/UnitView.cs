using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>A unit's results converted to the network's time unit, the numbers every output format prints.</summary>
/// <remarks>Field names follow the JSON contract; times are in <see cref="Network.TimeUnit"/>, rates per that unit.</remarks>
public sealed record UnitView(
    string Id,
    string Label,
    int? Servers,
    double ArrivalRate,
    double VisitsPerPatient,
    double OfferedLoad,
    double Utilisation,
    double PWait,
    double? MeanQueue,
    double? MeanWait,
    double? MeanInUnit,
    double? MeanTimeInUnit,
    double? Headroom,
    string Status)
{
    /// <summary>Converts <paramref name="result"/> to <paramref name="timeUnit"/>.</summary>
    public static UnitView From(UnitResult result, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(result);
        return new UnitView(
            result.Unit.Id,
            result.Unit.Label,
            result.Unit.Servers.IsUnlimited ? null : result.Unit.Servers.Count,
            TimeConstants.RateFromPerHour(result.ArrivalsPerHour, timeUnit),
            result.VisitsPerPatient,
            result.OfferedLoad,
            result.Utilisation,
            result.WaitProbability,
            result.MeanQueue,
            result.MeanWaitHours is double wait ? TimeConstants.FromHours(wait, timeUnit) : null,
            result.MeanInUnit,
            result.MeanTimeInUnitHours is double time ? TimeConstants.FromHours(time, timeUnit) : null,
            result.Headroom,
            StatusName(result.Status));
    }

    /// <summary>The contract's status word.</summary>
    public static string StatusName(UnitStatus status) => status switch
    {
        UnitStatus.Ok => "ok",
        UnitStatus.Strained => "strained",
        UnitStatus.Bottleneck => "bottleneck",
        UnitStatus.Unstable => "unstable",
        _ => throw new ArgumentOutOfRangeException(nameof(status), status, "Unknown status."),
    };
}
