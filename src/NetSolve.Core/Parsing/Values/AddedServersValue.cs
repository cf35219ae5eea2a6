using System.Globalization;

namespace NetSolve.Parsing.Values;

/// <summary>Servers to add (<c>+2</c>, <c>2</c>) or remove (<c>-1</c>): a whole number with an optional sign.</summary>
/// <remarks>Thread-safe. Whether the unit keeps from 1 to <see cref="Model.Servers.MaxCount"/> servers is checked when the change is applied.</remarks>
public static class AddedServersValue
{
    /// <summary>Reads <paramref name="text"/> as a number of servers to add.</summary>
    public static ValueResult<int> Parse(ReadOnlySpan<char> text)
    {
        return int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int added)
            ? ValueResult<int>.Valid(added)
            : ValueResult<int>.Invalid($"'{text}' is not a whole number of servers to add (write e.g. +2, or -1 to remove one)");
    }

    /// <inheritdoc cref="Parse(ReadOnlySpan{char})"/>
    public static ValueResult<int> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Parse(text.AsSpan());
    }
}
