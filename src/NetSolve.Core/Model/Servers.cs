using System.Globalization;

namespace NetSolve.Model;

/// <summary>How many patients a unit serves at once: a whole number from 1 to <see cref="MaxCount"/>, or unlimited.</summary>
/// <remarks>
/// Immutable and thread-safe. Made only by <see cref="Of"/> or <see cref="Unlimited"/>. <c>default(Servers)</c> is
/// neither a count nor unlimited: <see cref="IsValid"/> is false and every other member throws
/// <see cref="InvalidOperationException"/>, so a unit built without servers fails at once instead of solving as a
/// unit where nobody waits.
/// </remarks>
public readonly record struct Servers
{
    /// <summary>Largest finite number of servers; more is better written unlimited (Erlang C costs O(c)).</summary>
    public const int MaxCount = 1_000_000;

    // 0 is what default(Servers) holds and no factory makes; -1 is unlimited; 1 to MaxCount is the count.
    private const int UnlimitedCode = -1;

    private readonly int _code;

    private Servers(int code) => _code = code;

    /// <summary>Unlimited servers (M/M/inf): nobody waits.</summary>
    public static Servers Unlimited { get; } = new(UnlimitedCode);

    /// <summary>False only for <c>default(Servers)</c>, which no factory makes.</summary>
    public bool IsValid => _code != 0;

    /// <summary>The number of servers, 1 to <see cref="MaxCount"/>; 0 when <see cref="IsUnlimited"/>.</summary>
    /// <exception cref="InvalidOperationException">This is <c>default(Servers)</c>.</exception>
    public int Count => Checked() == UnlimitedCode ? 0 : _code;

    /// <summary>True for a unit where nobody waits.</summary>
    /// <exception cref="InvalidOperationException">This is <c>default(Servers)</c>.</exception>
    public bool IsUnlimited => Checked() == UnlimitedCode;

    /// <summary>A finite number of servers, from 1 to <see cref="MaxCount"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="count"/> is below 1 or above <see cref="MaxCount"/>.</exception>
    public static Servers Of(int count) => count is >= 1 and <= MaxCount
        ? new Servers(count)
        : throw new ArgumentOutOfRangeException(nameof(count), count, "A unit has from 1 to 1,000,000 servers, or unlimited.");

    /// <summary><c>unlimited</c> or the count, in the invariant culture.</summary>
    /// <exception cref="InvalidOperationException">This is <c>default(Servers)</c>.</exception>
    public override string ToString() => IsUnlimited ? "unlimited" : Count.ToString(CultureInfo.InvariantCulture);

    private int Checked() => _code != 0
        ? _code
        : throw new InvalidOperationException(
            "default(Servers) is not a number of servers; make one with Servers.Of(count) or Servers.Unlimited.");
}
