using NetSolve.Model;

namespace NetSolve.Parsing.Values;

/// <summary>
/// The sane range of every quantity a planner writes (docs/network-file.md, "Ranges"). Each bound is far beyond any
/// hospital, so a real value never meets it; what it stops is a slip (<c>1e-320h</c>, <c>1e300/h</c>) whose
/// arithmetic would overflow to infinity or lose every digit, and so reach the results as nonsense.
/// </summary>
/// <remarks>
/// With these bounds a load (rate × time × visits) stays below about 1e24 even with a billion visits per patient,
/// so every derived quantity is an ordinary finite double.
/// </remarks>
public static class ValueRanges
{
    /// <summary>Shortest duration: a microsecond, in hours.</summary>
    public const double ShortestHours = 1e-6 / TimeConstants.SecondsPerHour;

    /// <summary>Longest duration: a hundred years of 365.25 days, in hours.</summary>
    public const double LongestHours = 100.0 * 365.25 * TimeConstants.HoursPerDay;

    /// <summary>Smallest rate above 0, per hour: one event in about 114,000 years.</summary>
    public const double SmallestRatePerHour = 1e-9;

    /// <summary>Largest rate, per hour: a billion an hour.</summary>
    public const double LargestRatePerHour = 1e9;

    /// <summary>Smallest probability above 0 (a route fraction, a share of patients).</summary>
    public const double SmallestProbability = 1e-9;

    /// <summary>Smallest factor above 0 on a time or a rate.</summary>
    public const double SmallestFactor = 1e-9;

    /// <summary>Largest factor on a time or a rate.</summary>
    public const double LargestFactor = 1e9;

    /// <summary>Largest coefficient of variation (<c>service_cv</c>, <c>arrival_cv</c>): a squared CV of 10,000.</summary>
    public const double LargestCv = 100.0;

    /// <summary>The range of a duration as a message says it.</summary>
    public const string DurationRange = "from 1e-6 s to 100 years";

    /// <summary>The range of a rate as a message says it.</summary>
    public const string RateRange = "0, or from 1e-9/h to 1e9/h";

    /// <summary>The range of a probability as a message says it.</summary>
    public const string ProbabilityRange = "0, or from 1e-9 to 1";

    /// <summary>The range of a factor as a message says it.</summary>
    public const string FactorRange = "from 1e-9 to 1e9";

    /// <summary>The range of a coefficient of variation as a message says it.</summary>
    public const string CvRange = "from 0 to 100";

    /// <summary>True for a duration in hours within <see cref="DurationRange"/>.</summary>
    public static bool IsDuration(double hours) => hours is >= ShortestHours and <= LongestHours;

    /// <summary>True for a rate per hour within <see cref="RateRange"/>.</summary>
    public static bool IsRate(double perHour) => perHour == 0.0 || perHour is >= SmallestRatePerHour and <= LargestRatePerHour;
}
