namespace NetSolve.Parsing.Values;

/// <summary>
/// The names value messages give the fields that network files, scenario files and <c>--set</c> share, so that a
/// mistake in any of them reads the same: <c>servers: '14.0' is not a number of servers (…)</c>.
/// </summary>
public static class FieldLabels
{
    /// <summary>A unit's servers.</summary>
    public const string Servers = "servers";

    /// <summary>A unit's mean service time, or a factor on it.</summary>
    public const string Service = "service";

    /// <summary>An external arrival rate.</summary>
    public const string ArrivalRate = "arrival rate";

    /// <summary>A factor on external arrivals.</summary>
    public const string Arrivals = "arrivals";

    /// <summary>A route's probability; followed by the destination (<see cref="For"/>).</summary>
    public const string RouteTo = "route to";

    /// <summary><paramref name="label"/>, followed by the quoted unit id when there is one: <c>route to 'imaging'</c>.</summary>
    public static string For(string label, string? unitId) => unitId is null ? label : $"{label} '{unitId}'";
}
