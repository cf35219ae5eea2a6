using MathNet.Numerics.LinearAlgebra;

namespace NetSolve.Solving;

/// <summary>
/// The index of dispersion for counts I(t) = Var N(t) / E N(t) of a renewal flow known by its mean gap and SCV: the
/// counts of a renewal process whose gaps are the two-moment phase-type fit of <see cref="ServiceStages"/> (H. C.
/// Tijms, A First Course in Stochastic Models, Wiley, 2003, section 5.9), by <see cref="ArrivalCounts"/>.
/// </summary>
/// <remarks>
/// Used for the external streams (gaps of SCV c0²) and for the service completions of a busy unit (gaps of SCV cs²,
/// one server's renewal flow: c busy servers superpose c such flows, whose index is the same). I(0) = 1 and
/// I(∞) = SCV; an SCV of exactly 1 is the Poisson process, I(t) = 1 exactly. SCVs below
/// <see cref="MinimumScv"/> (fixed service) are taken as <see cref="MinimumScv"/>, an Erlang of 20 stages.
/// Immutable; thread-safe.
/// </remarks>
internal sealed class RenewalDispersion
{
    /// <summary>The smallest SCV fitted: 1/<see cref="ServiceStages.MaxStages"/>.</summary>
    public const double MinimumScv = 1.0 / ServiceStages.MaxStages;

    private readonly ArrivalCounts? _counts;

    private RenewalDispersion(ArrivalCounts? counts) => _counts = counts;

    /// <summary>The Poisson process: I(t) = 1 at every window.</summary>
    public static RenewalDispersion Poisson { get; } = new(null);

    /// <summary>True for the Poisson process (I ≡ 1 exactly).</summary>
    public bool IsPoisson => _counts is null;

    /// <summary>A renewal flow with gaps of mean <paramref name="meanGapHours"/> (positive, finite) and SCV <paramref name="scv"/> (finite, not negative).</summary>
    public static RenewalDispersion Of(double meanGapHours, double scv)
    {
        if (scv == 1.0)
        {
            return Poisson;
        }

        var stages = ServiceStages.Fit(meanGapHours, Math.Sqrt(Math.Max(scv, MinimumScv)));
        int m = stages.Count;
        var hidden = Matrix<double>.Build.Dense(m, m);
        var marked = Matrix<double>.Build.Dense(m, m);
        for (int i = 0; i < m; i++)
        {
            double rate = stages.RatesPerHour[i];
            hidden[i, i] = -rate;
            if (i + 1 < m)
            {
                hidden[i, i + 1] = rate * stages.ContinueProbabilities[i];
            }

            // Leaving the last stage (or stopping early) ends a gap: one arrival, and the next gap starts afresh.
            double exit = rate * (1.0 - (i + 1 < m ? stages.ContinueProbabilities[i] : 0.0));
            for (int j = 0; j < m; j++)
            {
                marked[i, j] = exit * stages.EntryProbabilities[j];
            }
        }

        return new RenewalDispersion(new MarkovianArrivalProcess(hidden, marked).Counts());
    }

    /// <summary>I(t) over a window of <paramref name="hours"/> (not negative; +∞ gives the long-run value, the fitted SCV).</summary>
    public double At(double hours) => _counts?.IndexOfDispersion(hours) ?? 1.0;
}
