using System.Text;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>Makes the inputs of a seeded campaign: the caller picks the surface, the rest is drawn from the seed.</summary>
internal sealed class InputGenerator
{
    private const string NetworkName = "network.yaml";

    private readonly SeedFiles _seeds;
    private readonly Random _random;
    private readonly TextMutator _mutator;
    private readonly OptionValueGenerator _values;
    private readonly WhatIfGenerator _whatIf;
    private readonly IReadOnlyList<(string Command, string Option)> _options = OptionTable.Options();

    public InputGenerator(SeedFiles seeds, int seed)
    {
        _seeds = seeds;
        _random = new Random(seed);
        _mutator = new TextMutator(_random, SeedFiles.ContractKeys);
        _values = new OptionValueGenerator(_random);
        _whatIf = new WhatIfGenerator(_random);
    }

    /// <summary>The surfaces in the order the campaign visits them.</summary>
    public static readonly FuzzSurface[] Surfaces = Enum.GetValues<FuzzSurface>();

    /// <summary>The next input, on <paramref name="surface"/>.</summary>
    public FuzzInput Next(FuzzSurface surface) => surface switch
    {
        FuzzSurface.NetworkFile => MutatedNetwork(),
        FuzzSurface.ScenarioFile => MutatedScenario(),
        FuzzSurface.WhatIf => WhatIfChanges(),
        FuzzSurface.MovementLog => MutatedLog(),
        _ => OptionValues(),
    };

    private FuzzInput MutatedNetwork()
    {
        // Two in three start from a network that solves, so the mutation rather than the seed decides how far it gets.
        string seed = _random.Next(3) == 0 ? Pick(_seeds.Networks) : Pick(_seeds.ValidNetworks);
        string command = Pick(CommandShapes.NetworkCommands);
        var options = CommandShapes.Options(command, SeedFiles.UnitIds(seed), _random);
        return Build(FuzzSurface.NetworkFile, command, [FuzzInput.Folder + "/" + NetworkName], options, [new FuzzFile(NetworkName, _mutator.Mutate(seed))]);
    }

    private FuzzInput MutatedScenario()
    {
        string scenario = Pick(_seeds.Scenarios);
        if (_random.Next(8) == 0)
        {
            string[] bases = ["/dev/null", "/", ".", "", "../nope.yaml", "../harbourside.yaml/", "scenario.yaml", "../../../../../../../../etc/hostname"];
            scenario = System.Text.RegularExpressions.Regex.Replace(scenario, "base:.*", "base: " + Pick(bases), System.Text.RegularExpressions.RegexOptions.None, TimeSpan.FromSeconds(1));
        }

        string[] commands = ["solve", "check", "compare", "growth", "report"];
        string command = Pick(commands);
        string path = FuzzInput.Folder + "/scenarios/scenario.yaml";
        string[] files = command is "compare" or "report" ? [FuzzInput.Folder + "/harbourside.yaml", path] : [path];
        var options = CommandShapes.Options(command, SeedFiles.UnitIds(_seeds.Harbourside), _random);
        return Build(FuzzSurface.ScenarioFile, command, files, options,
            [new FuzzFile("harbourside.yaml", Encoding.UTF8.GetBytes(_seeds.Harbourside)), new FuzzFile("scenarios/scenario.yaml", _mutator.Mutate(scenario))]);
    }

    private FuzzInput WhatIfChanges()
    {
        string network = Pick(_seeds.ValidNetworks);
        var units = SeedFiles.UnitIds(network);
        string[] commands = ["solve", "solve", "growth", "staff", "pathway", "compare", "simulate", "map"];
        string command = Pick(commands);
        var options = CommandShapes.Options(command, units, _random);
        int count = 1 + _random.Next(3);
        for (int i = 0; i < count; i++)
        {
            options.Add(("--set", _whatIf.Expression(units)));
        }

        return Build(FuzzSurface.WhatIf, command, [FuzzInput.Folder + "/" + NetworkName], options, [new FuzzFile(NetworkName, Encoding.UTF8.GetBytes(network))]);
    }

    private FuzzInput MutatedLog()
    {
        string log = _random.Next(2) == 0 ? ReplaceField(_seeds.Log) : _seeds.Log;
        var options = CommandShapes.Options("fit", [], _random);
        if (_random.Next(4) == 0)
        {
            options.Add(("--time-unit", Pick(["minute", "hour", "day"])));
        }

        return Build(FuzzSurface.MovementLog, "fit", [FuzzInput.Folder + "/log.csv"], options, [new FuzzFile("log.csv", _mutator.Mutate(log))]);
    }

    private FuzzInput OptionValues()
    {
        var (command, _) = Pick(_options);
        string network = Pick(_seeds.ValidNetworks);
        var units = SeedFiles.UnitIds(network);
        var options = CommandShapes.Options(command, units, _random);
        var ofCommand = _options.Where(entry => string.Equals(entry.Command, command, StringComparison.Ordinal)).Select(entry => entry.Option).ToArray();
        int count = 1 + _random.Next(3);
        for (int i = 0; i < count; i++)
        {
            string option = Pick(ofCommand);
            var kind = OptionTable.KindOf(command, option) ?? OptionKind.Text;
            options.RemoveAll(entry => string.Equals(entry.Option, option, StringComparison.Ordinal) && kind != OptionKind.WhatIf);
            options.Add((option, kind == OptionKind.Flag ? null : _values.Value(kind, units)));
        }

        // A report asked to simulate starts from a quick run too; options the fuzzer chose stay as it chose them.
        if (command is "report" && options.Exists(entry => entry.Option is "--simulate"))
        {
            options.AddRange(CommandShapes.ReportSimulation.Where(quick => !options.Exists(entry => string.Equals(entry.Option, quick.Option, StringComparison.Ordinal))).ToList());
        }

        var files = new List<FuzzFile> { new(NetworkName, Encoding.UTF8.GetBytes(network)), new("log.csv", Encoding.UTF8.GetBytes(_seeds.Log)) };
        string[] arguments = command switch
        {
            "fit" => [FuzzInput.Folder + "/log.csv"],
            "compare" => [FuzzInput.Folder + "/" + NetworkName, FuzzInput.Folder + "/" + NetworkName],
            _ => [FuzzInput.Folder + "/" + NetworkName],
        };
        return Build(FuzzSurface.OptionValue, command, arguments, options, files);
    }

    private FuzzInput Build(FuzzSurface surface, string command, string[] files, List<(string Option, string? Value)> options, IReadOnlyList<FuzzFile> inputs)
    {
        var line = CommandShapes.Line(command, files, options);
        string? output = CommandShapes.OutputFile(line);
        byte[]? old = output is not null && _random.Next(3) == 0 ? Encoding.UTF8.GetBytes("old content\n") : null;
        return new FuzzInput(surface, line, inputs, output, old);
    }

    private string ReplaceField(string log)
    {
        string[] values = ["", "9999-12-31T23:59:59", "0001-01-01T00:00:00", "2026-13-40T25:61:61", "2026-03-02", "1e308", "NaN", "\"a,b\"", "\"", "=1+1", HostileValues.LongLabel(10_000)];
        var lines = log.Split('\n');
        int line = 1 + _random.Next(Math.Max(1, lines.Length - 2));
        if (line >= lines.Length)
        {
            return log;
        }

        var fields = lines[line].Split(',');
        fields[_random.Next(fields.Length)] = Pick(values);
        lines[line] = string.Join(',', fields);
        return string.Join('\n', lines);
    }

    private T Pick<T>(IReadOnlyList<T> values) => values[_random.Next(values.Count)];
}
