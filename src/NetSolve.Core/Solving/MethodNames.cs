namespace NetSolve.Solving;

/// <summary>
/// The names of the methods a unit's metrics come from, as every output writes them (docs/methods.md): these two,
/// <see cref="GgcMethodNames"/> for waits with variable arrivals and service, and the capacity methods of
/// <see cref="FiniteCapacityFormulas"/>.
/// </summary>
public static class MethodNames
{
    /// <summary>Unlimited servers: nobody waits, exact for any service distribution.</summary>
    public const string InfiniteServers = "M/G/inf";

    /// <summary>Poisson arrivals and exponential service on c servers: exact (Jackson's product form).</summary>
    public const string ErlangC = GgcMethodNames.ErlangC;

    /// <summary>
    /// A unit receiving patients diverted from full units: its two-moment wait multiplied by the effect of their bursts
    /// (interrupted Poisson overflow, solved exactly for exponential service; an approximation).
    /// </summary>
    public const string DivertedOverflow = "Diverted overflow bursts (interrupted Poisson, G/G/c)";
}
