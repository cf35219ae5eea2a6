using MathNet.Numerics.LinearAlgebra;

namespace NetSolve.Solving;

/// <summary>
/// A unit of c servers with exponential service fed by a Poisson stream and by interrupted Poisson streams (the
/// overflow of full units): the MMPP/M/c queue solved exactly as a quasi-birth–death chain (docs/methods.md,
/// "Diverted overflow").
/// </summary>
/// <remarks>
/// <para>
/// The level is the number of patients present, the phase says which streams are on (2^k phases for k streams). From c
/// on the levels repeat, so π_(c+j) = π_c Rʲ, R the minimal solution of A₀ + R A₁ + R² A₂ = 0 (M. F. Neuts,
/// <i>Matrix-Geometric Solutions in Stochastic Models</i>, Johns Hopkins University Press, 1981, chapter 3; found by
/// the iteration R ← A₀(−A₁ − R A₂)⁻¹ from R = 0, which increases monotonically to it). The levels below c are
/// eliminated one by one (π_n = π_(n+1) S_(n+1)), leaving one small system for π_c.
/// </para>
/// <para>Vectors are rescaled while they are carried down, so thousands of servers neither overflow nor underflow. Thread-safe.</para>
/// </remarks>
public static class OverflowQueue
{
    /// <summary>Streams beyond this many are too small to model as bursts (2^k phases); <see cref="DivertedArrivals"/> keeps the largest.</summary>
    public const int MaximumStreams = 3;

    private const int MaximumIterations = 200_000;
    private const double Tolerance = 1e-14;
    private const double Rescale = 1e150;

    /// <summary>Solves the queue; null when it is unstable (mean arrivals at least cθ) or R does not converge.</summary>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="serviceRatePerHour">θ, each server's service rate, positive.</param>
    /// <param name="poissonPerHour">The Poisson part of the arrivals, not negative.</param>
    /// <param name="streams">Up to <see cref="MaximumStreams"/> interrupted Poisson streams.</param>
    public static OverflowQueueResult? Solve(int servers, double serviceRatePerHour, double poissonPerHour, IReadOnlyList<InterruptedPoisson> streams)
    {
        ArgumentNullException.ThrowIfNull(streams);
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        if (streams.Count > MaximumStreams)
        {
            throw new ArgumentException("At most three interrupted Poisson streams.", nameof(streams));
        }

        if (!double.IsFinite(serviceRatePerHour) || !(serviceRatePerHour > 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(serviceRatePerHour), serviceRatePerHour, "A service rate is positive and finite.");
        }

        if (!double.IsFinite(poissonPerHour) || poissonPerHour < 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(poissonPerHour), poissonPerHour, "An arrival rate is finite and not negative.");
        }

        double meanArrivals = poissonPerHour + streams.Sum(stream => stream.MeanPerHour);
        if (!(meanArrivals > 0.0) || meanArrivals >= servers * serviceRatePerHour)
        {
            return null;
        }

        var (phases, arrivals) = Phases(poissonPerHour, streams);
        int m = arrivals.RowCount;
        var identity = Matrix<double>.Build.DenseIdentity(m);
        Matrix<double> Local(int present) => phases - arrivals - (Math.Min(present, servers) * serviceRatePerHour * identity);
        Matrix<double> Down(int present) => Math.Min(present, servers) * serviceRatePerHour * identity;

        var r = RateMatrix(arrivals, Local(servers), Down(servers));
        if (r is null)
        {
            return null;
        }

        // Eliminate levels 0 .. c−1: H_0 = L_0, S_(n+1) = −D_(n+1) H_n⁻¹, H_(n+1) = L_(n+1) + S_(n+1) Λ.
        var steps = new Matrix<double>[servers + 1];
        var h = Local(0);
        for (int n = 0; n < servers; n++)
        {
            steps[n + 1] = -Down(n + 1) * h.Inverse();
            h = (n + 1 == servers ? Local(servers) + (r * Down(servers)) : Local(n + 1)) + (steps[n + 1] * arrivals);
        }

        // π_c H_c = 0 with the last column replaced by the normalisation π_c·1 = 1.
        var system = h.Clone();
        system.SetColumn(m - 1, Vector<double>.Build.Dense(m, 1.0));
        var top = system.Transpose().Solve(Vector<double>.Build.Dense(m, k => k == m - 1 ? 1.0 : 0.0));

        var ones = Vector<double>.Build.Dense(m, 1.0);
        var beyond = (identity - r).Inverse();
        double total = top * beyond * ones;
        double arriving = top * beyond * arrivals * ones;
        double queue = top * r * beyond * beyond * ones;
        double waitingArrivals = arriving;
        var level = top;
        for (int n = servers - 1; n >= 0; n--)
        {
            level = level * steps[n + 1];
            double scale = level.AbsoluteMaximum();
            if (scale > Rescale)
            {
                level /= scale;
                total /= scale;
                arriving /= scale;
                queue /= scale;
                waitingArrivals /= scale;
            }

            total += level * ones;
            arriving += level * arrivals * ones;
        }

        if (!(total > 0.0) || !(arriving > 0.0))
        {
            return null;
        }

        double meanQueue = queue / total;
        return new OverflowQueueResult(meanQueue / meanArrivals, Math.Clamp(waitingArrivals / arriving, 0.0, 1.0));
    }

    /// <summary>The phase generator (which streams switch) and the arrival rates per phase, as matrices.</summary>
    private static (Matrix<double> Phases, Matrix<double> Arrivals) Phases(double poissonPerHour, IReadOnlyList<InterruptedPoisson> streams)
    {
        int m = 1 << streams.Count;
        var phases = Matrix<double>.Build.Dense(m, m);
        var arrivals = Matrix<double>.Build.Dense(m, m);
        for (int phase = 0; phase < m; phase++)
        {
            double rate = poissonPerHour;
            for (int s = 0; s < streams.Count; s++)
            {
                bool on = (phase & (1 << s)) != 0;
                int other = phase ^ (1 << s);
                double switching = on ? streams[s].OnToOffPerHour : streams[s].OffToOnPerHour;
                phases[phase, other] += switching;
                phases[phase, phase] -= switching;
                rate += on ? streams[s].OnPerHour : 0.0;
            }

            arrivals[phase, phase] = rate;
        }

        return (phases, arrivals);
    }

    /// <summary>R by the monotone iteration R ← A₀(−A₁ − R A₂)⁻¹; null if it has not settled.</summary>
    private static Matrix<double>? RateMatrix(Matrix<double> up, Matrix<double> local, Matrix<double> down)
    {
        var r = Matrix<double>.Build.Dense(up.RowCount, up.ColumnCount);
        for (int k = 0; k < MaximumIterations; k++)
        {
            var next = up * (-local - (r * down)).Inverse();
            double change = (next - r).Enumerate().Max(Math.Abs);
            r = next;
            if (change < Tolerance)
            {
                return r.Enumerate().All(double.IsFinite) ? r : null;
            }
        }

        return null;
    }
}
