using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>
/// How long a roster's queue takes to settle into its daily (or weekly) pattern, as an order of magnitude: the
/// relaxation time 1 / (c·μ·(1 − √ρ)²) at the cycle's mean load ρ·c and mean servers c (Abate and Whitt, Queueing
/// Systems 2, 1987, pp. 41-65; as in <see cref="RelaxationTime"/>). The hour-by-hour search judges no roster that
/// would take longer than <see cref="MostHours"/>: its pattern is never reached in practice, and the exact chain
/// needs minutes to find it (a cap of 100% and no waiting target gave a roster busy 99.6% of the week, 58 s of work).
/// Units with a capacity are left out by the callers: held within their places, they settle however busy they are.
/// </summary>
internal static class CycleSettling
{
    /// <summary>Hours in a year of 365 days.</summary>
    public const double HoursPerYear = 365.0 * 24.0;

    /// <summary>The longest settling time of a roster the search judges: one year.</summary>
    public const double MostHours = HoursPerYear;

    /// <summary>The settling time in hours; +∞ when the roster's mean servers do not exceed the mean load.</summary>
    public static double Hours(ImmutableArray<double> loads, int[] servers, double meanServiceHours)
    {
        double meanServers = servers.Average();
        double rho = loads.Average() / meanServers;
        if (!(rho > 0.0))
        {
            return 0.0;
        }

        return RelaxationTime.OfQueue(meanServers, meanServiceHours, rho);
    }
}
