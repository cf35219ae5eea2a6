namespace NetSolve.Solving;

/// <summary>The names of the hour-by-hour methods, as outputs write them in a unit's <c>method</c> (docs/time-of-day.md).</summary>
public static class TimeVaryingMethodNames
{
    /// <summary>Erlang C at each moment's offered load m(t) and servers c(t) (Jennings, Mandelbaum, Massey and Whitt 1996).</summary>
    public const string ModifiedOfferedLoad = "MOL (Erlang C at the time-varying offered load)";

    /// <summary>The time-dependent birth–death chain of an M_t/M/c_t unit, solved numerically over the cycle.</summary>
    public const string ExactChain = "exact time-dependent chain (M_t/M/c_t)";


    /// <summary>No waiting places and more servers than the exact chain takes: Erlang B at the time-varying offered load (Jagerman 1975).</summary>
    public const string ModifiedOfferedLoadLoss = "MOL (Erlang B at the time-varying offered load)";

    /// <summary>Unlimited servers: nobody waits; the patients in the unit are the offered load.</summary>
    public const string InfiniteServers = MethodNames.InfiniteServers;

    /// <summary>Arrivals over the cycle exceed what the servers can do over the cycle: the queue grows from cycle to cycle.</summary>
    public const string Unstable = "unstable over the cycle";
}
