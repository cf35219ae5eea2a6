using System.Globalization;
using NetSolve.Model;

namespace NetSolve.Parsing.Values;

/// <summary>A number of servers: a whole number from 1 to <see cref="Servers.MaxCount"/>, or <c>unlimited</c>.</summary>
/// <remarks>Thread-safe. Digits only: no sign, point, exponent or spaces, so <c>14.0</c> and <c>+3</c> are refused.</remarks>
public static class ServersValue
{
    /// <summary>Reads <paramref name="text"/> as a number of servers.</summary>
    public static ValueResult<Servers> Parse(ReadOnlySpan<char> text)
    {
        if (text is "unlimited")
        {
            return ValueResult<Servers>.Valid(Servers.Unlimited);
        }

        if (text.Length == 0 || text.ContainsAnyExceptInRange('0', '9'))
        {
            return NotServers(text);
        }

        if (!int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out int count) || count > Servers.MaxCount)
        {
            return ValueResult<Servers>.Invalid(string.Create(CultureInfo.InvariantCulture,
                $"'{text}' is more than {Servers.MaxCount} servers (write unlimited for a unit where nobody waits)"));
        }

        return count >= 1 ? ValueResult<Servers>.Valid(Servers.Of(count)) : NotServers(text);
    }

    /// <inheritdoc cref="Parse(ReadOnlySpan{char})"/>
    public static ValueResult<Servers> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Parse(text.AsSpan());
    }

    /// <summary>The error for a quoted YAML value, which a number of servers never is.</summary>
    public static ValueResult<Servers> Quoted(ReadOnlySpan<char> text) =>
        ValueResult<Servers>.Invalid($"'{text}' is quoted (write a number of servers, or unlimited, without quotes)");

    private static ValueResult<Servers> NotServers(ReadOnlySpan<char> text) => ValueResult<Servers>.Invalid(string.Create(CultureInfo.InvariantCulture,
        $"'{text}' is not a number of servers (write a whole number from 1 to {Servers.MaxCount}, or unlimited)"));
}
