namespace NetSolve.Solving;

/// <summary>
/// The periodic solution of one linear stage x'(t) = u(t) − r·x(t) over a cycle split into equal steps, with the
/// input u linear within each step: the building block of the time-varying offered load.
/// </summary>
/// <remarks>
/// Each step is integrated exactly for that input (an exponential integrator, stable for any step length):
/// x(n+1) = e^(−z)·x(n) + h·φ₁(z)·u_start + h·g(z)·(u_end − u_start), z = r·h, φ₁(z) = (1 − e^(−z))/z and
/// g(z) = (z − 1 + e^(−z))/z², both summed by their series for small z. The solution is linear in x(0), so one pass from
/// x(0) = 0 gives x(T) = R and the periodic start is x(0) = R / (1 − e^(−rT)) exactly; a second pass fills the cycle.
/// Thread-safe (pure functions on caller-owned arrays).
/// </remarks>
internal static class PeriodicStage
{
    // Below this z the closed form of g loses digits to cancellation; its series needs a dozen terms there.
    private const double SeriesLimit = 0.5;
    private const int SeriesTerms = 14;

    /// <summary>Fills <paramref name="nodes"/> (length steps + 1, last equal to first) with the periodic solution.</summary>
    /// <param name="inputStart">u at the start of each step, per hour.</param>
    /// <param name="inputEnd">u at the end of each step, per hour.</param>
    /// <param name="ratePerHour">r, positive.</param>
    /// <param name="stepHours">h, positive.</param>
    /// <param name="nodes">Receives x at every step boundary.</param>
    public static void Solve(ReadOnlySpan<double> inputStart, ReadOnlySpan<double> inputEnd, double ratePerHour, double stepHours, Span<double> nodes)
    {
        int steps = inputStart.Length;
        double z = ratePerHour * stepHours;
        double decay = Math.Exp(-z);
        double constantGain = stepHours * RelaxedShare(z);
        double slopeGain = stepHours * SlopeFactor(z, decay);

        nodes[0] = 0.0;
        Run(inputStart, inputEnd, decay, constantGain, slopeGain, nodes);
        double cycleZ = ratePerHour * stepHours * steps;
        double cycleDecay = cycleZ * RelaxedShare(cycleZ);
        nodes[0] = nodes[steps] / cycleDecay;
        Run(inputStart, inputEnd, decay, constantGain, slopeGain, nodes);
        nodes[steps] = nodes[0];
    }

    private static void Run(ReadOnlySpan<double> inputStart, ReadOnlySpan<double> inputEnd, double decay, double constantGain, double slopeGain, Span<double> nodes)
    {
        double x = nodes[0];
        for (int n = 0; n < inputStart.Length; n++)
        {
            x = (decay * x) + (constantGain * inputStart[n]) + (slopeGain * (inputEnd[n] - inputStart[n]));
            nodes[n + 1] = x;
        }
    }

    /// <summary>φ₁(z) = (1 − e^(−z))/z, by its series Σ_k (−z)^k/(k + 1)! for small z, where 1 − e^(−z) would lose digits.</summary>
    private static double RelaxedShare(double z)
    {
        if (z >= SeriesLimit)
        {
            return (1.0 - Math.Exp(-z)) / z;
        }

        double sum = 0.0;
        double term = 1.0;
        for (int k = 0; k < SeriesTerms; k++)
        {
            sum += term;
            term *= -z / (k + 2.0);
        }

        return sum;
    }

    private static double SlopeFactor(double z, double decay)
    {
        if (z >= SeriesLimit)
        {
            return (z - 1.0 + decay) / (z * z);
        }

        // g(z) = Σ_k (−z)^k / (k! (k + 1)(k + 2)).
        double sum = 0.0;
        double power = 1.0;
        for (int k = 0; k < SeriesTerms; k++)
        {
            sum += power / ((k + 1.0) * (k + 2.0));
            power *= -z / (k + 1.0);
        }

        return sum;
    }
}
