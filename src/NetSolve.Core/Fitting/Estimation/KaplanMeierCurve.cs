using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// A Kaplan–Meier survival curve of stay lengths: the chance a stay lasts beyond each time, stepping down at every
/// time a stay ended, with Greenwood's standard error at each step.
/// </summary>
/// <param name="Times">The distinct times at which at least one stay ended, ascending.</param>
/// <param name="AtRisk">Stays still running (and already under observation) just before each time.</param>
/// <param name="Events">Stays ending at each time.</param>
/// <param name="Survival">The estimated chance a stay lasts beyond each time (just after the step).</param>
/// <param name="StandardError">Greenwood's standard error of <paramref name="Survival"/> at each time.</param>
/// <param name="LastObservedHours">The longest stay observed, ended or censored.</param>
/// <param name="LastIsCensored">Whether the longest stay was still running: then the curve never reaches 0.</param>
public sealed record KaplanMeierCurve(
    ImmutableArray<double> Times,
    ImmutableArray<int> AtRisk,
    ImmutableArray<int> Events,
    ImmutableArray<double> Survival,
    ImmutableArray<double> StandardError,
    double LastObservedHours,
    bool LastIsCensored)
{
    /// <summary>The estimated chance a stay lasts beyond <paramref name="hours"/> (1 before the first step).</summary>
    public double SurvivalAt(double hours)
    {
        int index = Times.BinarySearch(hours);
        int last = index >= 0 ? index : ~index - 1;
        return last < 0 ? 1.0 : Survival[last];
    }

    /// <summary>
    /// The mean stay restricted to <paramref name="limitHours"/> (the area under the curve from 0 to the limit), with
    /// its standard error (Klein and Moeschberger, Survival Analysis, 2nd ed., 2003, section 4.5, eq. 4.5.2):
    /// Var = Σ A_j² d_j / (n_j (n_j − d_j)) over steps before the limit, A_j the area from step j to the limit.
    /// </summary>
    public (double MeanHours, double StandardError) RestrictedMean(double limitHours)
    {
        double area = 0.0;
        double previousTime = 0.0;
        double previousSurvival = 1.0;
        for (int j = 0; j < Times.Length && Times[j] <= limitHours; j++)
        {
            area += previousSurvival * (Times[j] - previousTime);
            previousTime = Times[j];
            previousSurvival = Survival[j];
        }

        area += previousSurvival * Math.Max(0.0, limitHours - previousTime);

        // Areas from each step to the limit, accumulated backwards.
        double tail = 0.0;
        double upper = limitHours;
        double variance = 0.0;
        for (int j = Times.Length - 1; j >= 0; j--)
        {
            if (Times[j] > limitHours)
            {
                continue;
            }

            tail += Survival[j] * (upper - Times[j]);
            upper = Times[j];
            int n = AtRisk[j];
            int d = Events[j];
            if (n > d)
            {
                variance += tail * tail * d / ((double)n * (n - d));
            }
        }

        return (area, Math.Sqrt(variance));
    }

    /// <summary>
    /// The mean stay over the whole curve. When the longest stay was still running the curve stops above 0; it is then
    /// continued by the exponential tail through its last point, S(t) = exp(t·ln S(t_max) / t_max) (Brown, Hollander and
    /// Korwar 1974, as given by Klein and Moeschberger, Survival Analysis, 2nd ed., 2003, section 4.2), which adds
    /// S(t_max)·t_max / (−ln S(t_max)). Null when no stay ended (nothing to fit the tail to).
    /// </summary>
    public double? MeanWithTail()
    {
        if (Times.IsEmpty)
        {
            return null;
        }

        double restricted = RestrictedMean(LastObservedHours).MeanHours;
        double last = Survival[^1];
        if (!LastIsCensored || last <= 0.0)
        {
            return restricted;
        }

        double logLast = Math.Log(last);
        return logLast < 0.0 ? restricted + (last * LastObservedHours / -logLast) : null;
    }
}
