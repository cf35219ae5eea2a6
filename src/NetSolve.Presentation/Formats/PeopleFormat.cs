using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>
/// How every number looks where people read it (tables, report, map): invariant culture, about four significant
/// digits, never an exponent, and each time in the unit that reads best for it with the unit written beside.
/// </summary>
/// <remarks>
/// Rules, in docs/map-and-report.md: a time under an hour is shown in minutes, under two days in hours, else in days;
/// a value too small to plan with is shown as <c>&lt; 0.001 min</c> or <c>&lt; 0.0001</c>; values from 1,000 up are
/// grouped by thousands; probabilities have three decimals, shares are percentages with one decimal, factors
/// (headroom, growth) three decimals; a count that is a whole number (stays, a peak) is shown whole. Thread-safe.
/// </remarks>
public static class PeopleFormat
{
    /// <summary>A value that does not exist (the wait of an unstable unit).</summary>
    public const string Missing = "-";

    /// <summary>Servers with no limit.</summary>
    public const string Unlimited = "unlimited";

    /// <summary>Magnitudes below this are shown as "&lt; 0.0001": too small to plan with.</summary>
    public const double SmallestNumber = 1e-4;

    /// <summary>Magnitudes from this up are shown as "&gt; 1,000,000,000,000,000" rather than as a long row of digits.</summary>
    public const double LargestNumber = 1e15;

    /// <summary>Times below this many minutes are shown as "&lt; 0.001 min".</summary>
    public const double SmallestMinutes = 0.001;

    /// <summary>Times from this many hours up are shown in days.</summary>
    public const double HoursBeforeDays = 48.0;

    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    /// <summary>One cell; rates per <paramref name="timeUnit"/> without their unit (the header says it).</summary>
    public static string Cell(Cell cell, TimeUnit timeUnit)
    {
        if (cell.Text is string text)
        {
            return cell.Marker is string marker ? marker + " " + text : text;
        }

        if (cell.Number is not double value)
        {
            return cell.Dimension == MetricDimension.Servers ? Unlimited : Missing;
        }

        // A value that is not finite is undefined to a reader, as an absent one is: never "Infinity%".
        if (!double.IsFinite(value) || cell.HalfWidth is double spread && !double.IsFinite(spread))
        {
            return Missing;
        }

        if (cell.HalfWidth is double halfWidth)
        {
            return WithHalfWidth(value, halfWidth, cell.Dimension, timeUnit);
        }

        return cell.Dimension switch
        {
            MetricDimension.Time => Time(value),
            MetricDimension.Rate => Number(TimeConstants.RateFromPerHour(value, timeUnit)),
            MetricDimension.Probability => Probability(value),
            MetricDimension.Fraction => Percent(value),
            MetricDimension.Factor => Factor(value),
            MetricDimension.Servers => value.ToString("#,0", Invariant),
            MetricDimension.Count when value == Math.Floor(value) && Math.Abs(value) < LargestNumber => value.ToString("#,0", Invariant),
            _ => Number(value),
        };
    }

    /// <summary>About four significant digits, grouped from 1,000, never an exponent: <c>0.1867</c>, <c>158.8</c>, <c>1,200</c>.</summary>
    public static string Number(double value)
    {
        if (double.IsNaN(value))
        {
            return Missing;
        }

        double magnitude = Math.Abs(value);
        if (magnitude == 0.0)
        {
            return "0";
        }

        if (magnitude < SmallestNumber)
        {
            return value > 0.0 ? "< 0.0001" : "> -0.0001";
        }

        if (magnitude >= LargestNumber)
        {
            return value > 0.0 ? "> 1,000,000,000,000,000" : "< -1,000,000,000,000,000";
        }

        string format = magnitude switch
        {
            >= 1000.0 => "#,0",
            >= 100.0 => "0.0",
            >= 10.0 => "0.00",
            >= 1.0 => "0.000",
            _ => "0.0000",
        };
        return value.ToString(format, Invariant);
    }

    /// <summary>A time stored in hours, in minutes, hours or days, whichever reads best: <c>4.175 min</c>, <c>14.76 h</c>, <c>5.503 d</c>.</summary>
    public static string Time(double hours)
    {
        if (!double.IsFinite(hours))
        {
            return Missing;
        }

        if (hours == 0.0)
        {
            return "0";
        }

        var unit = ReadableUnit(hours);
        return TimeIn(hours, unit) + " " + TimeConstants.Suffix(unit);
    }

    /// <summary>A rate stored per hour, per <paramref name="timeUnit"/> with the unit: <c>11.50/h</c>.</summary>
    public static string Rate(double perHour, TimeUnit timeUnit) =>
        Number(TimeConstants.RateFromPerHour(perHour, timeUnit)) + "/" + TimeConstants.Suffix(timeUnit);

