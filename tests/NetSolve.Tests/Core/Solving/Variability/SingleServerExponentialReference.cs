namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>
/// Exact mean wait of a GI/M/1 queue, independent of the code under test. From memory: D. Gross, J. F. Shortle,
/// J. M. Thompson &amp; C. M. Harris, Fundamentals of Queueing Theory, 4th ed., Wiley 2008, section on GI/M/1 (5.3):
/// σ is the root in (0, 1) of σ = A*(μ(1 − σ)), A* the Laplace–Stieltjes transform of the time between arrivals,
/// and Wq = σ / (μ(1 − σ)).
/// </summary>
internal static class SingleServerExponentialReference
{
    public static double MeanWait(Func<double, double> interarrivalTransform, double servicePerHour)
    {
        // The iteration from 0 rises monotonically to the smallest root, which is below 1 when ρ < 1.
        double sigma = 0.0;
        for (int i = 0; i < 1_000_000; i++)
        {
            double next = interarrivalTransform(servicePerHour * (1.0 - sigma));
            if (Math.Abs(next - sigma) < 1e-15)
            {
                sigma = next;
                break;
            }

            sigma = next;
        }

        return sigma / (servicePerHour * (1.0 - sigma));
    }

    public static Func<double, double> Poisson(double arrivalsPerHour) => s => arrivalsPerHour / (arrivalsPerHour + s);

    public static Func<double, double> Fixed(double arrivalsPerHour) => s => Math.Exp(-s / arrivalsPerHour);

    /// <summary>Erlang-k times between arrivals: ca² = 1/k.</summary>
    public static Func<double, double> Erlang(int phases, double arrivalsPerHour) =>
        s => Math.Pow(phases * arrivalsPerHour / ((phases * arrivalsPerHour) + s), phases);

    /// <summary>Two-phase hyperexponential with balanced means and the given ca² above 1.</summary>
    public static Func<double, double> Hyperexponential(double arrivalScv, double arrivalsPerHour)
    {
        double p = 0.5 * (1.0 + Math.Sqrt((arrivalScv - 1.0) / (arrivalScv + 1.0)));
        double rate1 = 2.0 * p * arrivalsPerHour;
        double rate2 = 2.0 * (1.0 - p) * arrivalsPerHour;
        return s => (p * rate1 / (rate1 + s)) + ((1.0 - p) * rate2 / (rate2 + s));
    }
}
