using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using MathNet.Numerics.Distributions;

namespace NetSolve.Simulation;

/// <summary>A mean over replications with the half-width of its 95% confidence interval (Student t).</summary>
/// <param name="Mean">The mean of the replications' values.</param>
/// <param name="HalfWidth">t(0.975, n − 1) · s / √n; null with fewer than two replications.</param>
/// <param name="Replications">How many replications had a value.</param>
[StructLayout(LayoutKind.Auto)]
public readonly record struct Estimate(double Mean, double? HalfWidth, int Replications)
{
    /// <summary>The confidence level of <see cref="HalfWidth"/>.</summary>
    public const double ConfidenceLevel = 0.95;

    /// <summary>
    /// Absolute and relative slack added to the half-width in <see cref="Contains"/>, so that a formula of 1e-21 matches
    /// a simulation that saw exactly 0 in every replication (half-width 0).
    /// </summary>
    public const double ContainsTolerance = 1e-9;

    /// <summary>True when <paramref name="value"/> lies inside the interval (false when there is no interval).</summary>
    public bool Contains(double value) =>
        HalfWidth is double half && Math.Abs(value - Mean) <= half + (ContainsTolerance * Math.Max(1.0, Math.Abs(Mean)));

    /// <summary>The estimate from the finite values among <paramref name="values"/>; null when there are none.</summary>
    public static Estimate? From(IEnumerable<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var moments = default(Welford);
        foreach (double value in values)
        {
            moments.Add(value);
        }

        return moments.Estimate();
    }

    /// <summary>
    /// As <see cref="From(IEnumerable{double})"/> over the value at <paramref name="slot"/> of each row: the same sums in
    /// the same order, without an enumerator per metric (a 100,000-unit result reads about 3.4 million of them).
    /// </summary>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static Estimate? FromSlot(IReadOnlyList<double[]> rows, int slot)
    {
        var moments = default(Welford);
        if (rows is double[][] array)
        {
            foreach (double[] row in array)
            {
                moments.Add(row[slot]);
            }
        }
        else
        {
            for (int r = 0; r < rows.Count; r++)
            {
                moments.Add(rows[r][slot]);
            }
        }

        return moments.Estimate();
    }

    /// <summary>
    /// The sectioning estimate: the point estimate <paramref name="pooled"/> from all replications' observations
    /// together, with the half-width t(0.975, n − 1)·√(Σ(θ_r − θ)² / (n(n − 1))) from the spread of the n
    /// replications' own estimates θ_r around it (Asmussen and Glynn, Stochastic Simulation, Springer, 2007, chapter
    /// III, section 5a). For a percentile or a ratio the pooled estimate has the bias of one long run, not of n short
    /// ones, and the interval stays centred on it. Null when <paramref name="pooled"/> is not finite; no half-width
    /// with fewer than two finite per-replication values.
    /// </summary>
    public static Estimate? Sectioned(double pooled, IEnumerable<double> perReplication)
    {
        ArgumentNullException.ThrowIfNull(perReplication);
        if (!double.IsFinite(pooled))
        {
            return null;
        }

        int n = 0;
        double sumSquares = 0.0;
        foreach (double value in perReplication)
        {
            if (double.IsFinite(value))
            {
                n++;
                sumSquares += (value - pooled) * (value - pooled);
            }
        }

        if (n < 2)
        {
            return new Estimate(pooled, null, n);
        }

        double t = StudentT.InvCDF(0.0, 1.0, n - 1, 0.5 + (ConfidenceLevel / 2.0));
        return new Estimate(pooled, t * Math.Sqrt(sumSquares / (n - 1) / n), n);
    }

    /// <summary>Welford's running mean and sum of squares of the finite values added: stable for values far from zero.</summary>
    [StructLayout(LayoutKind.Auto)]
    private struct Welford
    {
        private int _n;
        private double _mean;
        private double _sumSquares;

        public void Add(double value)
        {
            if (!double.IsFinite(value))
            {
                return;
            }

            _n++;
            double delta = value - _mean;
            _mean += delta / _n;
            _sumSquares += delta * (value - _mean);
        }

        public readonly Estimate? Estimate()
        {
            if (_n == 0)
            {
                return null;
            }

            if (_n == 1)
            {
                return new Estimate(_mean, null, 1);
            }

            double t = StudentT.InvCDF(0.0, 1.0, _n - 1, 0.5 + (ConfidenceLevel / 2.0));
            double half = t * Math.Sqrt(_sumSquares / (_n - 1) / _n);
            return new Estimate(_mean, half, _n);
        }
    }
}
