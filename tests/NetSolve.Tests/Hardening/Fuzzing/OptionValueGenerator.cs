namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>Boundary and junk values for an option of a given kind; a third of the time plain junk whatever the kind.</summary>
internal sealed class OptionValueGenerator(Random random)
{
    private static readonly string[] Choices = ["table", "json", "csv", "down", "right", "minute", "hour", "day", "TABLE", "Json", "xml", "table,json"];

    private static readonly string[] Fractions = ["0", "1", "0.85", "85%", "100%", "101%", "0%", "-0", "1.0000001", "0.999999999999", "5e-324", "1e-320", "-0.1", "0.5h", "%", "50 %"];

    private static readonly string[] Numbers = ["1", "0", "0.5", "1000", "1000.0001", "1e308", "1e-320", "-1", "1x", "x2", "2.5", "1e3"];

    private static readonly string[] WholeNumbers = ["1", "0", "2", "10000", "10001", "1000000", "1000001", "2147483647", "2147483648", "+5", "1.0", "1e3", "-1", "007"];

    private static readonly string[] Seeds = ["0", "1", "18446744073709551615", "18446744073709551616", "-1", "1.5", "0x10"];

    private static readonly string[] Durations =
    [
        "30min", "4h", "2d", "1", "0", "0min", "-1h", "1e300d", "1e-320h", "3650d", "3651d", "87600h", "1e308", "0.000001min",
        "h", "10 min", "10minutes", "1w", "1.5.h", "NaNh", ".infh",
    ];

    private readonly WhatIfGenerator _whatIf = new(random);

    /// <summary>A value for an option of <paramref name="kind"/> on a network with these unit ids.</summary>
    public string Value(OptionKind kind, IReadOnlyList<string> units)
    {
        // An output path always stays inside the run's folder: junk there could write beside the tests.
        if (kind == OptionKind.OutputPath)
        {
            return OutputName();
        }

        if (random.Next(3) == 0)
        {
            return Pick(HostileValues.Junk);
        }

        return kind switch
        {
            OptionKind.Choice => Pick(Choices),
            OptionKind.Fraction => Pick(Fractions),
            OptionKind.Number => Pick(Numbers),
            OptionKind.WholeNumber => Pick(WholeNumbers),
            OptionKind.Seed => Pick(Seeds),
            OptionKind.Duration => Pick(Durations),
            OptionKind.Unit => UnitList(units),
            OptionKind.UnitNumber => Pick(units) + "=" + Pick(Numbers),
            OptionKind.WhatIf => _whatIf.Expression(units),
            OptionKind.Text => Pick(HostileValues.Labels),
            _ => Pick(HostileValues.Junk),
        };
    }

    /// <summary>An output file name inside the run's folder: the extensions the commands take, wrong ones and odd names.</summary>
    public string OutputName()
    {
        string[] names = ["out.svg", "out.png", "out.dot", "out.html", "out.yaml", "out.txt", "out", ".svg", "out.SVG", "a b.html", "sub/out.svg", "out.svg/", "out.svg\0", "\u202Eout.svg"];
        return FuzzInput.Folder + "/" + Pick(names);
    }

    private string UnitList(IReadOnlyList<string> units) => random.Next(4) switch
    {
        0 => "nowhere",
        1 => string.Join(',', Enumerable.Range(0, 1 + random.Next(5)).Select(_ => Pick(units))),
        2 => Pick(units) + ",," + Pick(units),
        _ => Pick(units),
    };

    private string Pick(IReadOnlyList<string> values) => values[random.Next(values.Count)];
}
