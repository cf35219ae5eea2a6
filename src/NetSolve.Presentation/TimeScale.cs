using NetSolve.Model;

namespace NetSolve.Presentation;

/// <summary>Factors that turn Core's hours and rates per hour into a network's time unit.</summary>
/// <param name="Unit">The time unit to report in.</param>
public readonly record struct TimeScale(TimeUnit Unit)
{
    /// <summary>Multiply hours by this to get <see cref="Unit"/>.</summary>
    public double TimeFactor => 1.0 / TimeConstants.HoursPer(Unit);

    /// <summary>Multiply a rate per hour by this to get a rate per <see cref="Unit"/>.</summary>
    public double RateFactor => TimeConstants.HoursPer(Unit);

    /// <summary>Hours in <see cref="Unit"/>.</summary>
    public double Time(double hours) => hours * TimeFactor;

    /// <summary>The factor that converts a value of <paramref name="dimension"/> from hours to <see cref="Unit"/>.</summary>
    public double FactorFor(MetricDimension dimension) => dimension switch
    {
        MetricDimension.Time => TimeFactor,
        MetricDimension.Rate => RateFactor,
        _ => 1.0,
    };

    /// <summary>A rate per hour, per <see cref="Unit"/>.</summary>
    public double Rate(double perHour) => perHour * RateFactor;
}
