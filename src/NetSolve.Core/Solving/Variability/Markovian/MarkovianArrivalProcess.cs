using MathNet.Numerics.LinearAlgebra;

namespace NetSolve.Solving;

/// <summary>
/// A Markovian arrival process (MAP): a finite Markov chain whose transitions in <see cref="Hidden"/> (D₀) pass
/// unseen and whose transitions in <see cref="Marked"/> (D₁) each bring one arrival (M. F. Neuts, Structured
/// Stochastic Matrices of M/G/1 Type and Their Applications, Dekker, 1989). Unlike one SCV per flow it carries the
/// correlation between successive gaps, such as the runs of departures after a long service.
/// </summary>
/// <remarks>Immutable; the matrices are kept sparse and never written to after construction.</remarks>
public sealed class MarkovianArrivalProcess
{
    /// <summary>Makes a MAP from its two matrices, rates per hour.</summary>
    /// <param name="hidden">D₀: rates without an arrival, the diagonal minus each state's total outflow.</param>
    /// <param name="marked">D₁: rates of transitions that bring an arrival, none negative.</param>
    /// <exception cref="ArgumentException">The matrices differ in size, are not square, or a row of D₀ + D₁ does not add up to 0.</exception>
    public MarkovianArrivalProcess(Matrix<double> hidden, Matrix<double> marked)
    {
        ArgumentNullException.ThrowIfNull(hidden);
        ArgumentNullException.ThrowIfNull(marked);
        if (hidden.RowCount != hidden.ColumnCount || marked.RowCount != hidden.RowCount || marked.ColumnCount != hidden.ColumnCount)
        {
            throw new ArgumentException("D0 and D1 are square matrices of one size.", nameof(marked));
        }

        var rowSums = (hidden + marked).RowSums();
        double scale = hidden.Diagonal().AbsoluteMaximum();
        if (rowSums.AbsoluteMaximum() > 1e-9 * Math.Max(1.0, scale))
        {
            throw new ArgumentException("Each row of D0 + D1 adds up to 0.", nameof(hidden));
        }

        Hidden = hidden;
        Marked = marked;
    }

    /// <summary>D₀, rates per hour.</summary>
    public Matrix<double> Hidden { get; }

    /// <summary>D₁, rates per hour.</summary>
    public Matrix<double> Marked { get; }

    /// <summary>Number of states.</summary>
    public int States => Hidden.RowCount;

    /// <summary>A renewal flow with phase-type gaps: D₀ = T, D₁ = t·α, t the exit rates and α the initial probabilities.</summary>
    public static MarkovianArrivalProcess Renewal(PhaseTypeDistribution gaps)
    {
        ArgumentNullException.ThrowIfNull(gaps);
        int m = gaps.Phases;
        var hidden = Matrix<double>.Build.Sparse(m, m, (i, j) => gaps.Generator[i, j]);
        var marked = Matrix<double>.Build.Sparse(m, m, (i, j) => gaps.ExitPerHour[i] * gaps.Initial[j]);
        return new MarkovianArrivalProcess(hidden, marked);
    }

    /// <summary>
    /// Each arrival kept with probability <paramref name="keep"/>, independently: D₁ → p·D₁, D₀ → D₀ + (1 − p)·D₁
    /// (a dropped arrival moves the chain without being seen).
    /// </summary>
    /// <param name="keep">The fraction kept, in [0, 1].</param>
    public MarkovianArrivalProcess Thinned(double keep)
    {
        if (!(keep >= 0.0 && keep <= 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(keep), keep, "A fraction kept is between 0 and 1.");
        }

        return new MarkovianArrivalProcess(Hidden + ((1.0 - keep) * Marked), keep * Marked);
    }

    /// <summary>The counts of this flow in stationarity (<see cref="ArrivalCounts"/>).</summary>
    /// <exception cref="ArgumentException">The chain D₀ + D₁ has no unique stationary distribution.</exception>
    public ArrivalCounts Counts() => new(this);
}
