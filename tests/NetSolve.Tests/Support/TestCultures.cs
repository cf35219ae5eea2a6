using System.Globalization;

namespace NetSolve.Tests.Support;

/// <summary>The cultures output is checked under, by name, for theory data.</summary>
internal static class TestCultures
{
    /// <summary>The invariant culture: the one every file and number is written in.</summary>
    public const string Invariant = "invariant";

    /// <summary>A culture writing 1.234,5: decimal comma and point grouping, as much of Europe does.</summary>
    public const string CommaDecimal = "comma-decimal";

    /// <summary>Both cultures, invariant first.</summary>
    public static IReadOnlyList<string> All { get; } = [Invariant, CommaDecimal];

    /// <summary>The culture of this name.</summary>
    public static CultureInfo Get(string name) => name switch
    {
        Invariant => CultureInfo.InvariantCulture,
        CommaDecimal => CommaDecimalCulture(),
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "not a test culture"),
    };

    /// <summary>Runs with this culture as the current culture and UI culture until disposed.</summary>
    public static CultureScope Use(string name) => new(Get(name));

    // A clone of the invariant culture rather than a named one such as de-DE: the product builds with
    // InvariantGlobalization, where named cultures are not available, and a clone needs no ICU data.
    // Percent and currency separators change too, so "P" and "C" formats are caught as well as "N" and "F".
    private static CultureInfo CommaDecimalCulture()
    {
        var culture = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        culture.NumberFormat.NumberDecimalSeparator = ",";
        culture.NumberFormat.NumberGroupSeparator = ".";
        culture.NumberFormat.PercentDecimalSeparator = ",";
        culture.NumberFormat.PercentGroupSeparator = ".";
        culture.NumberFormat.CurrencyDecimalSeparator = ",";
        culture.NumberFormat.CurrencyGroupSeparator = ".";
        return culture;
    }
}
