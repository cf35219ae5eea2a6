namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>What-if expressions (<c>--set</c>): mostly well formed with extreme values, sometimes broken in their shape.</summary>
internal sealed class WhatIfGenerator(Random random)
{
    private static readonly string[] Fields = ["servers", "service", "arrivals", "route", "capacity", "label", "nope"];

    private static readonly string[] Operators = ["=", "+=", "*=", "-=", "==", ""];

    private static readonly string[] Values =
    [
        "unlimited", "12", "0", "-1", "2147483647", "2147483648", "25min", "1e-320", "1e-320h", "1e308", "1e300h", "0.9", "x1.1",
        "12/h", "1e-320/h", "1e308/h", "0.2", "20%", "1.5", ".nan", "NaN", "Infinity", "x", "", "=", "1e400",
    ];

    /// <summary>One expression naming units of the network (or none, or one that does not exist).</summary>
    public string Expression(IReadOnlyList<string> units)
    {
        string field = Pick(Fields);
        string target = field switch
        {
            "route" => "." + Unit(units) + "." + Unit(units),
            "arrivals" when random.Next(3) == 0 => string.Empty,
            _ => "." + Unit(units),
        };
        return random.Next(12) == 0 ? Pick(HostileValues.Junk) : field + target + Pick(Operators) + Pick(Values);
    }

    private string Unit(IReadOnlyList<string> units) => random.Next(8) switch
    {
        0 => "nowhere",
        1 => string.Empty,
        2 => "*",
        _ => Pick(units),
    };

    private string Pick(IReadOnlyList<string> values) => values[random.Next(values.Count)];
}
