namespace NetSolve.Tests.Simulation;

/// <summary>
/// Exact steady-state values of an M/M/c unit, computed here from the textbook formulas rather than from the product's
/// solver, as the reference the simulator's coverage is measured against.
/// </summary>
/// <remarks>
/// Source: Gross, Shortle, Thompson and Harris, Fundamentals of Queueing Theory, 4th ed., Wiley, 2008, section 2.3
/// (M/M/c): Erlang C, C = P(wait &gt; 0); the mean wait C / (cμ − λ); given a wait, it is exponential with rate cμ − λ.
/// Exact by hand from these: the time in unit is the wait plus an independent exponential service of rate μ, so
/// P(T &gt; t) = (1 − C)·e^(−μt) + C·(θ·e^(−μt) − μ·e^(−θt)) / (θ − μ) with θ = cμ − λ (θ ≠ μ), the convolution of
/// the two exponentials ((1 + μt)·e^(−μt) given a wait when θ = μ); for c = 1 it is e^(−(μ − λ)t).
/// </remarks>
internal sealed record ExactMmc(int Servers, double ArrivalsPerHour, double ServiceRatePerHour, double WaitProbability)
{
    public double MeanWaitHours => WaitProbability / ((Servers * ServiceRatePerHour) - ArrivalsPerHour);

    public double MeanInUnit => ArrivalsPerHour * (MeanWaitHours + (1.0 / ServiceRatePerHour));

    public static ExactMmc Of(int servers, double arrivalsPerHour, double serviceHours)
    {
        double offered = arrivalsPerHour * serviceHours;
        double rho = offered / servers;

        // Erlang C from the sum Σ a^k/k! for k < c and the last term a^c/c! · 1/(1 − ρ).
        double term = 1.0;
        double sum = 0.0;
        for (int k = 0; k < servers; k++)
        {
            sum += term;
            term *= offered / (k + 1);
        }

        double last = term / (1.0 - rho);
        return new ExactMmc(servers, arrivalsPerHour, 1.0 / serviceHours, last / (sum + last));
    }

    public double TimeInUnitOver(double hours)
    {
        double mu = ServiceRatePerHour;
        double theta = (Servers * mu) - ArrivalsPerHour;
        if (Servers == 1)
        {
            return Math.Exp(-theta * hours);
        }

        double c = WaitProbability;
        if (theta == mu)
        {
            // The two rates equal: the sum of two exponentials is Erlang-2, P(> t) = (1 + μt)·e^(−μt).
            return ((1.0 - c) * Math.Exp(-mu * hours)) + (c * (1.0 + (mu * hours)) * Math.Exp(-mu * hours));
        }

        return ((1.0 - c) * Math.Exp(-mu * hours)) + (c * ((theta * Math.Exp(-mu * hours)) - (mu * Math.Exp(-theta * hours))) / (theta - mu));
    }

    /// <summary>The p-quantile of the time in unit, by bisection on <see cref="TimeInUnitOver"/> to a relative 1e-12.</summary>
    public double TimeInUnitQuantileHours(double p)
    {
        double low = 0.0;
        double high = 1.0 / ServiceRatePerHour;
        while (TimeInUnitOver(high) > 1.0 - p)
        {
            high *= 2.0;
        }

        while (high - low > 1e-12 * high)
        {
            double middle = 0.5 * (low + high);
            if (TimeInUnitOver(middle) > 1.0 - p)
            {
                low = middle;
            }
            else
            {
                high = middle;
            }
        }

        return 0.5 * (low + high);
    }
}
