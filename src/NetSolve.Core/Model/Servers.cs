namespace NetSolve.Model;

/// <summary>How many patients a unit serves at once: a whole number of at least one, or unlimited.</summary>
/// <remarks>Immutable. <c>default(Servers)</c> is not valid; use <see cref="Of"/> or <see cref="Unlimited"/>.</remarks>
public readonly record struct Servers
{
    /// <summary>Largest finite number of servers; more is better written unlimited (Erlang C costs O(c)).</summary>
    public const int MaxCount = 1_000_000;

    private Servers(int count) => Count = count;

    /// <summary>Unlimited servers (M/M/inf): nobody waits.</summary>
    public static Servers Unlimited { get; } = new(0);

    /// <summary>The number of servers; 0 when <see cref="IsUnlimited"/>.</summary>
    public int Count { get; }

    /// <summary>True for a unit where nobody waits.</summary>
    public bool IsUnlimited => Count == 0;

    /// <summary>A finite number of servers, at least one.</summary>
    public static Servers Of(int count) => count >= 1
        ? new Servers(count)
        : throw new ArgumentOutOfRangeException(nameof(count), count, "A unit has at least one server.");

    /// <inheritdoc/>
    public override string ToString() => IsUnlimited ? "unlimited" : Count.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
