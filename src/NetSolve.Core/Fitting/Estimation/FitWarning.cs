using System.Globalization;

namespace NetSolve.Fitting.Estimation;

/// <summary>A thin-data warning about one unit, with the line shown to people.</summary>
/// <param name="Kind">What kind of warning.</param>
/// <param name="UnitId">The unit it is about.</param>
/// <param name="Message">The one line shown, naming the unit and the numbers behind the warning.</param>
public sealed record FitWarning(FitWarningKind Kind, string UnitId, string Message)
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    /// <summary>Fewer stays than <see cref="EvidenceThresholds.MinStays"/>.</summary>
    public static FitWarning FewStays(string unitId, int stays) => new(FitWarningKind.FewStays, unitId,
        string.Create(Invariant, $"unit '{unitId}': only {Counted(stays, "stay", "stays")} (fewer than {EvidenceThresholds.MinStays}); its mean stay and distribution are rough"));

    /// <summary>No stay ended inside the extract.</summary>
    public static FitWarning NoStayEnded(string unitId, int stays) => new(FitWarningKind.NoStayEnded, unitId,
        string.Create(Invariant, $"unit '{unitId}': {(stays == 1 ? "its only stay" : string.Create(Invariant, $"none of its {stays} stays"))} ended inside the extract, so its mean stay cannot be estimated; use a longer extract"));

    /// <summary>A route seen fewer than <see cref="EvidenceThresholds.MinRouteTransitions"/> times.</summary>
    public static FitWarning ThinRoute(string unitId, string toUnitId, int count) => new(FitWarningKind.ThinRoute, unitId,
        string.Create(Invariant, $"unit '{unitId}': the route to '{toUnitId}' was seen only {Counted(count, "time", "times")} (fewer than {EvidenceThresholds.MinRouteTransitions}); its fraction is rough"));

    /// <summary>The load's interval reaches the servers.</summary>
    public static FitWarning LoadMayReachServers(string unitId, int servers, Interval load) => new(FitWarningKind.LoadMayReachServers, unitId,
        string.Create(Invariant, $"unit '{unitId}': its load could be as high as {load.Upper:0.00} of its {servers} servers (95% interval {load.Lower:0.00} to {load.Upper:0.00}); within that interval it may be unstable"));

    /// <summary>No patient waited, so the servers are a lower bound.</summary>
    public static FitWarning NeverQueued(string unitId, int servers) => new(FitWarningKind.NeverQueued, unitId,
        string.Create(Invariant, $"unit '{unitId}': never queued: at least {servers} servers; the count seen in use is not its capacity, give the roster"));

    /// <summary>A count with its noun in the right number: "1 stay", "2 stays".</summary>
    private static string Counted(int count, string one, string many) =>
        string.Create(Invariant, $"{count} {(count == 1 ? one : many)}");
}
