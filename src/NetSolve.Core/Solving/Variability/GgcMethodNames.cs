namespace NetSolve.Solving;

/// <summary>The names <see cref="GgcFormulas"/> gives the method it used for a unit, as shown in the output.</summary>
public static class GgcMethodNames
{
    /// <summary>Poisson arrivals and exponential service (both squared coefficients of variation exactly 1): exact.</summary>
    public const string ErlangC = "Erlang C (M/M/c)";

    /// <summary>Several servers with any other variability: the Allen–Cunneen approximation.</summary>
    public const string AllenCunneen = "Allen-Cunneen (G/G/c)";

    /// <summary>One server, arrivals that are not Poisson: the Kraemer–Langenbach-Belz approximation.</summary>
    public const string KraemerLangenbachBelz = "Kraemer-Langenbach-Belz (G/G/1)";

    /// <summary>One server, Poisson arrivals, any service distribution: the Pollaczek–Khinchine formula (exact).</summary>
    public const string PollaczekKhinchine = "Pollaczek-Khinchine (M/G/1)";
}
