using MathNet.Numerics.LinearAlgebra;

namespace NetSolve.Analysis;

/// <summary>
/// A continuous phase-type distribution: the time until a Markov chain with sub-generator <see cref="Generator"/>,
/// started in its transient phases with probabilities <see cref="Start"/>, is absorbed. Times in hours. Immutable.
/// </summary>
/// <remarks>
/// Neuts, Matrix-Geometric Solutions in Stochastic Models, Johns Hopkins University Press, 1981, chapter 2: with
/// start α and sub-generator T, P(time &gt; t) = α·exp(T t)·1 and the mean is α·(−T)⁻¹·1. The matrix exponential is
/// taken by scaling and squaring of its Taylor series (Moler and Van Loan, "Nineteen dubious ways to compute the
/// exponential of a matrix, twenty-five years later", SIAM Review 45(1), 2003, 3-49, method 3).
/// </remarks>
internal sealed class PhaseType
{
    private const int TaylorTerms = 14;
    private const int GridStepsPerMean = 256;
    private const int MostGridSteps = 400_000;

    /// <param name="start">α: where the chain starts; adds up to 1 (no atom at zero).</param>
    /// <param name="generator">T: rates between transient phases off the diagonal, minus the total rate out on it.</param>
    public PhaseType(Vector<double> start, Matrix<double> generator)
    {
        Start = start;
        Generator = generator;
    }

    /// <summary>α, the start probabilities.</summary>
    public Vector<double> Start { get; }

    /// <summary>T, the sub-generator.</summary>
    public Matrix<double> Generator { get; }

    /// <summary>The mean time to absorption, α·(−T)⁻¹·1.</summary>
    public double Mean()
    {
        var ones = Vector<double>.Build.Dense(Start.Count, 1.0);
        return Start.DotProduct(Generator.Negate().Solve(ones));
    }

    /// <summary>P(time &gt; <paramref name="hours"/>) = α·exp(T t)·1, clamped to [0, 1].</summary>
    public double Survival(double hours)
    {
        var row = Start * Exponential(Generator, hours);
        return Math.Clamp(row.Sum(), 0.0, 1.0);
    }

    /// <summary>
    /// The times below which the given fractions of the distribution fall, read by stepping α·exp(T t) over a grid of
    /// 1/256 of the mean and interpolating the logarithm of the survival linearly within the step that crosses.
    /// </summary>
    public double[] Quantiles(IReadOnlyList<double> fractions)
    {
        double mean = Mean();
        double step = mean / GridStepsPerMean;
        var stepMatrix = Exponential(Generator, step);
        var quantiles = new double[fractions.Count];
        var row = Start;
        double before = 1.0;
        int open = fractions.Count;
        for (int k = 1; k <= MostGridSteps && open > 0; k++)
        {
            row *= stepMatrix;
            double after = Math.Clamp(row.Sum(), 0.0, 1.0);
            for (int q = 0; q < fractions.Count; q++)
            {
                double target = 1.0 - fractions[q];
                if (quantiles[q] == 0.0 && after <= target)
                {
                    quantiles[q] = ((k - 1) * step) + (step * Crossing(before, after, target));
                    open--;
                }
            }

            before = after;
        }

        return quantiles;
    }

    /// <summary>Where, as a fraction of the step, the survival falls from <paramref name="before"/> to <paramref name="target"/>.</summary>
    private static double Crossing(double before, double after, double target)
    {
        if (after <= 0.0 || before <= after)
        {
            return 1.0;
        }

        return Math.Clamp(Math.Log(before / target) / Math.Log(before / after), 0.0, 1.0);
    }

    /// <summary>exp(A·t) by scaling A·t below norm 1/2, a Taylor series, and squaring back.</summary>
    private static Matrix<double> Exponential(Matrix<double> generator, double hours)
    {
        var scaled = generator * hours;
        double norm = scaled.InfinityNorm();
        int squarings = norm > 0.5 ? (int)Math.Ceiling(Math.Log2(norm / 0.5)) : 0;
        scaled /= Math.Pow(2.0, squarings);
        var result = Matrix<double>.Build.DenseIdentity(generator.RowCount);
        var term = Matrix<double>.Build.DenseIdentity(generator.RowCount);
        for (int k = 1; k <= TaylorTerms; k++)
        {
            term = term * scaled / k;
            result += term;
        }

        for (int s = 0; s < squarings; s++)
        {
            result *= result;
        }

        return result;
    }
}
