namespace NetSolve.Solving;

/// <summary>
/// The exact hour-by-hour reference for one unit: the number of patients in an M_t/M/c_t unit (Poisson arrivals at
/// rate λ(t), exponential service of mean 1/μ, c(t) servers by hour, unlimited waiting room or a capacity) as a birth–death chain,
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
/// the hour, which moves waits that spill into the next hour back to the hour the queue was counted in. With a
/// capacity, arrivals at a full unit are turned away (no births out of the last state) and P(wait) counts them too.
/// </para>
/// </remarks>
public static class PeriodicBirthDeathChain
{
    // The number of extra states, beyond the most servers, the first truncation tries.
    private const int FirstQueueRoom = 40;

    // Fewest steps of the chain per hour (ten minutes): arrival rates are averaged over each step. The hourly means
    // are exact integrals of the chain within each step, so a longer step loses nothing there, and uniformization
    // costs fewer products per hour in long sums than in short ones.
    private const int MinChainStepsPerHour = 6;

    // The ratio of successive changes counts as steady when it moved by less than this share of its distance from 1
    // (the extrapolation's factor r/(1 − r) is then within about this share of its value).
    private const double SteadyRatio = 0.05;

    /// <summary>Solves one unit.</summary>
    /// <param name="arrivalsByStep">Arrival rate per hour in each step of the cycle (hours × <paramref name="stepsPerHour"/>).</param>
    /// <param name="stepsPerHour">Steps per hour.</param>
    /// <param name="roster">Servers by hour.</param>
    /// <param name="meanServiceHours">1/μ, positive.</param>
    /// <param name="options">Truncation and convergence; null for the defaults.</param>
    /// <param name="capacity">Most patients the unit holds (arrivals beyond are turned away), at least the most servers; null for no limit.</param>
    /// <returns>Hourly values, or <see cref="HourlyWaits.Unstable"/> when arrivals over the cycle reach the servers' capacity.</returns>
    /// <exception cref="TimeVaryingConvergenceException">The cycle did not settle, or the truncation passed its limit.</exception>
    public static HourlyWaits Solve(IReadOnlyList<double> arrivalsByStep, int stepsPerHour, ServerRoster roster, double meanServiceHours, ExactChainOptions? options = null, int? capacity = null)
    {
        ArgumentNullException.ThrowIfNull(arrivalsByStep);
        ArgumentNullException.ThrowIfNull(roster);
        ArgumentOutOfRangeException.ThrowIfLessThan(stepsPerHour, 1);
        options ??= ExactChainOptions.Default;
        int chainStepsPerHour = ChainSteps(stepsPerHour);
        var chain = new ChainCycle(Coarsen(arrivalsByStep, stepsPerHour / chainStepsPerHour), chainStepsPerHour, roster, 1.0 / meanServiceHours, options.MaxJumpsPerStep);
        if (capacity is not null)
        {
            ArgumentOutOfRangeException.ThrowIfLessThan(capacity.Value, Math.Max(1, roster.Max), nameof(capacity));
            var full = Settle(chain, capacity.Value + 1, null, options);
            var limited = new ChainHourStats(chain.CycleHours);
            chain.Run(full, limited);
            return limited.ToWaits(chain, hasCapacity: true);
        }

        if (chain.MeanArrivals >= chain.MeanCapacity)
        {
            return HourlyWaits.Unstable;
        }

        int states = FirstStates(chain, roster, options);
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

    // Enough states that a stationary queue at the busiest hour's load would leave less than the truncation mass
    // beyond them (its tail falls by ρ per state); doubled later if the periodic chain needs more.
    private static int FirstStates(ChainCycle chain, ServerRoster roster, ExactChainOptions options)
    {
        double busiest = 0.0;
        for (int step = 0; step < chain.CycleHours * chain.StepsPerHour; step++)
        {
            int servers = chain.ServersAt(step);
            busiest = Math.Max(busiest, servers > 0 ? chain.ArrivalsAt(step) / (servers * chain.ServicePerHour) : 1.0);
        }

        int room = busiest < 1.0 ? (int)Math.Ceiling(Math.Log(options.TruncationMass) / Math.Log(Math.Max(busiest, 0.5))) : FirstQueueRoom;
        return Math.Min(options.MaxStates, roster.Max + Math.Max(FirstQueueRoom, room));
    }

    // The fewest steps per hour, dividing the grid's, of at most ten minutes each; the grid itself otherwise.
    private static int ChainSteps(int stepsPerHour)
    {
        for (int steps = MinChainStepsPerHour; steps < stepsPerHour; steps++)
        {
            if (stepsPerHour % steps == 0)
            {
                return steps;
            }
        }

        return stepsPerHour;
    }

    private static double[] Coarsen(IReadOnlyList<double> arrivalsByStep, int stepsPerBlock)
    {
        var blocks = new double[arrivalsByStep.Count / stepsPerBlock];
        for (int k = 0; k < arrivalsByStep.Count; k++)
        {
            blocks[k / stepsPerBlock] += arrivalsByStep[k] / stepsPerBlock;
        }

        return blocks;
    }

    // Cycles from the start until the start of the cycle stops moving. The change from one cycle to the next shrinks
    // by the cycle map's second eigenvalue r; once r is steady the rest of the way is (p − before)·r/(1 − r) (Aitken's
    // extrapolation along the slowest direction), so the chain jumps there and goes on from the jumped start.
    private static double[] Settle(ChainCycle chain, int states, double[]? previous, ExactChainOptions options)
    {
        var p = previous is null ? chain.StationaryStart(states) : [.. previous, .. new double[states - previous.Length]];
        var before = new double[states];
        double lastChange = double.NaN;
        double lastRatio = double.NaN;
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
            // No change at all (a constant load started from its own stationary distribution) has no ratio to go by. A
            // cycle of the chain is a stochastic map, and such a map never moves two distributions apart in total
            // variation, so a change under the tolerance that stops shrinking (ratio 1 or more) is rounding, not a
            // pattern still forming: settled. Without this, a unit at the rounding floor ran all the cycles allowed.
            if (change <= options.Tolerance && (remaining <= options.Tolerance || change == 0.0 || ratio >= 1.0))
            {
                return p;
            }

            if (cycle == options.MaxCycles)
            {
                throw new TimeVaryingConvergenceException("the exact chain", change);
            }

            if (ratio < 1.0 && Math.Abs(ratio - lastRatio) <= SteadyRatio * (1.0 - ratio))
            {
                Extrapolate(p, before, ratio / (1.0 - ratio));
                lastChange = double.NaN;
                lastRatio = double.NaN;
                continue;
            }

            lastChange = change;
            lastRatio = ratio;
        }

        return p;
    }

    private static void Extrapolate(double[] p, double[] before, double factor)
    {
        double total = 0.0;
        for (int n = 0; n < p.Length; n++)
        {
            p[n] = Math.Max(0.0, p[n] + (factor * (p[n] - before[n])));
            total += p[n];
        }

        for (int n = 0; n < p.Length; n++)
        {
            p[n] /= total;
        }
    }
}
