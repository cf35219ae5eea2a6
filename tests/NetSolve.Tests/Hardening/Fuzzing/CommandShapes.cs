namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// A valid, quick command line for each command, as a starting point the fuzzer changes: simulations are kept to two
/// short replications on one thread (<c>report --simulate</c>, which has no thread option, to two short replications)
/// so that a long run means the fuzzed value asked for it.
/// </summary>
internal static class CommandShapes
{
    /// <summary>The commands that read one network file.</summary>
    public static readonly string[] NetworkCommands = ["solve", "solve", "solve", "check", "growth", "staff", "pathway", "simulate", "map", "report"];

    /// <summary>The options of a quick run of <paramref name="command"/>  on a network with these unit ids, in order.</summary>
    public static List<(string Option, string? Value)> Options(string command, IReadOnlyList<string> units, Random random) => command switch
    {
        "solve" or "compare" => [("--format", Pick(["table", "json", "csv"], random))],
        "growth" => [("--steps", "4"), ("--format", Pick(["table", "json", "csv"], random))],
        "staff" => [("--max-util", "0.85"), ("--format", Pick(["table", "json", "csv"], random))],
        "pathway" => [("--from", units[0]), ("--format", Pick(["table", "json", "csv"], random))],
        "simulate" => [("--replications", "2"), ("--warmup", "1d"), ("--duration", "2d"), ("--threads", "1"), ("--format", Pick(["table", "json", "csv"], random))],
        "map" => [("--output", FuzzInput.Folder + "/out" + Pick([".svg", ".dot", ".svg", ".png"], random))],
        "report" => [("--output", FuzzInput.Folder + "/out.html")],
        "fit" => random.Next(2) == 0 ? [("--output", FuzzInput.Folder + "/fitted.yaml")] : [],
        _ => [],
    };

    /// <summary>The quick run of <c>report --simulate</c>, the same length as <c>simulate</c>'s; valid only beside <c>--simulate</c>.</summary>
    public static readonly (string Option, string? Value)[] ReportSimulation = [("--replications", "2"), ("--warmup", "1d"), ("--duration", "2d")];

    /// <summary>
    /// True when <paramref name="line"/> runs on the calling thread only: every command but a simulation, and a
    /// simulation held to one thread (its replications then run in turn on the caller).
    /// </summary>
    public static bool RunsOnOneThread(IReadOnlyList<string> line)
    {
        bool simulates = line[0] is "simulate" || (line[0] is "report" && line.Contains("--simulate", StringComparer.Ordinal));
        int threads = line.ToList().FindLastIndex(argument => argument is "--threads");
        return !simulates || (threads >= 0 && threads + 1 < line.Count && line[threads + 1] is "1");
    }

    /// <summary>The command line: the command, its files, then each option and its value.</summary>
    public static List<string> Line(string command, IEnumerable<string> files, IEnumerable<(string Option, string? Value)> options)
    {
        var line = new List<string> { command };
        line.AddRange(files);
        foreach (var (option, value) in options)
        {
            line.Add(option);
            if (value is not null)
            {
                line.Add(value);
            }
        }

        return line;
    }

    /// <summary>The file a command line asks to be written (<c>--output</c>, or the roster chart of <c>staff --chart</c>), relative to the run's folder, if any.</summary>
    public static string? OutputFile(IReadOnlyList<string> line)
    {
        int at = line.ToList().FindLastIndex(argument => argument is "--output" or "-o" or "--chart");
        string prefix = FuzzInput.Folder + "/";
        return at >= 0 && at + 1 < line.Count && line[at + 1].StartsWith(prefix, StringComparison.Ordinal) ? line[at + 1][prefix.Length..] : null;
    }

    /// <summary>
    /// Every other file the line names for writing (an earlier <c>--output</c>, the HTML of <c>fit --report</c>),
    /// relative to the run's folder: written files, not strays, and checked for completeness when they are there.
    /// </summary>
    public static IReadOnlyList<string> OtherOutputFiles(IReadOnlyList<string> line)
    {
        string prefix = FuzzInput.Folder + "/";
        string? main = OutputFile(line);
        return [.. line.Skip(1).Select((argument, at) => (argument, at: at + 1))
            .Where(entry => entry.argument is "--output" or "-o" or "--chart" or "--report" && entry.at + 1 < line.Count && line[entry.at + 1].StartsWith(prefix, StringComparison.Ordinal))
            .Select(entry => line[entry.at + 1][prefix.Length..])
            .Where(path => !string.Equals(path, main, StringComparison.Ordinal))
            .Distinct(StringComparer.Ordinal)];
    }

    private static string Pick(string[] values, Random random) => values[random.Next(values.Length)];
}
