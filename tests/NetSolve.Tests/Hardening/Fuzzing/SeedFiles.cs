using System.Text.RegularExpressions;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>The inputs mutations start from: the bundled networks, scenarios and movement log, and the test data files.</summary>
internal sealed partial class SeedFiles
{
    /// <summary>Keys of the network and scenario file contract, put where they do not belong by a mutation.</summary>
    public static readonly string[] ContractKeys =
    [
        "name", "time_unit", "units", "label", "servers", "service", "service_cv", "service_distribution", "service_samples",
        "capacity", "when_full", "arrivals", "routes", "groups", "arrival_profile", "hour_of_day", "day_of_week", "arrival_cv",
        "scenario", "base", "add_units", "close_units", "scale_arrivals", "services",
    ];

    /// <summary>Lines of the bundled movement log kept as the seed: enough for several units, small enough for a fast fit.</summary>
    private const int LogLines = 120;

    private static readonly string[] TestDataFolders = ["Invalid", "Warnings"];

    private SeedFiles(IReadOnlyList<string> networks, IReadOnlyList<string> validNetworks, IReadOnlyList<string> scenarios, string log)
    {
        Harbourside = File.ReadAllText(TestFiles.Network("harbourside"));
        Networks = networks;
        ValidNetworks = validNetworks;
        Scenarios = scenarios;
        Log = log;
    }

    /// <summary>Every network file: bundled, invalid and warning test data.</summary>
    public IReadOnlyList<string> Networks { get; }

    /// <summary>The bundled networks, which solve: the base for <c>--set</c> and option values.</summary>
    public IReadOnlyList<string> ValidNetworks { get; }

    /// <summary>The bundled scenario files (their base is <c>../harbourside.yaml</c>).</summary>
    public IReadOnlyList<string> Scenarios { get; }

    /// <summary>The head of the bundled movement log.</summary>
    public string Log { get; }

    /// <summary>The harbourside network, the base every bundled scenario names.</summary>
    public string Harbourside { get; }

    /// <summary>Reads the seeds from the files copied beside the test assembly.</summary>
    public static SeedFiles Load()
    {
        string[] valid = [.. Directory.GetFiles(TestFiles.NetworksFolder, "*.yaml").Order(StringComparer.Ordinal).Select(File.ReadAllText)];
        string[] testData =
        [
            .. TestDataFolders
                .SelectMany(folder => Directory.GetFiles(TestFiles.TestDataFolder(folder), "*.yaml"))
                .Order(StringComparer.Ordinal)
                .Select(File.ReadAllText),
        ];
        string[] scenarios = [.. Directory.GetFiles(Path.Combine(TestFiles.NetworksFolder, "scenarios"), "*.yaml").Order(StringComparer.Ordinal).Select(File.ReadAllText)];
        string log = string.Join('\n', File.ReadLines(TestFiles.Log("rowan-urgent-care")).Take(LogLines)) + "\n";
        return new SeedFiles([.. valid, .. testData], valid, scenarios, log);
    }

    /// <summary>The unit ids a network file declares (two-space keys under <c>units:</c>), or a stand-in when it declares none.</summary>
    public static IReadOnlyList<string> UnitIds(string network)
    {
        var block = UnitsBlock().Match(network);
        string[] ids = block.Success ? [.. UnitKey().Matches(block.Value).Select(match => match.Groups["id"].Value)] : [];
        return ids.Length > 0 ? ids : ["emergency"];
    }

    [GeneratedRegex(@"^units:[^\n]*\n(?:(?:[ #][^\n]*)?\n)*", RegexOptions.Multiline | RegexOptions.CultureInvariant)]
    private static partial Regex UnitsBlock();

    [GeneratedRegex(@"^  (?<id>[A-Za-z_][\w-]*):", RegexOptions.Multiline | RegexOptions.CultureInvariant)]
    private static partial Regex UnitKey();
}
