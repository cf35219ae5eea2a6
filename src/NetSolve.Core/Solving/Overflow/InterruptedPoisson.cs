namespace NetSolve.Solving;

/// <summary>
/// An interrupted Poisson stream: patients arrive at <see cref="OnPerHour"/> while the stream is on and not at all while
/// it is off; on and off periods are exponential. NetSolve's model of the patients a full unit diverts elsewhere.
/// </summary>
/// <remarks>
/// Immutable. The two-moment fit of an overflow stream by an interrupted Poisson process follows A. Kuczura, "The
/// interrupted Poisson process as an overflow process", Bell System Technical Journal 52(3), 1973, pp. 437–448 (from
/// memory; Kuczura matches three moments, NetSolve matches two and fixes the on-rate, see <see cref="FitOverflow"/>).
/// </remarks>
/// <param name="OnPerHour">λ: arrivals per hour while on, positive.</param>
/// <param name="OnToOffPerHour">ω₁: rate at which an on period ends.</param>
/// <param name="OffToOnPerHour">ω₂: rate at which an off period ends.</param>
public sealed record InterruptedPoisson(double OnPerHour, double OnToOffPerHour, double OffToOnPerHour)
{
    /// <summary>The share of time the stream is on, ω₂/(ω₁ + ω₂).</summary>
    public double OnProbability => OffToOnPerHour / (OnToOffPerHour + OffToOnPerHour);

    /// <summary>The long-run arrivals per hour, λ·P(on).</summary>
    public double MeanPerHour => OnPerHour * OnProbability;

    /// <summary>
    /// The stream's peakedness seen by exponential stays of rate θ: Z = 1 + λω₁ / ((ω₁ + ω₂)(ω₁ + ω₂ + θ)) (from the
    /// two-state moment equations of <see cref="OverflowPeakedness"/>; tested against them).
    /// </summary>
    public double Peakedness(double holdingRatePerHour)
    {
        double switching = OnToOffPerHour + OffToOnPerHour;
        return 1.0 + (OnPerHour * OnToOffPerHour / (switching * (switching + holdingRatePerHour)));
    }

    /// <summary>
    /// The interrupted Poisson stream with the overflow's rate and peakedness: on while the source is full, arriving at
    /// the source's offered rate λ (exactly what a full unit diverts), on for the share p of time that gives the overflow
    /// rate λp, and switching at the total rate s = ω₁ + ω₂ that gives peakedness Z at θ: s = λ(1 − p)/(Z − 1) − θ.
    /// </summary>
    /// <param name="sourceOfferedPerHour">λ offered to the full unit, positive.</param>
    /// <param name="fullProbability">p: the chance the source is full, in (0, 1).</param>
    /// <param name="peakedness">Z of the overflow at θ (<see cref="OverflowPeakedness.Of"/>).</param>
    /// <param name="holdingRatePerHour">θ: the receiving unit's service rate.</param>
    /// <returns>The stream; null when no stream of this form fits (Z too close to 1, i.e. nearly Poisson, or p outside (0, 1)).</returns>
    public static InterruptedPoisson? FitOverflow(double sourceOfferedPerHour, double fullProbability, double peakedness, double holdingRatePerHour)
    {
        if (!(sourceOfferedPerHour > 0.0) || !(fullProbability > 0.0) || !(fullProbability < 1.0) || !(peakedness > 1.0) || !(holdingRatePerHour > 0.0))
        {
            return null;
        }

        double switching = (sourceOfferedPerHour * (1.0 - fullProbability) / (peakedness - 1.0)) - holdingRatePerHour;
        if (!(switching > 0.0) || !double.IsFinite(switching))
        {
            return null;
        }

        return new InterruptedPoisson(sourceOfferedPerHour, switching * (1.0 - fullProbability), switching * fullProbability);
    }
}
