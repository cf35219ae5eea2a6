using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Parsing.Values;

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
    /// <remarks>
    /// Values are read by the value kinds of <see cref="Parsing.Values"/> and worded with <see cref="FieldLabels"/>,
    /// as in network and scenario files, so a mistake reads the same wherever it is made.
    /// </remarks>
    public static Diagnostic? Parse(string text, TimeUnit timeUnit, out NetworkChange? change)
    {
        ArgumentNullException.ThrowIfNull(text);
        change = null;
        var location = LocationOf(text);

        // A line break or control character would split or disguise the change where it is echoed (the network's
        // name, an error line): refused as in files.
        int refused = text.AsSpan().IndexOfAny('\t', '\n', '\r');
        refused = refused >= 0 ? refused : InputCharacters.FindRefused(text);
        if (refused >= 0)
        {
            return Fail(location, text[refused] is '\t' or '\n' or '\r' ? "a tab or line break is not allowed in a change" : InputCharacters.Describe(text, refused));
        }

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
            return Read(location, FieldLabels.Servers, value, AddedServersValue.Parse(value), added => new AddServers(location, unit, added), out change);
        }

        return Read(location, FieldLabels.Servers, value, ServersValue.Parse(value), servers => new SetServers(location, unit, servers), out change);
    }

    private static Diagnostic? Service(SourceLocation location, string[] parts, char op, string value, TimeUnit timeUnit, out NetworkChange? change)
    {
        change = null;
        if (Unit(location, parts, "service") is { } error)
        {
            return error;
        }

        string unit = parts[1];
        return op switch
        {
            '*' => Read(location, FieldLabels.Service, value, FactorValue.Positive(value), factor => new ScaleService(location, unit, factor), out change),
            '+' => Fail(location, "service takes '=' (a duration) or '*=' (a factor), not '+='"),
            _ => Read(location, FieldLabels.Service, value, DurationValue.Parse(value, timeUnit), hours => new SetService(location, unit, hours), out change),
        };
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
            return op == '*'
                ? Read(location, FieldLabels.Arrivals, value, FactorValue.NotNegative(value), all => new ScaleArrivals(location, null, all), out change)
                : Fail(location, "arrivals=... needs a unit (arrivals.UNIT=RATE); to scale every stream write arrivals*=FACTOR");
        }

        if (Unit(location, parts, "arrivals") is { } error)
        {
            return error;
        }

        string unit = parts[1];
        return op == '*'
            ? Read(location, FieldLabels.Arrivals, value, FactorValue.NotNegative(value), factor => new ScaleArrivals(location, unit, factor), out change)
            : Read(location, FieldLabels.ArrivalRate, value, RateValue.Parse(value, timeUnit), perHour => new SetArrivals(location, unit, perHour), out change);
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

        return Read(location, FieldLabels.For(FieldLabels.RouteTo, parts[2]), value, ProbabilityValue.Parse(value),
            probability => new SetRoute(location, parts[1], parts[2], probability), out change);
    }

    /// <summary>The change made from <paramref name="result"/>, or its message for the field <paramref name="label"/>.</summary>
    private static Diagnostic? Read<T>(SourceLocation location, string label, string value, ValueResult<T> result, Func<T, NetworkChange> make, out NetworkChange? change)
        where T : struct
    {
        change = null;
        if (value.Length == 0)
        {
            return Fail(location, $"{label} has no value");
        }

        if (!result.IsValid)
        {
            return Fail(location, result.MessageFor(label));
        }

        change = make(result.Value);
        return null;
    }

    private static Diagnostic? Unit(SourceLocation location, string[] parts, string field) =>
        parts.Length == 2 && parts[1].Length > 0
            ? null
            : Fail(location, $"{field} is written {field}.UNIT, with one unit id (e.g. {field}.ward)");

    private static Diagnostic Fail(SourceLocation location, string message) =>
        Diagnostic.Error(ChangeCodes.BadOverride, location, null, message);
}
