namespace NetSolve.Solving;

/// <summary>The names <see cref="GgcFormulas"/> gives the method it used for a unit, as shown in the output.</summary>
public static class GgcMethodNames
{
    /// <summary>Poisson arrivals and exponential service (both squared coefficients of variation exactly 1): exact.</summary>
    public const string ErlangC = "Erlang C (M/M/c)";

    /// <summary>Several servers, exponential service, arrivals that are not Poisson: the Allen–Cunneen approximation.</summary>
    public const string AllenCunneen = "Allen-Cunneen (G/G/c)";

    /// <summary>Several servers, service more regular than exponential (cs² &lt; 1): Cosmetatos' M/D/c–M/M/c interpolation.</summary>
    public const string Cosmetatos = "Cosmetatos (G/G/c)";

    /// <summary>Several servers, service more variable than exponential (cs² &gt; 1): light/heavy-traffic interpolation.</summary>
    public const string LightHeavyTraffic = "Light-heavy traffic interpolation (G/G/c)";

    /// <summary>One server, arrivals that are not Poisson: the Kraemer–Langenbach-Belz approximation.</summary>
    public const string KraemerLangenbachBelz = "Kraemer-Langenbach-Belz (G/G/1)";

    /// <summary>One server, Poisson arrivals, any service distribution: the Pollaczek–Khinchine formula (exact).</summary>
    public const string PollaczekKhinchine = "Pollaczek-Khinchine (M/G/1)";
}
