namespace NetSolve.Solving;

/// <summary>
/// A service time written as exponential stages in series or in parallel (a phase-type distribution) with the same
/// mean and coefficient of variation as the unit's service, so that the time-varying load stays a set of linear
/// differential equations even in a network with loops.
/// </summary>
/// <remarks>
/// <para>
/// A patient enters stage i with probability <see cref="EntryProbabilities"/>[i], stays there an exponential time of
/// rate <see cref="RatesPerHour"/>[i], then moves to stage i + 1 with probability <see cref="ContinueProbabilities"/>[i]
/// or leaves the unit. Fits (Tijms, <i>A First Course in Stochastic Models</i>, Wiley 2003, section 5.9, two-moment
/// fits): cv = 1 one exponential stage (exact); cv² in [1/k, 1/(k−1)] a mixture of Erlang(k−1) and Erlang(k) with a
/// common rate; cv &gt; 1 two parallel exponential stages with balanced means. Below cv² = 1/<see cref="MaxStages"/>
/// (including deterministic service) the fit is Erlang(<see cref="MaxStages"/>), whose cv is slightly larger than asked.
/// Immutable.
/// </para>
/// </remarks>
internal sealed class ServiceStages
{
    /// <summary>The most stages a fit uses: cv down to 1/√20 ≈ 0.224 is matched exactly, lower cv by Erlang(20).</summary>
    public const int MaxStages = 20;

    private ServiceStages(double[] entry, double[] rates, double[] next)
    {
        EntryProbabilities = entry;
        RatesPerHour = rates;
        ContinueProbabilities = next;
    }

    /// <summary>Chance of starting service in each stage; sums to 1.</summary>
    public double[] EntryProbabilities { get; }

    /// <summary>Completion rate of each stage, per hour.</summary>
    public double[] RatesPerHour { get; }

    /// <summary>Chance of moving on to the next stage after each stage (0 for the last).</summary>
    public double[] ContinueProbabilities { get; }

    /// <summary>Number of stages.</summary>
    public int Count => RatesPerHour.Length;

    /// <summary>Fits stages to a service of mean <paramref name="meanHours"/> and coefficient of variation <paramref name="cv"/>.</summary>
    public static ServiceStages Fit(double meanHours, double cv)
    {
        double squaredCv = cv * cv;
        if (Math.Abs(squaredCv - 1.0) <= 1e-12)
        {
            return new ServiceStages([1.0], [1.0 / meanHours], [0.0]);
        }

        return squaredCv > 1.0 ? Balanced(meanHours, squaredCv) : ErlangMixture(meanHours, squaredCv);
    }

    private static ServiceStages Balanced(double meanHours, double squaredCv)
    {
        double first = 0.5 * (1.0 + Math.Sqrt((squaredCv - 1.0) / (squaredCv + 1.0)));
        double second = 1.0 - first;
        return new ServiceStages([first, second], [2.0 * first / meanHours, 2.0 * second / meanHours], [0.0, 0.0]);
    }

    private static ServiceStages ErlangMixture(double meanHours, double squaredCv)
    {
        int stages = (int)Math.Min(MaxStages, Math.Ceiling((1.0 / squaredCv) - 1e-12));
        double shorter = 0.0;
        if (stages < MaxStages || squaredCv * MaxStages >= 1.0)
        {
            // Tijms's fit: Erlang(k−1) with probability p, Erlang(k) otherwise, all stages at rate (k − p)/mean.
            double k = stages;
            shorter = ((k * squaredCv) - Math.Sqrt((k * (1.0 + squaredCv)) - (k * k * squaredCv))) / (1.0 + squaredCv);
            shorter = Math.Clamp(shorter, 0.0, 1.0);
        }

        double rate = (stages - shorter) / meanHours;
        var entry = new double[stages];
        entry[0] = 1.0;
        var rates = new double[stages];
        Array.Fill(rates, rate);
        var next = new double[stages];
        Array.Fill(next, 1.0);
        next[stages - 1] = 0.0;
        if (stages >= 2)
        {
            next[stages - 2] = 1.0 - shorter;
        }

        return new ServiceStages(entry, rates, next);
    }
}
