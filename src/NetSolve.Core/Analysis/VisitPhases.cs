namespace NetSolve.Analysis;

/// <summary>
/// One visit to a unit as a small phase-type block: an optional wait phase (entered with the chance of waiting,
/// left at the rate that gives the mean wait of those who wait) followed by the service phases fitted to the
/// service's mean and squared coefficient of variation (SCV). Times in hours. Immutable.
/// </summary>
/// <remarks>
/// The wait of those who wait is taken as exponential: exact for M/M/c (Erlang C: the conditional wait is
/// exponential with rate cμ − λ), and the usual two-moment approximation otherwise (From memory: Whitt, "Approximations
/// for the GI/G/m queue", Production and Operations Management 2(2), 1993, 114-161). The service is fitted by its SCV
/// c² as in Tijms, A First Course in Stochastic Models, Wiley, 2003, section 5.9 (pages 358-359): exponential for
/// c² = 1; for c² &lt; 1 a mixture of Erlang(k − 1) and Erlang(k) with one rate, 1/k ≤ c² ≤ 1/(k − 1); for c² &gt; 1 a
/// two-phase hyperexponential with balanced means. Below c² = 1/20 (nearly fixed times) Erlang(20) is used.
/// </remarks>
/// <param name="Start">Where a visit starts, by phase of the block; adds up to 1.</param>
/// <param name="Rates">Rates between the block's phases (row from, column to).</param>
/// <param name="Exit">Rate from each phase to the end of the visit.</param>
internal sealed record VisitPhases(double[] Start, double[,] Rates, double[] Exit)
{
    private const int MostErlangPhases = 20;

    /// <summary>The number of phases in the block.</summary>
    public int Count => Start.Length;

    /// <summary>A visit: the wait (skipped when <paramref name="waitProbability"/> or the mean wait is 0) then the service.</summary>
    /// <param name="waitProbability">P(wait &gt; 0) at the unit, in [0, 1].</param>
    /// <param name="meanWaitHours">The mean wait of every patient, those who do not wait included.</param>
    /// <param name="serviceHours">The mean service time.</param>
    /// <param name="serviceScv">The service's squared coefficient of variation.</param>
    public static VisitPhases Of(double waitProbability, double meanWaitHours, double serviceHours, double serviceScv)
    {
        var (serviceStart, serviceRates, serviceExit) = Service(serviceHours, serviceScv);
        bool waits = waitProbability > 0.0 && meanWaitHours > 0.0;
        if (!waits)
        {
            return new VisitPhases(serviceStart, serviceRates, serviceExit);
        }

        int n = serviceStart.Length + 1;
        var start = new double[n];
        var rates = new double[n, n];
        var exit = new double[n];
        double leaveWait = Math.Min(waitProbability, 1.0) / meanWaitHours;
        start[0] = Math.Min(waitProbability, 1.0);
        for (int i = 0; i < serviceStart.Length; i++)
        {
            start[i + 1] = (1.0 - start[0]) * serviceStart[i];
            rates[0, i + 1] = leaveWait * serviceStart[i];
            exit[i + 1] = serviceExit[i];
            for (int j = 0; j < serviceStart.Length; j++)
            {
                rates[i + 1, j + 1] = serviceRates[i, j];
            }
        }

        return new VisitPhases(start, rates, exit);
    }

    private static (double[] Start, double[,] Rates, double[] Exit) Service(double meanHours, double scv)
    {
        if (Math.Abs(scv - 1.0) <= 1e-9)
        {
            return ([1.0], new double[1, 1], [1.0 / meanHours]);
        }

        if (scv > 1.0)
        {
            double p1 = 0.5 * (1.0 + Math.Sqrt((scv - 1.0) / (scv + 1.0)));
            return ([p1, 1.0 - p1], new double[2, 2], [2.0 * p1 / meanHours, 2.0 * (1.0 - p1) / meanHours]);
        }

        int k = scv <= 1.0 / MostErlangPhases ? MostErlangPhases : (int)Math.Ceiling((1.0 / scv) - 1e-9);
        k = Math.Max(k, 2);
        double p = scv <= 1.0 / MostErlangPhases
            ? 0.0
            : Math.Max(0.0, ((k * scv) - Math.Sqrt((k * (1.0 + scv)) - (k * k * scv))) / (1.0 + scv));
        double rate = (k - p) / meanHours;
        var start = new double[k];
        start[0] = 1.0 - p;
        start[1] += p;
        var rates = new double[k, k];
        var exit = new double[k];
        for (int i = 0; i < k - 1; i++)
        {
            rates[i, i + 1] = rate;
        }

        exit[k - 1] = rate;
        return (start, rates, exit);
    }
}
