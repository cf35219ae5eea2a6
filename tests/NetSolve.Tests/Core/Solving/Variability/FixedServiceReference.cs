namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>
/// Exact mean wait of an M/D/c queue, independent of the code under test. From memory: C. D. Crommelin, "Delay
/// probability formulae when the holding times are constant", Post Office Electrical Engineers' Journal 25, 1932:
/// with service time D, the number present at time t + D is max(N(t) − c, 0) plus the Poisson(λD) arrivals in
/// between (the c in service at t have left, nobody who arrives after t has). The stationary law of this chain is the
/// time-average law of N, so Lq = E[N] − a and Wq = Lq / λ.
/// </summary>
internal static class FixedServiceReference
{
    public static double MeanWait(int servers, double utilisation, double serviceHours)
    {
        double load = servers * utilisation;
        int states = (int)(servers + (3.0 * Math.Sqrt(load)) + 40.0 + (30.0 / (1.0 - utilisation)));
        var arrivals = new double[states];
        arrivals[0] = Math.Exp(-load);
        for (int j = 1; j < states; j++)
        {
            arrivals[j] = arrivals[j - 1] * load / j;
        }

        // Beyond a + 10√a + 30 arrivals in one service time the Poisson mass is below 1e−20: skipped for speed.
        int arrivalReach = (int)(load + (10.0 * Math.Sqrt(load)) + 30.0);
        var p = new double[states];
        var q = new double[states];
        p[0] = 1.0;
        for (int iteration = 0; iteration < 200_000; iteration++)
        {
            Array.Clear(q);
            for (int i = 0; i < states; i++)
            {
                if (p[i] == 0.0)
                {
                    continue;
                }

                int left = Math.Max(i - servers, 0);
                double rest = 1.0;
                int last = Math.Min(states - 1, left + arrivalReach);
                for (int j = left; j < last; j++)
                {
                    q[j] += p[i] * arrivals[j - left];
                    rest -= arrivals[j - left];
                }

                q[states - 1] += p[i] * Math.Max(rest, 0.0);
            }

            double change = 0.0;
            for (int i = 0; i < states; i++)
            {
                change += Math.Abs(q[i] - p[i]);
            }

            (p, q) = (q, p);
            if (change < 1e-14)
            {
                break;
            }
        }

        double meanPresent = 0.0;
        for (int i = 0; i < states; i++)
        {
            meanPresent += i * p[i];
        }

        // Lq = E[N] − a, and Wq = Lq / λ with λ = a / D.
        return (meanPresent - load) * serviceHours / load;
    }
}
