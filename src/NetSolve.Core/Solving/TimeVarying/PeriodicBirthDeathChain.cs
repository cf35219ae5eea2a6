namespace NetSolve.Solving;

/// <summary>
/// The exact hour-by-hour reference for one unit: the number of patients in an M_t/M/c_t unit (Poisson arrivals at
/// rate λ(t), exponential service of mean 1/μ, c(t) servers by hour, unlimited waiting room) as a birth–death chain,
/// solved numerically over the cycle to its periodic steady state.
/// </summary>
/// <remarks>
/// <para>
/// The chance p_n(t) of n patients obeys p_n' = λ p_(n−1) − (λ + min(n, c)μ) p_n + min(n + 1, c)μ p_(n+1). Rates are
/// constant within each step of the grid, so each step is solved by uniformization (Grassmann, "Transient solutions
/// in Markovian queueing systems", Computers &amp; Operations Research 4, 1977, 47–53; Gross and Miller, "The
/// randomization technique as a modeling tool and solution procedure for transient Markov processes", Operations
/// Research 32(2), 1984, 343–361): p(t + h) = Σ_k e^(−Λh)(Λh)^k/k! · p·P^k with P = I + Q/Λ, Λ = λ + cμ, in
/// sub-steps with Λh ≤ 1 and terms until the Poisson tail is below 1e-16. It keeps every probability non-negative
/// and the total exactly 1.
/// </para>
/// <para>
/// The chain starts from the stationary M/M/c distribution and runs cycle after cycle until the start of the cycle
/// stops moving (the remaining distance estimated from the ratio of successive changes); the waiting room is cut
/// where the last state's chance stays below <see cref="ExactChainOptions.TruncationMass"/> all cycle, else doubled.
/// Hourly values average over the hour; P(wait) weights each moment by the arrival rate (Poisson arrivals see the
/// state at their time); the mean wait is the hour's mean queue divided by its mean arrival rate, Little's law over
/// the hour, which moves waits that spill into the next hour back to the hour the queue was counted in.
/// </para>
/// </remarks>
public static class PeriodicBirthDeathChain
{
    // The number of extra states, beyond the most servers, the first truncation tries.
    private const int FirstQueueRoom = 40;

    /// <summary>Solves one unit.</summary>
    /// <param name="arrivalsByStep">Arrival rate per hour in each step of the cycle (hours × <paramref name="stepsPerHour"/>).</param>
    /// <param name="stepsPerHour">Steps per hour.</param>
    /// <param name="roster">Servers by hour.</param>
    /// <param name="meanServiceHours">1/μ, positive.</param>
    /// <param name="options">Truncation and convergence; null for the defaults.</param>
    /// <returns>Hourly values, or <see cref="HourlyWaits.Unstable"/> when arrivals over the cycle reach the servers' capacity.</returns>
    /// <exception cref="TimeVaryingConvergenceException">The cycle did not settle, or the truncation passed its limit.</exception>
    public static HourlyWaits Solve(IReadOnlyList<double> arrivalsByStep, int stepsPerHour, ServerRoster roster, double meanServiceHours, ExactChainOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(arrivalsByStep);
        ArgumentNullException.ThrowIfNull(roster);
        ArgumentOutOfRangeException.ThrowIfLessThan(stepsPerHour, 1);
        options ??= ExactChainOptions.Default;
        var chain = new ChainCycle([.. arrivalsByStep], stepsPerHour, roster, 1.0 / meanServiceHours);
        if (chain.MeanArrivals >= chain.MeanCapacity)
        {
            return HourlyWaits.Unstable;
        }

        int states = roster.Max + FirstQueueRoom;
        double[]? start = null;
        while (true)
        {
            var p = Settle(chain, states, start, options);
            var stats = new ChainHourStats(chain.CycleHours);
            double lastState = chain.Run(p, stats);
            if (lastState <= options.TruncationMass)
            {
                return stats.ToWaits(chain);
            }

            if (states >= options.MaxStates)
            {
                throw new TimeVaryingConvergenceException("the exact chain's truncation", lastState);
            }

            start = p;
            states = Math.Min(options.MaxStates, 2 * states);
        }
    }

    private static double[] Settle(ChainCycle chain, int states, double[]? previous, ExactChainOptions options)
    {
        var p = previous is null ? chain.StationaryStart(states) : [.. previous, .. new double[states - previous.Length]];
        var before = new double[states];
        double lastChange = double.PositiveInfinity;
        for (int cycle = 1; cycle <= options.MaxCycles; cycle++)
        {
            Array.Copy(p, before, states);
            chain.Run(p, null);
            double change = 0.0;
            for (int n = 0; n < states; n++)
            {
                change += Math.Abs(p[n] - before[n]);
            }

            double ratio = change / lastChange;
            double remaining = ratio < 1.0 ? change * ratio / (1.0 - ratio) : double.PositiveInfinity;
            if (change <= options.Tolerance && remaining <= options.Tolerance)
            {
                return p;
            }

            lastChange = change;
            if (cycle == options.MaxCycles)
            {
                throw new TimeVaryingConvergenceException("the exact chain", change);
            }
        }

        return p;
    }
}
