using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;

namespace NetSolve.Scenarios;

/// <summary>
/// Parses the short what-if text given on the command line (<c>--set</c>): the field comes first, then the
/// unit(s), then an operator and a value, so no unit name can be mistaken for a field.
/// </summary>
/// <remarks>
/// <list type="bullet">
/// <item><c>servers.UNIT=N</c> or <c>=unlimited</c>; <c>servers.UNIT+=N</c> adds N (negative removes).</item>
/// <item><c>service.UNIT=DURATION</c> (<c>25min</c>, <c>3d</c>; a bare number is in the file's time unit); <c>service.UNIT*=F</c> scales it.</item>
/// <item><c>arrivals.UNIT=RATE</c> (<c>12/h</c>); <c>arrivals.UNIT*=F</c> scales one stream; <c>arrivals*=F</c> scales every stream.</item>
/// <item><c>route.FROM.TO=P</c> (<c>0.2</c> or <c>20%</c>): only this fraction changes; the patients leaving the network absorb the difference.</item>
/// </list>
/// Unit names are checked when the change is applied (<see cref="NetworkEditor"/>). Thread-safe.
/// </remarks>
public static class OverrideParser
{
    /// <summary>The fields an override can change, in the order help lists them.</summary>
    public static readonly IReadOnlyList<string> Fields = ["servers", "service", "arrivals", "route"];

    /// <summary>The syntax, one line, for error messages.</summary>
    public const string Syntax = "FIELD.UNIT=VALUE, e.g. servers.ward=320, service.imaging=25min, arrivals*=1.1, arrivals.emergency*=1.2, route.emergency.imaging=0.2";

    /// <summary>Parses one override; on failure returns the error as a located diagnostic.</summary>
    /// <param name="text">The text after <c>--set</c>.</param>
    /// <param name="timeUnit">The network's time unit, for bare numbers in durations and rates.</param>
    /// <param name="change">The change, when the text is valid.</param>
    /// <returns>Null on success, else the error.</returns>
    public static Diagnostic? Parse(string text, TimeUnit timeUnit, out NetworkChange? change)
    {
        ArgumentNullException.ThrowIfNull(text);
        change = null;
        var location = LocationOf(text);
        int equals = text.IndexOf('=', StringComparison.Ordinal);
        if (equals <= 0)
        {
            return Fail(location, $"expected {Syntax}");
        }

        char op = text[equals - 1] is '*' or '+' ? text[equals - 1] : '=';
        string path = text[..(op == '=' ? equals : equals - 1)].Trim();
        string value = text[(equals + 1)..].Trim();
        string[] parts = path.Split('.');
        string field = parts[0];
        if (value.Length == 0)
        {
            return Fail(location, "no value after '='");
        }

        return field switch
        {
            "servers" => Servers(location, parts, op, value, out change),
            "service" => Service(location, parts, op, value, timeUnit, out change),
            "arrivals" => Arrivals(location, parts, op, value, timeUnit, out change),
            "route" => RouteChange(location, parts, op, value, out change),
            _ => Fail(location, $"unknown field '{field}'" + (NearestName.Suggest(field, Fields) is string best
                ? $"; did you mean '{best}'?"
                : $" (fields: {string.Join(", ", Fields)})")),
        };
    }

    /// <summary>The location used for an override: its text as written, printed without line and column.</summary>
    public static SourceLocation LocationOf(string text) => new("--set " + text, 0, 0);

    private static Diagnostic? Servers(SourceLocation location, string[] parts, char op, string value, out NetworkChange? change)
    {
        change = null;
        if (Unit(location, parts, "servers") is { } error)
        {
            return error;
        }

        string unit = parts[1];
        if (op == '*')
        {
            return Fail(location, "servers takes '=' (a number or unlimited) or '+=' (servers to add), not '*='");
        }

        if (op == '+')
        {
            if (!int.TryParse(value, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int added))
            {
                return Fail(location, $"'{value}' is not a whole number of servers to add");
            }

            change = new AddServers(location, unit, added);
            return null;
        }

        if (value == "unlimited")
        {
            change = new SetServers(location, unit, Model.Servers.Unlimited);
            return null;
        }

        if (!int.TryParse(value, NumberStyles.None, CultureInfo.InvariantCulture, out int count) || count < 1 || count > Model.Servers.MaxCount)
        {
            return Fail(location, string.Create(CultureInfo.InvariantCulture,
                $"servers must be a whole number from 1 to {Model.Servers.MaxCount}, or unlimited, not '{value}'"));
        }

        change = new SetServers(location, unit, Model.Servers.Of(count));
        return null;
    }

