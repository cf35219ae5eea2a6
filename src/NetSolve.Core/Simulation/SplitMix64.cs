namespace NetSolve.Simulation;

/// <summary>
/// SplitMix64 (Steele, Lea and Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014): used only to
/// turn a seed and a replication number into well-mixed starting states for <see cref="Xoshiro256StarStar"/>.
/// </summary>
internal static class SplitMix64
{
    private const ulong GoldenGamma = 0x9E3779B97F4A7C15UL;

    /// <summary>Advances <paramref name="state"/> and returns the next output.</summary>
    public static ulong Next(ref ulong state)
    {
        unchecked
        {
            state += GoldenGamma;
            ulong z = state;
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            return z ^ (z >> 31);
        }
    }

    /// <summary>Mixes a seed and a stream number into one 64-bit value (distinct streams give unrelated values).</summary>
    public static ulong Mix(ulong seed, ulong stream)
    {
        unchecked
        {
            ulong state = seed;
            ulong first = Next(ref state);
            state = first ^ (stream * GoldenGamma);
            return Next(ref state);
        }
    }
}
