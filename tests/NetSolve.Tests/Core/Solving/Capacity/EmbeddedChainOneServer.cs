using MathNet.Numerics.LinearAlgebra;

namespace NetSolve.Tests.Core.Solving.Capacity;

/// <summary>
/// The exact M/G/1/K queue, solved numerically as a reference: the number left behind at departures is a Markov chain
/// on 0 .. K − 1 whose steps are the Poisson arrivals during one service, and the time-average probabilities follow
/// as p_n = π_n/(π_0 + ρ) for n &lt; K and p_K = 1 − 1/(π_0 + ρ).
/// </summary>
/// <remarks>
/// Source: D. Gross, J. F. Shortle, J. M. Thompson and C. M. Harris, Fundamentals of Queueing Theory, 4th ed., Wiley,
/// 2008, the section on M/G/1/K (embedded chain and its relation to the time averages; section number from memory).
/// </remarks>
internal static class EmbeddedChainOneServer
{
    /// <summary>P(full), mean queue and mean wait of admitted patients, given k ↦ P(k arrivals during one service).</summary>
    public static (double Full, double MeanQueue, double MeanWaitHours) Solve(int capacity, double arrivalsPerHour, double meanServiceHours,
        Func<int, double> arrivalsDuringService)
    {
        int states = capacity;
        var arrivals = Enumerable.Range(0, capacity + 1).Select(arrivalsDuringService).ToArray();
        var transition = Matrix<double>.Build.Dense(states, states);
        for (int from = 0; from < states; from++)
        {
            int start = Math.Max(from - 1, 0);
            double assigned = 0.0;
            for (int to = start; to < states - 1; to++)
            {
                double p = arrivals[to - start];
                transition[from, to] = p;
                assigned += p;
            }

            transition[from, states - 1] = 1.0 - assigned;
        }

        // π(P − I) = 0 with Σπ = 1: replace one balance equation by the normalisation.
        var system = (transition - Matrix<double>.Build.DenseIdentity(states)).Transpose();
        for (int column = 0; column < states; column++)
        {
            system[states - 1, column] = 1.0;
        }

        var right = Vector<double>.Build.Dense(states);
        right[states - 1] = 1.0;
        var departures = system.Solve(right);

        double load = arrivalsPerHour * meanServiceHours;
        double scale = 1.0 / (departures[0] + load);
        double full = 1.0 - scale;
        double queue = 0.0;
        for (int n = 2; n < states; n++)
        {
            queue += (n - 1) * departures[n] * scale;
        }

        queue += (capacity - 1) * full;
        return (full, queue, queue / (arrivalsPerHour * (1.0 - full)));
    }
}
