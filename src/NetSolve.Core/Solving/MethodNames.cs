namespace NetSolve.Solving;

/// <summary>The names of the methods a unit's metrics come from, as every output writes them (docs/methods.md).</summary>
public static class MethodNames
{
    /// <summary>Unlimited servers: nobody waits, exact for any service distribution.</summary>
    public const string InfiniteServers = "M/G/inf";

    /// <summary>Poisson arrivals and exponential service on c servers: exact (Jackson's product form).</summary>
    public const string ErlangC = "Erlang C (M/M/c)";
}
