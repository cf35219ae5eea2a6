using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using System.Globalization;

namespace NetSolve.Simulation;

/// <summary>How to simulate: seed, replications, run lengths and the waits to report the chance of exceeding.</summary>
/// <remarks>Immutable. Times are in hours. The same options and network give byte-identical results whatever the thread count.</remarks>
public sealed record SimulationOptions
{
    /// <summary>Default replications: enough for a Student t interval with 9 degrees of freedom.</summary>
    public const int DefaultReplications = 10;

    /// <summary>Default warm-up: 4 weeks, long enough for wards with stays of days to fill (common practice: several times the longest stay).</summary>
    public const double DefaultWarmupHours = 28 * 24;

    /// <summary>Default statistics window per replication: 52 whole weeks, so every hour and weekday counts equally.</summary>
    public const double DefaultDurationHours = 364 * 24;

    /// <summary>Seed of the whole run; replication i draws from its own stream derived from (seed, i).</summary>
    public ulong Seed { get; init; } = 1;

    /// <summary>Independent replications, at least 1 (at least 2 for confidence half-widths).</summary>
    public int Replications { get; init; } = DefaultReplications;

    /// <summary>Simulated time discarded at the start of each replication, in hours; not negative.</summary>
    public double WarmupHours { get; init; } = DefaultWarmupHours;

    /// <summary>Simulated time over which statistics are collected, after the warm-up, in hours; positive.</summary>
    public double DurationHours { get; init; } = DefaultDurationHours;

    /// <summary>Waits t, in hours, for which P(wait &gt; t) is reported per unit.</summary>
    public ImmutableArray<double> WaitThresholdsHours { get; init; } = [];

    /// <summary>
    /// The relative precision asked of the key means, a fraction in (0, 1) (0.05 for 5%); null for none. With it, replications
    /// are added after the first <see cref="Replications"/> until the 95% half-width of every unit's mean wait and mean
    /// number in unit is at most this share of the mean (see <see cref="PrecisionCheck"/>), or <see cref="MaxReplications"/> is reached.
    /// </summary>
    public double? Precision { get; init; }

    /// <summary>Default upper bound on replications when a precision is asked: the effort a run may take before it stops and says the precision was not reached.</summary>
    public const int DefaultMaxReplications = 200;

    /// <summary>Most replications a run asked for a <see cref="Precision"/> may make; at least <see cref="Replications"/>.</summary>
    public int MaxReplications { get; init; } = DefaultMaxReplications;

    /// <summary>True when <see cref="WarmupHours"/> was chosen from the model (the slowest unit's relaxation time) rather than given.</summary>
    public bool IsWarmupFromModel { get; init; }

    /// <summary>True when <see cref="DurationHours"/> was chosen from the model rather than given.</summary>
    public bool IsDurationFromModel { get; init; }

    /// <summary>Most replications run at once; −1 for all cores. Does not change the results.</summary>
    public int MaxDegreeOfParallelism { get; init; } = -1;

    /// <summary>Throws <see cref="ArgumentException"/> naming the first option out of range.</summary>
    [SuppressMessage("Usage", "MA0015:Specify the parameter name in ArgumentException", Justification = "The parameter name is the option property out of range, which callers look for.")]
    public void Validate()
    {
        if (Replications < 1)
        {
            throw new ArgumentException(Message("replications", Replications, "at least 1"), nameof(Replications));
        }

        if (!double.IsFinite(WarmupHours) || WarmupHours < 0.0)
        {
            throw new ArgumentException(Message("warm-up", WarmupHours, "finite and not negative"), nameof(WarmupHours));
        }

        if (!double.IsFinite(DurationHours) || DurationHours <= 0.0)
        {
            throw new ArgumentException(Message("duration", DurationHours, "finite and positive"), nameof(DurationHours));
        }

        foreach (double wait in WaitThresholdsHours.IsDefault ? [] : WaitThresholdsHours)
        {
            if (!double.IsFinite(wait) || wait < 0.0)
            {
                throw new ArgumentException(Message("wait threshold", wait, "finite and not negative"), nameof(WaitThresholdsHours));
            }
        }

        if (Precision is double precision && !(precision > 0.0 && precision < 1.0))
        {
            throw new ArgumentException(Message("precision", precision, "above 0 and below 1"), nameof(Precision));
        }

        if (Precision is not null && MaxReplications < Replications)
        {
            throw new ArgumentException(Message("most replications", MaxReplications, "at least the replications"), nameof(MaxReplications));
        }

        if (MaxDegreeOfParallelism == 0 || MaxDegreeOfParallelism < -1)
        {
            throw new ArgumentException(Message("parallelism", MaxDegreeOfParallelism, "-1 or at least 1"), nameof(MaxDegreeOfParallelism));
        }
    }

    private static string Message(string name, double value, string rule) =>
        string.Create(CultureInfo.InvariantCulture, $"The {name} is {value}; it must be {rule}.");
}
