namespace NetSolve.Cli.Settings;

/// <summary>What a duration option accepts.</summary>
/// <param name="AllowZero">True when 0 is a valid answer (a warm-up of nothing, a zero wait target).</param>
/// <param name="Examples">Shown when the text is not a duration, as in "28d, 12h, 90min".</param>
/// <param name="MaxDays">Longest accepted, in days.</param>
/// <param name="TooLong">Why longer is refused, shown after the limit.</param>
internal sealed record DurationRule(bool AllowZero, string Examples, double MaxDays = double.PositiveInfinity, string TooLong = "")
{
    /// <summary>Shortest accepted, in days (0: any).</summary>
    public double MinDays { get; init; }

    /// <summary>The shortest as people write it ("a day").</summary>
    public string Shortest { get; init; } = string.Empty;

    /// <summary>Why shorter is refused.</summary>
    public string TooShort { get; init; } = string.Empty;
}
