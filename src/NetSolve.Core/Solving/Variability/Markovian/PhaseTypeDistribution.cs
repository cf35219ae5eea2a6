using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>
/// A phase-type distribution with the two-moment fits of H. C. Tijms, A First Course in Stochastic Models (Wiley,
/// 2003), Appendix B (from memory): a mixture of two Erlangs of the same rate when the SCV is below 1, the exponential
/// at 1, a hyperexponential of two phases with balanced means above 1.
/// </summary>
/// <remarks>Immutable. Phases are absorbed from at <see cref="ExitPerHour"/>; phase changes follow <see cref="Generator"/>'s off-diagonal part.</remarks>
public sealed class PhaseTypeDistribution
{
    /// <summary>The SCV below which fits are not made finer: 1/<see cref="MaxPhases"/>, as smooth as an Erlang of 5 phases.</summary>
    public const double MinimumScv = 1.0 / MaxPhases;

    /// <summary>Most phases of a fit (an Erlang mixture for an SCV down to <see cref="MinimumScv"/>).</summary>
    public const int MaxPhases = 5;

    private PhaseTypeDistribution(ImmutableArray<double> initial, double[,] generator)
    {
        Initial = initial;
        Generator = generator;
        var exit = new double[initial.Length];
        for (int i = 0; i < exit.Length; i++)
        {
            double sum = 0.0;
            for (int j = 0; j < exit.Length; j++)
            {
                sum += generator[i, j];
            }

            exit[i] = Math.Max(0.0, -sum);
        }

        ExitPerHour = [.. exit];
    }

    /// <summary>Probability of starting in each phase; they add up to 1.</summary>
    public ImmutableArray<double> Initial { get; }

    /// <summary>Rates between phases per hour, the diagonal minus each phase's total outflow (never written to).</summary>
    public double[,] Generator { get; }

    /// <summary>Rate of leaving from each phase, per hour (−Generator·1).</summary>
    public ImmutableArray<double> ExitPerHour { get; }

    /// <summary>Number of phases.</summary>
    public int Phases => Initial.Length;

    /// <summary>The two-moment fit to a mean and an SCV (floored at <see cref="MinimumScv"/>).</summary>
    /// <param name="meanHours">The mean, positive and finite.</param>
    /// <param name="scv">The squared coefficient of variation, finite and not negative.</param>
    public static PhaseTypeDistribution FitTwoMoments(double meanHours, double scv)
    {
        if (!(double.IsFinite(meanHours) && meanHours > 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(meanHours), meanHours, "A mean is positive and finite.");
        }

        if (!(double.IsFinite(scv) && scv >= 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(scv), scv, "An SCV is finite and not negative.");
        }

        scv = Math.Max(scv, MinimumScv);
        return scv > 1.0 ? BalancedHyperexponential(meanHours, scv) : ErlangMixture(meanHours, scv);
    }

    /// <summary>p₁ = ½(1 + √((c² − 1)/(c² + 1))), rates 2p₁/m and 2p₂/m: each phase carries half the mean.</summary>
    private static PhaseTypeDistribution BalancedHyperexponential(double meanHours, double scv)
    {
        double first = 0.5 * (1.0 + Math.Sqrt((scv - 1.0) / (scv + 1.0)));
        double second = 1.0 - first;
        var generator = new double[2, 2];
        generator[0, 0] = -2.0 * first / meanHours;
        generator[1, 1] = -2.0 * second / meanHours;
        return new PhaseTypeDistribution([first, second], generator);
    }

    /// <summary>
    /// For 1/k ≤ c² ≤ 1/(k − 1): Erlang(k − 1) with probability p = (k c² − √(k(1 + c²) − k²c²))/(1 + c²), else
    /// Erlang(k), both at rate μ = (k − p)/m; as k phases in series, entered at the second with probability p.
    /// </summary>
    private static PhaseTypeDistribution ErlangMixture(double meanHours, double scv)
    {
        int k = Math.Max(1, (int)Math.Ceiling((1.0 / scv) - 1e-12));
        double shorter = k == 1 ? 0.0 : Math.Clamp(((k * scv) - Math.Sqrt((k * (1.0 + scv)) - (k * k * scv))) / (1.0 + scv), 0.0, 1.0);
        double rate = (k - shorter) / meanHours;
        var generator = new double[k, k];
        var initial = new double[k];
        initial[0] = 1.0 - shorter;
        if (k > 1)
        {
            initial[1] = shorter;
        }

        for (int i = 0; i < k; i++)
        {
            generator[i, i] = -rate;
            if (i + 1 < k)
            {
                generator[i, i + 1] = rate;
            }
        }

        return new PhaseTypeDistribution([.. initial], generator);
    }
}
