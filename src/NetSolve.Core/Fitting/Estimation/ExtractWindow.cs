namespace NetSolve.Fitting.Estimation;

/// <summary>The span of time an extract covers: its start is hour 0 of every observation.</summary>
/// <param name="Hours">Length of the extract, from its start to its end; positive.</param>
/// <param name="StartHourOfWeek">
/// Hours from the Monday 00:00 before the extract's start to the start, in [0, 168): aligns entry times with the hours
/// and weekdays of an arrival profile (whose time 0 is Monday 00:00).
/// </param>
public sealed record ExtractWindow(double Hours, double StartHourOfWeek)
{
    /// <summary>Hours in a week.</summary>
    public const double HoursPerWeek = 168.0;

    /// <summary>Checks the window and returns it.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A length that is not finite and positive, or a start outside [0, 168).</exception>
    public static ExtractWindow Of(double hours, double startHourOfWeek = 0.0)
    {
        if (!double.IsFinite(hours) || hours <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(hours), hours, "An extract spans a finite, positive time.");
        }

        if (!(startHourOfWeek >= 0.0 && startHourOfWeek < HoursPerWeek))
        {
            throw new ArgumentOutOfRangeException(nameof(startHourOfWeek), startHourOfWeek, "The start lies in the week: [0, 168) hours after Monday 00:00.");
        }

        return new ExtractWindow(hours, startHourOfWeek);
    }
}
