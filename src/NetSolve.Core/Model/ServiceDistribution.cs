using System.Collections.Immutable;

namespace NetSolve.Model;

/// <summary>How long a patient holds a server: a distribution family with its mean and coefficient of variation.</summary>
/// <remarks>
/// Immutable; build with the named factories. Times are in hours. For <see cref="ServiceKind.Empirical"/> the mean and
/// cv are those of the observed durations (population cv), and <see cref="SamplesHours"/> holds them in file order.
/// Lognormal and gamma with cv 0 behave as deterministic.
/// </remarks>
public sealed record ServiceDistribution
{
    private ServiceDistribution(ServiceKind kind, double meanHours, double cv, ImmutableArray<double> samplesHours)
    {
        Kind = kind;
        MeanHours = meanHours;
        Cv = cv;
        SamplesHours = samplesHours;
    }

    /// <summary>The distribution family.</summary>
    public ServiceKind Kind { get; }

    /// <summary>Mean service time in hours; positive and finite.</summary>
    public double MeanHours { get; }

    /// <summary>Coefficient of variation (standard deviation / mean); finite and not negative.</summary>
    public double Cv { get; }

    /// <summary>Observed durations in hours for <see cref="ServiceKind.Empirical"/>; empty otherwise.</summary>
    public ImmutableArray<double> SamplesHours { get; }

    /// <summary>Exponential service with the given mean.</summary>
    public static ServiceDistribution Exponential(double meanHours) =>
        new(ServiceKind.Exponential, CheckMean(meanHours), 1.0, []);

    /// <summary>Every service lasts exactly <paramref name="meanHours"/>.</summary>
    public static ServiceDistribution Deterministic(double meanHours) =>
        new(ServiceKind.Deterministic, CheckMean(meanHours), 0.0, []);

    /// <summary>Lognormal service with the given mean and coefficient of variation.</summary>
    public static ServiceDistribution Lognormal(double meanHours, double cv) =>
        new(ServiceKind.Lognormal, CheckMean(meanHours), CheckCv(cv), []);

    /// <summary>Gamma service with the given mean and coefficient of variation (shape 1/cv²).</summary>
    public static ServiceDistribution Gamma(double meanHours, double cv) =>
        new(ServiceKind.Gamma, CheckMean(meanHours), CheckCv(cv), []);

    /// <summary>Service resampled from observed durations: at least one, each positive and finite, in hours.</summary>
    public static ServiceDistribution Empirical(IEnumerable<double> samplesHours)
    {
        ArgumentNullException.ThrowIfNull(samplesHours);
        var samples = samplesHours.ToImmutableArray();
        if (samples.IsEmpty)
        {
            throw new ArgumentException("An empirical distribution needs at least one observed duration.", nameof(samplesHours));
        }

        foreach (double sample in samples)
        {
            CheckMean(sample);
        }

        double mean = samples.Average();
        double variance = samples.Sum(sample => (sample - mean) * (sample - mean)) / samples.Length;
        return new ServiceDistribution(ServiceKind.Empirical, mean, Math.Sqrt(variance) / mean, samples);
    }

    /// <summary>
    /// The distribution a v1 unit means by <c>service</c> and <c>service_cv</c>: exponential for cv 1, deterministic
    /// for cv 0, otherwise gamma (continuous in cv, and exponential again at cv 1).
    /// </summary>
    public static ServiceDistribution FromMeanAndCv(double meanHours, double cv)
    {
        CheckCv(cv);
        if (cv == 1.0)
        {
            return Exponential(meanHours);
        }

        return cv == 0.0 ? Deterministic(meanHours) : Gamma(meanHours, cv);
    }

    private static double CheckMean(double hours) => double.IsFinite(hours) && hours > 0.0
        ? hours
        : throw new ArgumentOutOfRangeException(nameof(hours), hours, "A service time is positive and finite.");

    private static double CheckCv(double cv) => double.IsFinite(cv) && cv >= 0.0
        ? cv
        : throw new ArgumentOutOfRangeException(nameof(cv), cv, "A coefficient of variation is finite and not negative.");
}
