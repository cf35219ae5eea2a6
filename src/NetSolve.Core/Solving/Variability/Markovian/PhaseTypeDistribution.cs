using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>
/// A phase-type distribution in matrix form (initial probabilities α, generator T), made by the two-moment fits of
/// <see cref="ServiceStages"/> (H. C. Tijms, A First Course in Stochastic Models, Wiley, 2003, section 5.9): a mixture
/// of two Erlangs of the same rate when the SCV is below 1, the exponential at 1, two balanced exponential phases above.
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

    /// <summary>The two-moment fit to a mean and an SCV (floored at <see cref="MinimumScv"/>): the stages of <see cref="ServiceStages.Fit"/>.</summary>
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

        // Stage i is left at its rate, to stage i + 1 with its continue probability, else out of the distribution.
        var stages = ServiceStages.Fit(meanHours, Math.Sqrt(Math.Max(scv, MinimumScv)));
        var generator = new double[stages.Count, stages.Count];
        for (int i = 0; i < stages.Count; i++)
        {
            generator[i, i] = -stages.RatesPerHour[i];
            if (i + 1 < stages.Count)
            {
                generator[i, i + 1] = stages.RatesPerHour[i] * stages.ContinueProbabilities[i];
            }
        }

        return new PhaseTypeDistribution([.. stages.EntryProbabilities], generator);
    }
}
