namespace NetSolve.Solving;

/// <summary>
/// The arrival SCV that gives a queue the mean workload the robust-queueing formula gives it from its arrivals' index
/// of dispersion over every window (W. Whitt and W. You, Operations Research 66(1), 2018, pp. 184–199, from memory):
/// the supremum over windows, turned into the one number NetSolve's G/G/c formulas take.
/// </summary>
/// <remarks>
/// <para>
/// The work brought in t hours has mean λmt and variance λm²t·(I_a(t) + cs²) (a random sum of independent service
/// times). The queue's mean workload is approximated by the worst excess of the work over c servers' capacity within
/// a band of two standard deviations' worth:
/// Z = sup_{t ≥ 0} { −c(1 − ρ)t + m·√(2λt·(I_a(t) + cs²)) }.
/// With Poisson arrivals (I_a ≡ 1) and one server this is λE[S²]/(2(1 − ρ)), the exact M/G/1 mean workload; with a
/// constant index I it is λm²(I + cs²)/(2c(1 − ρ)), so the equivalent SCV ca² = 2c(1 − ρ)Z/(λm²) − cs² gives back I:
/// a renewal flow in heavy traffic keeps its SCV, and the G/G/c formulas then keep their heavy-traffic limits.
/// The maximising window is about ρm(I + cs²)/(2c(1 − ρ)²): busy units look over long windows, light ones short.
/// </para>
/// <para>
/// The supremum is found on the grid of windows the index is known on, refined by golden-section search between the
/// neighbours of the best grid point with the index interpolated linearly in log t. An index that is the same at every
/// window is returned as it is (so Poisson arrivals give exactly 1). Thread-safe: no state.
/// </para>
/// </remarks>
internal static class RobustQueueingScv
{
    /// <summary>Golden-section steps: the bracket shrinks by 0.618 each, far below the grid's spacing after 60.</summary>
    private const int RefinementSteps = 60;

    /// <summary>The equivalent arrival SCV of one unit, clamped to [0, <see cref="ArrivalVariability.MaxScv"/>].</summary>
    /// <param name="windowHours">Windows, increasing, positive.</param>
    /// <param name="dispersion">I_a at each window, not negative.</param>
    /// <param name="arrivalsPerHour">λ, positive.</param>
    /// <param name="meanServiceHours">m, positive.</param>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="utilisation">ρ per server, in (0, 1).</param>
    /// <param name="serviceScv">cs², not negative.</param>
    public static double Equivalent(IReadOnlyList<double> windowHours, IReadOnlyList<double> dispersion, double arrivalsPerHour,
        double meanServiceHours, int servers, double utilisation, double serviceScv)
    {
        if (dispersion.All(value => value == dispersion[0]))
        {
            return ArrivalVariability.Clamp(dispersion[0]);
        }

        double drift = servers * (1.0 - utilisation);
        double Excess(double hours, double index) =>
            (-drift * hours) + (meanServiceHours * Math.Sqrt(2.0 * arrivalsPerHour * hours * Math.Max(0.0, index + serviceScv)));

        int best = 0;
        for (int k = 1; k < windowHours.Count; k++)
        {
            if (Excess(windowHours[k], dispersion[k]) > Excess(windowHours[best], dispersion[best]))
            {
                best = k;
            }
        }

        double workload = Excess(windowHours[best], dispersion[best]);
        double low = Math.Log(windowHours[Math.Max(0, best - 1)]);
        double high = Math.Log(windowHours[Math.Min(windowHours.Count - 1, best + 1)]);
        double Interpolated(double logHours)
        {
            int k = Math.Max(0, best - 1);
            while (k + 2 < windowHours.Count && Math.Log(windowHours[k + 1]) < logHours)
            {
                k++;
            }

            double a = Math.Log(windowHours[k]);
            double b = Math.Log(windowHours[Math.Min(k + 1, windowHours.Count - 1)]);
            double share = b > a ? Math.Clamp((logHours - a) / (b - a), 0.0, 1.0) : 0.0;
            double index = dispersion[k] + (share * (dispersion[Math.Min(k + 1, windowHours.Count - 1)] - dispersion[k]));
            return Excess(Math.Exp(logHours), index);
        }

        double ratio = (Math.Sqrt(5.0) - 1.0) / 2.0;
        for (int step = 0; step < RefinementSteps && high - low > 1e-12; step++)
        {
            double left = high - (ratio * (high - low));
            double right = low + (ratio * (high - low));
            if (Interpolated(left) < Interpolated(right))
            {
                low = left;
            }
            else
            {
                high = right;
            }
        }

        workload = Math.Max(workload, Interpolated(0.5 * (low + high)));
        double scv = (2.0 * drift * workload / (arrivalsPerHour * meanServiceHours * meanServiceHours)) - serviceScv;
        return ArrivalVariability.Clamp(scv);
    }
}
