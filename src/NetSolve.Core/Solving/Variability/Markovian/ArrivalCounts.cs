using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace NetSolve.Solving;

/// <summary>
/// The number N(t) of arrivals of a stationary <see cref="MarkovianArrivalProcess"/> in a window of t hours: its rate
/// and its index of dispersion for counts I(t) = Var N(t) / E N(t).
/// </summary>
/// <remarks>
/// <para>
/// With D = D₀ + D₁, π its stationary distribution, λ = π D₁ 1 and Z = (1π − D)⁻¹ (K. S. Narayana and M. F. Neuts,
/// Stochastic Models 8(4), 1992, from memory; checked in the tests against Poisson, renewal and two-state
/// Markov-modulated flows, whose counts have closed forms):
/// Var N(t) = (λ − 2λ² + 2π D₁ Z D₁ 1)·t − 2π D₁ (I − e^{Dt}) Z² D₁ 1.
/// </para>
/// <para>
/// e^{Dt} is applied to one vector by uniformization (a Poisson-weighted sum of powers of I + D/q), stopped once the
/// powers have settled to the stationary value. Dense LU for π and Z: meant for chains of a few thousand states.
/// Immutable once built; thread-safe.
/// </para>
/// </remarks>
public sealed class ArrivalCounts
{
    /// <summary>Relative change under which the powers of the uniformized chain are taken as settled.</summary>
    private const double SettledTolerance = 1e-13;

    private readonly Matrix<double> _generator;
    private readonly Vector<double> _stationary;
    private readonly Vector<double> _secondTerm;
    private readonly double _linearCoefficient;
    private readonly double _uniformRate;

    internal ArrivalCounts(MarkovianArrivalProcess process)
    {
        _generator = process.Hidden + process.Marked;
        int n = process.States;
        _stationary = Stationary(_generator);
        var marks = process.Marked.RowSums();
        RatePerHour = _stationary.DotProduct(marks);

        LU<double> fundamental = (Matrix<double>.Build.Dense(n, n, (i, j) => _stationary[j]) - _generator).LU();
        var once = fundamental.Solve(marks);
        _linearCoefficient = RatePerHour - (2.0 * RatePerHour * RatePerHour) + (2.0 * _stationary.DotProduct(process.Marked * once));
        _secondTerm = fundamental.Solve(once);
        MarkedStationary = process.Marked.TransposeThisAndMultiply(_stationary);
        // A little above the largest outflow, so that I + D/q keeps every state a self-loop and its powers settle.
        _uniformRate = Math.Max(1e-300, 1.02 * _generator.Diagonal().AbsoluteMaximum());
    }

    /// <summary>Mean arrivals per hour, λ.</summary>
    public double RatePerHour { get; }

    /// <summary>The long-run index of dispersion, lim I(t) = 1 − 2λ + 2π D₁ Z D₁ 1 / λ.</summary>
    public double AsymptoticDispersion => RatePerHour > 0.0 ? _linearCoefficient / RatePerHour : 1.0;

    /// <summary>π D₁, the row vector the second term starts from.</summary>
    private Vector<double> MarkedStationary { get; }

    /// <summary>I(t) = Var N(t) / (λt); 1 at t = 0 (every simple flow looks Poisson over a short enough window), the asymptotic value as t → ∞.</summary>
    /// <param name="hours">The window t, not negative; +∞ gives <see cref="AsymptoticDispersion"/>.</param>
    public double IndexOfDispersion(double hours)
    {
        if (!(hours >= 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(hours), hours, "A window is not negative.");
        }

        if (RatePerHour <= 0.0 || hours == 0.0)
        {
            return 1.0;
        }

        if (double.IsPositiveInfinity(hours))
        {
            return AsymptoticDispersion;
        }

        var decayed = Exponential(hours, _secondTerm);
        double transient = MarkedStationary.DotProduct(_secondTerm - decayed);
        return ((_linearCoefficient * hours) - (2.0 * transient)) / (RatePerHour * hours);
    }

    /// <summary>π with π D = 0 and π 1 = 1, by dense LU with the last equation replaced by the normalisation.</summary>
    private static Vector<double> Stationary(Matrix<double> generator)
    {
        int n = generator.RowCount;
        var system = Matrix<double>.Build.DenseOfMatrix(generator.Transpose());
        system.SetRow(n - 1, Vector<double>.Build.Dense(n, 1.0));
        var right = Vector<double>.Build.Dense(n);
        right[n - 1] = 1.0;
        var stationary = system.LU().Solve(right);
        if (!stationary.Enumerate().All(double.IsFinite) || stationary.Minimum() < -1e-9)
        {
            throw new ArgumentException("The chain D0 + D1 has no unique stationary distribution.", nameof(generator));
        }

        return stationary.PointwiseMaximum(0.0) / stationary.PointwiseMaximum(0.0).Sum();
    }

    /// <summary>e^{Dt} v by uniformization: Σ_k Poisson(k; qt) Pᵏ v with P = I + D/q.</summary>
    private Vector<double> Exponential(double hours, Vector<double> vector)
    {
        double mean = _uniformRate * hours;
        int last = (int)Math.Ceiling(mean + (12.0 * Math.Sqrt(mean)) + 30.0);
        var power = vector.Clone();
        var next = Vector<double>.Build.Dense(vector.Count);
        var sum = Vector<double>.Build.Dense(vector.Count);
        double weightSeen = 0.0;
        double logMean = Math.Log(mean);
        for (int k = 0; k <= last; k++)
        {
            double weight = Math.Exp(-mean + (k * logMean) - SpecialFunctions.GammaLn(k + 1.0));
            sum.Add(weight * power, sum);
            weightSeen += weight;

            // P v = v + D v / q.
            _generator.Multiply(power, next);
            next.Multiply(1.0 / _uniformRate, next);
            next.Add(power, next);
            double change = (next - power).AbsoluteMaximum();
            (power, next) = (next, power);
            if (change <= SettledTolerance * Math.Max(1.0, power.AbsoluteMaximum()))
            {
                // Settled: every later power is this one; the weights not yet added go with it.
                sum.Add(Math.Max(0.0, 1.0 - weightSeen) * power, sum);
                return sum;
            }
        }

        return sum;
    }
}
