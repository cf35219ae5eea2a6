using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>
/// How numbers look for programs (JSON, CSV): the network's own time unit, full round-trip precision, invariant
/// culture. Unchanged by the people's style so that scripts reading them never break.
/// </summary>
public static class MachineFormat
{
    /// <summary>
    /// The number of <paramref name="cell"/> in <paramref name="timeUnit"/>; null when absent, text, or not finite.
    /// </summary>
    /// <remarks>
    /// The last guard before every machine writer: an infinity or NaN is a value that is truly undefined, which the
    /// contract writes as JSON null and an empty CSV cell, never as <c>Infinity</c> (not JSON at all).
    /// </remarks>
    public static double? Value(Cell cell, TimeUnit timeUnit) =>
        cell.Number is double value ? Finite(Convert(value, cell.Dimension, timeUnit)) : null;

    /// <summary><paramref name="value"/> when it is finite; null for NaN and the infinities.</summary>
    public static double? Finite(double? value) => value is double number && double.IsFinite(number) ? number : null;

    /// <summary>Converts a value in Core's units (hours, per hour) to <paramref name="timeUnit"/>.</summary>
    public static double Convert(double value, MetricDimension dimension, TimeUnit timeUnit) => dimension switch
    {
        MetricDimension.Time => TimeConstants.FromHours(value, timeUnit),
        MetricDimension.Rate => TimeConstants.RateFromPerHour(value, timeUnit),
        _ => value,
    };

    /// <summary>A number for CSV: round-trip precision; empty for null, NaN and the infinities.</summary>
    public static string Csv(double? value) => Finite(value)?.ToString("R", CultureInfo.InvariantCulture) ?? string.Empty;

    /// <summary>One CSV cell: text quoted when needed, servers <c>unlimited</c> when absent, other absent values empty.</summary>
    public static string CsvCell(Cell cell, TimeUnit timeUnit)
    {
        if (cell.Text is string text)
        {
            return CsvText(text);
        }

        if (cell.Number is null && cell.Dimension == MetricDimension.Servers)
        {
            return PeopleFormat.Unlimited;
        }

        return Csv(Value(cell, timeUnit));
    }

    /// <summary>
    /// One text cell for CSV: quoted when it holds a comma, semicolon, quote or line break (RFC 4180), and made inert
    /// when a spreadsheet would read it as a formula.
    /// </summary>
    /// <remarks>
    /// Planners open our CSV in spreadsheets, and a label or scenario name such as <c>=HYPERLINK(...)</c> would run
    /// there as a formula. As the OWASP Foundation's "CSV Injection" guidance describes, a text cell that starts with
    /// <c>=</c>, <c>+</c>, <c>-</c>, <c>@</c>, a tab or a carriage return gets a single quote before it and is quoted;
    /// a semicolon (the separator some spreadsheets expect) is quoted too so it cannot start a new cell. Numbers never
    /// pass through here: a negative number we write is written as a number (<see cref="Csv"/>).
    /// </remarks>
    public static string CsvText(string value)
    {
        ArgumentNullException.ThrowIfNull(value);
        bool formula = value.Length > 0 && FormulaStarts.Contains(value[0], StringComparison.Ordinal);
        string text = formula ? "'" + value : value;
        return formula || text.AsSpan().IndexOfAny(",;\"\n\r") >= 0 ? "\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : text;
    }

    /// <summary>The first characters that make a spreadsheet read a cell as a formula (OWASP, "CSV Injection").</summary>
    private const string FormulaStarts = "=+-@\t\r";
}
