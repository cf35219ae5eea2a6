namespace NetSolve.Model;

/// <summary>A hospital unit: its servers (beds, cubicles, scanners, clinicians) and its mean service time.</summary>
/// <remarks>
/// The optional <c>init</c> properties are extensions whose defaults keep the v1 meaning: service given only by
/// <see cref="MeanServiceHours"/> and <see cref="ServiceCv"/>, and no limit on the patients in the unit.
/// </remarks>
/// <param name="Id">The unit id from the file: letters, digits, <c>_</c> and <c>-</c>, starting with a letter.</param>
/// <param name="Label">The display name; the id when the file gives none.</param>
/// <param name="Servers">Servers working at once; never <c>default(Servers)</c>.</param>
/// <param name="MeanServiceHours">Mean time a patient holds a server, in hours; positive and finite.</param>
/// <param name="ServiceCv">Coefficient of variation of the service time; 1 is exponential.</param>
public sealed record Unit(string Id, string Label, Servers Servers, double MeanServiceHours, double ServiceCv = 1.0)
{
    private readonly Servers _servers = Made(Servers);

    /// <summary>Servers working at once: made by <see cref="Servers.Of"/> or <see cref="Servers.Unlimited"/>.</summary>
    /// <exception cref="ArgumentException">Set to <c>default(Servers)</c>, at construction or in <c>with</c>.</exception>
    public Servers Servers
    {
        get => _servers;
        init => _servers = Made(value);
    }

    /// <summary>
    /// The service-time distribution given in the file; null when the file gives only <c>service</c> and
    /// <c>service_cv</c> (see <see cref="EffectiveService"/>). When set, its mean equals <see cref="MeanServiceHours"/>.
    /// </summary>
    public ServiceDistribution? Service { get; init; }

    /// <summary>The most patients the unit holds at once, in service and waiting; null for no limit.</summary>
    public int? Capacity { get; init; }

    /// <summary>What happens to a patient arriving when the unit holds <see cref="Capacity"/> patients.</summary>
    public WhenFull WhenFull { get; init; } = WhenFull.TurnAway;

    /// <summary>What the unit is expected to meet (the file's <c>targets</c> section); null when nothing is set.</summary>
    public UnitTargets? Targets { get; init; }

    /// <summary>
    /// Servers by hour of day (or of week) from the file's <c>roster</c>; null when the unit keeps
    /// <see cref="Servers"/> all the time. Never set on a unit with unlimited servers. The simulator and the by-hour
    /// formulas follow it; the steady-state formulas keep <see cref="Servers"/>, which the file still gives.
    /// </summary>
    public Roster? Roster { get; init; }

    /// <summary>The distribution the simulator uses: <see cref="Service"/>, or the v1 meaning of mean and cv.</summary>
    public ServiceDistribution EffectiveService => Service ?? ServiceDistribution.FromMeanAndCv(MeanServiceHours, ServiceCv);

    private static Servers Made(Servers servers) => servers.IsValid
        ? servers
        : throw new ArgumentException("A unit's servers are made by Servers.Of(count) or Servers.Unlimited, never default(Servers).", nameof(servers));
}