    /// <summary>A probability with three decimals: <c>0.253</c>; <c>&lt; 0.001</c> when above 0 but smaller.</summary>
    public static string Probability(double value) =>
        double.IsNaN(value) ? Missing : value > 0.0 && value < 0.0005 ? "< 0.001" : value.ToString("0.000", Invariant);

    /// <summary>A share as a percentage with one decimal: <c>84.9%</c>; <c>&lt; 0.1%</c> when above 0 but smaller.</summary>
    public static string Percent(double fraction) => PercentNumber(fraction) + "%";

    /// <summary>A change of a share in percentage points with its sign: <c>+3.2 pt</c>.</summary>
    public static string Points(double change) => (change * 100.0).ToString("+0.0;-0.0;0.0", Invariant) + " pt";

    /// <summary>A relative change as a signed percentage: <c>+12.5%</c>, <c>-4.0%</c>.</summary>
    public static string SignedPercent(double relative) =>
        double.IsNaN(relative) ? Missing : Math.Abs(relative) >= LargestNumber / 100.0 ? (relative > 0.0 ? "+" : "-") + "> 1e13%"
            : (relative * 100.0).ToString("+#,0.0;-#,0.0;0.0", Invariant) + "%";

    /// <summary>A signed number for changes: <c>+1.418</c>, <c>-0.2</c>; as <see cref="Number"/> with a plus sign.</summary>
    public static string SignedNumber(double value) => value > 0.0 ? "+" + Number(value) : Number(value);

    /// <summary>A signed time for changes: <c>+4.2 min</c>.</summary>
    public static string SignedTime(double hours) => hours > 0.0 ? "+" + Time(hours) : Time(hours);

    /// <summary>A factor with three decimals: <c>1.178</c>; grouped from 1,000.</summary>
    public static string Factor(double value) =>
        Math.Abs(value) >= 1000.0 ? Number(value) : value.ToString("0.000", Invariant);

    /// <summary>
    /// A simulated mean with ± the half-width of its 95% interval, both in the same unit, written once after them:
    /// <c>4.175 ± 0.3100 min</c>, <c>69.6 ± 0.3%</c>, <c>0.042 ± 0.013</c>; a rate per <paramref name="timeUnit"/> without its unit.
    /// </summary>
    /// <remarks>A time's unit is the one that reads best for the mean (for the half-width when the mean is 0).</remarks>
    public static string WithHalfWidth(double mean, double halfWidth, MetricDimension dimension, TimeUnit timeUnit)
    {
        const string PlusMinus = " \u00B1 ";
        switch (dimension)
        {
            case MetricDimension.Time:
                if (mean == 0.0 && halfWidth == 0.0)
                {
                    return "0" + PlusMinus + "0";
                }

                var unit = ReadableUnit(mean != 0.0 ? mean : halfWidth);
                return TimeIn(mean, unit) + PlusMinus + TimeIn(halfWidth, unit) + " " + TimeConstants.Suffix(unit);
            case MetricDimension.Rate:
                return Number(TimeConstants.RateFromPerHour(mean, timeUnit)) + PlusMinus + Number(TimeConstants.RateFromPerHour(halfWidth, timeUnit));
            case MetricDimension.Probability:
                return Probability(mean) + PlusMinus + Probability(halfWidth);
            case MetricDimension.Fraction:
                return PercentNumber(mean) + PlusMinus + PercentNumber(halfWidth) + "%";
            default:
                return Number(mean) + PlusMinus + Number(halfWidth);
        }
    }

    /// <summary>The unit a time of <paramref name="hours"/> reads best in: minutes under an hour, hours under two days, else days.</summary>
    private static TimeUnit ReadableUnit(double hours)
    {
        double magnitude = Math.Abs(hours);
        return magnitude < 1.0 ? TimeUnit.Minute : magnitude < HoursBeforeDays ? TimeUnit.Hour : TimeUnit.Day;
    }

    /// <summary>The number of a time in <paramref name="unit"/>, without the unit; minutes too small to plan with as <c>&lt; 0.001</c>.</summary>
    private static string TimeIn(double hours, TimeUnit unit)
    {
        switch (unit)
        {
            case TimeUnit.Minute:
                double minutes = hours * TimeConstants.MinutesPerHour;
                return minutes != 0.0 && Math.Abs(minutes) < SmallestMinutes ? (minutes > 0.0 ? "< 0.001" : "> -0.001") : Number(minutes);
            case TimeUnit.Hour:
                return Number(hours);
            default:
                return Number(hours / TimeConstants.HoursPerDay);
        }
    }

    private static string PercentNumber(double fraction) =>
        double.IsNaN(fraction) ? Missing : fraction > 0.0 && fraction < 0.0005 ? "< 0.1" : Number1(fraction * 100.0);

    private static string Number1(double value) =>
        Math.Abs(value) >= LargestNumber ? Number(value) : value.ToString("#,0.0", Invariant);
}