    private static Diagnostic? Service(SourceLocation location, string[] parts, char op, string value, TimeUnit timeUnit, out NetworkChange? change)
    {
        change = null;
        if (Unit(location, parts, "service") is { } error)
        {
            return error;
        }

        switch (op)
        {
            case '*':
                if (Factor(location, value, allowZero: false, out double factor) is { } bad)
                {
                    return bad;
                }

                change = new ScaleService(location, parts[1], factor);
                return null;
            case '+':
                return Fail(location, "service takes '=' (a duration) or '*=' (a factor), not '+='");
            default:
                if (ValueParser.Duration(value, timeUnit, out double hours) is string message)
                {
                    return Fail(location, "service: " + message);
                }

                change = new SetService(location, parts[1], hours);
                return null;
        }
    }

    private static Diagnostic? Arrivals(SourceLocation location, string[] parts, char op, string value, TimeUnit timeUnit, out NetworkChange? change)
    {
        change = null;
        if (op == '+')
        {
            return Fail(location, "arrivals take '=' (a rate) or '*=' (a factor), not '+='");
        }

        if (parts.Length == 1)
        {
            if (op != '*')
            {
                return Fail(location, "arrivals=... needs a unit (arrivals.UNIT=RATE); to scale every stream write arrivals*=FACTOR");
            }

            if (Factor(location, value, allowZero: true, out double all) is { } bad)
            {
                return bad;
            }

            change = new ScaleArrivals(location, null, all);
            return null;
        }

        if (Unit(location, parts, "arrivals") is { } error)
        {
            return error;
        }

        if (op == '*')
        {
            if (Factor(location, value, allowZero: true, out double factor) is { } bad)
            {
                return bad;
            }

            change = new ScaleArrivals(location, parts[1], factor);
            return null;
        }

        if (ValueParser.Rate(value, timeUnit, out double perHour) is string message)
        {
            return Fail(location, "arrivals: " + message);
        }

        change = new SetArrivals(location, parts[1], perHour);
        return null;
    }

    private static Diagnostic? RouteChange(SourceLocation location, string[] parts, char op, string value, out NetworkChange? change)
    {
        change = null;
        if (parts.Length != 3 || parts[1].Length == 0 || parts[2].Length == 0)
        {
            return Fail(location, "a route is written route.FROM.TO=P, e.g. route.emergency.imaging=0.2");
        }

        if (op != '=')
        {
            return Fail(location, $"route takes '=' (a probability), not '{op}='");
        }

        if (ValueParser.Probability(value, out double probability) is string message)
        {
            return Fail(location, "route: " + message);
        }

        change = new SetRoute(location, parts[1], parts[2], probability);
        return null;
    }

    private static Diagnostic? Unit(SourceLocation location, string[] parts, string field) =>
        parts.Length == 2 && parts[1].Length > 0
            ? null
            : Fail(location, $"{field} is written {field}.UNIT, with one unit id (e.g. {field}.ward)");

    private static Diagnostic? Factor(SourceLocation location, string value, bool allowZero, out double factor)
    {
        if (ValueParser.Number(value, out factor) is string message)
        {
            return Fail(location, message);
        }

        bool ok = allowZero ? factor >= 0.0 : factor > 0.0;
        return ok ? null : Fail(location, $"the factor must be {(allowZero ? "0 or more" : "more than 0")}, not '{value}'");
    }

    private static Diagnostic Fail(SourceLocation location, string message) =>
        Diagnostic.Error(ChangeCodes.BadOverride, location, null, message);
}
