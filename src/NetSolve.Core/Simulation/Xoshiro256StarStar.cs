using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// The xoshiro256** generator (Blackman and Vigna, "Scrambled linear pseudorandom number generators", 2018):
/// 256 bits of state, period 2^256 − 1, a few nanoseconds per draw. Mutable; one per replication, never shared.
/// </summary>
[StructLayout(LayoutKind.Sequential)]
internal struct Xoshiro256StarStar
{
    private const double UnitScale = 1.0 / (1UL << 53);

    private ulong _s0;
    private ulong _s1;
    private ulong _s2;
    private ulong _s3;

    /// <summary>A generator for replication <paramref name="stream"/> of the run seeded with <paramref name="seed"/>.</summary>
    public Xoshiro256StarStar(ulong seed, ulong stream)
    {
        // SplitMix64 never yields four zero words from one state, so the all-zero state xoshiro forbids cannot occur.
        ulong state = SplitMix64.Mix(seed, stream);
        _s0 = SplitMix64.Next(ref state);
        _s1 = SplitMix64.Next(ref state);
        _s2 = SplitMix64.Next(ref state);
        _s3 = SplitMix64.Next(ref state);
    }

    /// <summary>A generator starting from the given state words (for known-answer tests); not all zero.</summary>
    internal static Xoshiro256StarStar FromState(ulong s0, ulong s1, ulong s2, ulong s3) =>
        new() { _s0 = s0, _s1 = s1, _s2 = s2, _s3 = s3 };

    /// <summary>The next 64 random bits.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong NextUInt64()
    {
        unchecked
        {
            ulong result = RotateLeft(_s1 * 5, 7) * 9;
            ulong t = _s1 << 17;
            _s2 ^= _s0;
            _s3 ^= _s1;
            _s1 ^= _s2;
            _s0 ^= _s3;
            _s2 ^= t;
            _s3 = RotateLeft(_s3, 45);
            return result;
        }
    }

    /// <summary>A uniform double in [0, 1) with 53 random bits.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double NextDouble() => (NextUInt64() >> 11) * UnitScale;

    /// <summary>A uniform double in (0, 1]: safe to take the logarithm of.</summary>
    public double NextOpenDouble() => ((NextUInt64() >> 11) + 1) * UnitScale;

    /// <summary>A uniform integer in [0, <paramref name="bound"/>) by Lemire's multiply-shift (bias below 2^-32 for small bounds).</summary>
    public int NextInt(int bound)
    {
        unchecked
        {
            return (int)(((NextUInt64() >> 32) * (ulong)bound) >> 32);
        }
    }

    /// <summary>An exponential variate with mean 1, by the ziggurat method (<see cref="ExponentialZiggurat"/>).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double NextExponential() => ExponentialZiggurat.Next(ref this);

    /// <summary>A standard normal variate by Marsaglia's polar method (the second variate is discarded).</summary>
    public double NextNormal()
    {
        while (true)
        {
            double x = (2.0 * NextDouble()) - 1.0;
            double y = (2.0 * NextDouble()) - 1.0;
            double s = (x * x) + (y * y);
            if (s > 0.0 && s < 1.0)
            {
                return x * Math.Sqrt(-2.0 * PortableMath.Log(s) / s);
            }
        }
    }

    private static ulong RotateLeft(ulong value, int bits) => (value << bits) | (value >> (64 - bits));
}
