using NetSolve.Benchmarks;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Parsing;

public class NetworkReaderTests
{
    private static string InvalidFolder => TestFiles.TestDataFolder("Invalid");

    private static string WarningsFolder => TestFiles.TestDataFolder("Warnings");

    public static TheoryData<string> InvalidFiles() => FilesIn(InvalidFolder);

    public static TheoryData<string> WarningFiles() => FilesIn(WarningsFolder);

    // Source: the network file contract, "Rules the parser enforces": each broken rule is one line
    // FILE:LINE:COL: unit 'ID': message, nothing is solved. Expected lines are written by hand beside each file.
    [Theory]
    [MemberData(nameof(InvalidFiles))]
    public void Each_broken_rule_gives_exactly_the_expected_located_errors(string fileName)
    {
        var result = ReadFromFolder(InvalidFolder, fileName);

        Assert.True(result.HasErrors);
        Assert.Null(result.Network);
        Assert.Equal(ExpectedLines(InvalidFolder, fileName), result.Diagnostics.Select(d => d.ToString()).ToArray());
    }

    // Source: the network file contract: a unit nobody reaches and service_cv other than 1 are warnings that do not
    // stop the solve.
    [Theory]
    [MemberData(nameof(WarningFiles))]
    public void Each_warning_is_reported_and_the_network_is_still_read(string fileName)
    {
        var result = ReadFromFolder(WarningsFolder, fileName);

        Assert.False(result.HasErrors);
        Assert.NotNull(result.Network);
        Assert.Equal(ExpectedLines(WarningsFolder, fileName), result.Diagnostics.Select(d => d.ToString()).ToArray());
    }

    [Fact]
    public void Every_invalid_file_has_its_expected_diagnostics_beside_it()
    {
        foreach (var path in Directory.EnumerateFiles(InvalidFolder, "*.yaml"))
        {
            Assert.True(File.Exists(Path.ChangeExtension(path, ".diagnostics.txt")), $"no expected diagnostics for {Path.GetFileName(path)}");
        }
    }

    [Fact]
    public void A_missing_file_is_one_error_naming_the_path()
    {
        string path = Path.Combine(InvalidFolder, "no-such-network.yaml");
        var result = NetworkReader.ReadFile(path);

        Assert.Equal([$"{path}: no such file"], result.Diagnostics.Select(d => d.ToString()).ToArray());
    }

    [Fact]
    public void A_directory_is_one_error_naming_the_path()
    {
        var result = NetworkReader.ReadFile(InvalidFolder);

        Assert.Equal([$"{InvalidFolder}: is a directory, not a network file"], result.Diagnostics.Select(d => d.ToString()).ToArray());
    }

    // Common practice: five megabytes of seeded junk, printable and binary, must give located errors, never an
    // exception (the reader stops at the first unreadable place, so one line).
    [Theory]
    [InlineData(1, false)]
    [InlineData(2, true)]
    [InlineData(3, true)]
    public void Five_megabytes_of_junk_give_one_located_error_and_no_exception(int seed, bool binary)
    {
        string path = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-junk-{seed}-{Environment.ProcessId}.yaml"));
        File.WriteAllBytes(path, Junk(seed, binary, 5 * 1024 * 1024));
        try
        {
            var result = NetworkReader.ReadFile(path);

            Assert.True(result.HasErrors);
            Assert.All(result.Diagnostics, d => Assert.StartsWith(path + ":", d.ToString(), StringComparison.Ordinal));
            Assert.All(result.Diagnostics, d => Assert.DoesNotContain('\n', d.ToString()));
        }
        finally
        {
            File.Delete(path);
        }
    }

    // Common practice (fuzzing): short texts built from YAML's special characters and network keys never make the
    // reader throw; each gives a network or located diagnostics.
    [Fact]
    public void Ten_thousand_seeded_fragments_of_near_YAML_never_make_the_reader_throw()
    {
        string[] pieces = ["units:", "arrivals:", "routes:", "\n", "\n  ", "\n    ", " ", "clinic", ":", "-", "{", "}", "[", "]",
            ",", "'", "\"", "#", "&a", "*a", "!", "|", ">", "%", "@", "`", "?", "2", "0.5", "30min", "4/h", "servers: ", "service: ",
            "unlimited", "\t", "~", "---", "...", "\\", "\u00e9", "\0"];
        var random = new Random(424242);
        for (int trial = 0; trial < 10_000; trial++)
        {
            var text = new System.Text.StringBuilder();
            int count = random.Next(1, 30);
            for (int k = 0; k < count; k++)
            {
                text.Append(System.Text.RegularExpressions.Regex.Unescape(pieces[random.Next(pieces.Length)]));
            }

            var result = NetworkReader.ReadText(text.ToString(), "fragment.yaml");
            Assert.True(result.Network is not null || result.HasErrors, text.ToString());
            Assert.All(result.Diagnostics, d => Assert.StartsWith("fragment.yaml", d.ToString(), StringComparison.Ordinal));
        }
    }

    // Exact by construction: the generator writes the same network as text and as a model value.
    [Theory]
    [InlineData(1, 1)]
    [InlineData(50, 2)]
    [InlineData(2_000, 3)]
    public void A_generated_network_reads_back_to_the_network_it_was_written_from(int units, int seed)
    {
        var generated = NetworkGenerator.Generate(units, seed);
        var read = NetworkReader.ReadText(generated.Yaml, "generated.yaml");

        Assert.False(read.HasErrors, string.Join("\n", read.Diagnostics.Take(5)));
        var network = read.Network!;
        Assert.Equal(generated.Network.Name, network.Name);
        Assert.Equal(generated.Network.Units.AsEnumerable(), network.Units.AsEnumerable());
        Assert.Equal(generated.Network.Arrivals.AsEnumerable(), network.Arrivals.AsEnumerable());
        Assert.Equal(generated.Network.Routes.AsEnumerable(), network.Routes.AsEnumerable());
    }

    // Source: the network file contract, "Values": the accepted forms of durations, rates and probabilities.
    [Theory]
    [InlineData("45", 0.75)]
    [InlineData("45min", 0.75)]
    [InlineData("45 min", 0.75)]
    [InlineData("2.5h", 2.5)]
    [InlineData("4d", 96.0)]
    [InlineData("30s", 30.0 / 3600.0)]
    [InlineData("2.5e-3h", 0.0025)]
    public void Durations_convert_to_hours_with_bare_numbers_in_the_files_time_unit(string text, double hours)
    {
        Assert.Null(ValueParser.Duration(text, TimeUnit.Minute, out double parsed));
        Assert.Equal(hours, parsed, 1e-12);
    }

    [Theory]
    [InlineData("11.5", 11.5)]
    [InlineData("11.5/h", 11.5)]
    [InlineData("11.5 /h", 11.5)]
    [InlineData("280/d", 280.0 / 24.0)]
    [InlineData("0.2/min", 12.0)]
    [InlineData("3/s", 10_800.0)]
    public void Rates_convert_to_events_per_hour(string text, double perHour)
    {
        Assert.Null(ValueParser.Rate(text, TimeUnit.Hour, out double parsed));
        Assert.Equal(perHour, parsed, 1e-9);
    }

    [Theory]
    [InlineData("0.35", 0.35)]
    [InlineData("35%", 0.35)]
    [InlineData("35 %", 0.35)]
    [InlineData("0", 0.0)]
    [InlineData("1", 1.0)]
    public void Probabilities_accept_fractions_and_percentages(string text, double probability)
    {
        Assert.Null(ValueParser.Probability(text, out double parsed));
        Assert.Equal(probability, parsed, 1e-12);
    }

    // Source: YAML 1.2.2, section 3.2.1.1 (the keys of a mapping are unique) and the network file contract (a repeat is
    // reported where it stands, naming the line of the first). Lines counted by hand: 'units' holds 'hub' (lines 3-5)
    // and w01..w19 (three lines each, 6-62); 'routes' starts at 65, hub's targets at 67 (w01) to 85 (w19), the repeat at 86.
    // More than 16 targets: the size from which repeats are looked up in a table rather than by scanning.
    [Fact]
    public void A_repeated_target_in_a_long_list_of_routes_is_reported_at_the_repeat()
    {
        var text = new System.Text.StringBuilder("time_unit: hour\nunits:\n  hub:\n    servers: 1\n    service: 30min\n");
        var ids = Enumerable.Range(1, 19).Select(i => "w" + i.ToString("D2", System.Globalization.CultureInfo.InvariantCulture)).ToList();
        ids.ForEach(id => text.Append("  ").Append(id).Append(":\n    servers: 1\n    service: 30min\n"));
        text.Append("arrivals:\n  hub: 1/h\nroutes:\n  hub:\n");
        ids.Append("w05").ToList().ForEach(id => text.Append("    ").Append(id).Append(": 0.01\n"));

        var result = NetworkReader.ReadText(text.ToString(), "net.yaml");

        Assert.Equal(["net.yaml:86:5: unit 'hub': duplicate key 'w05' (first at line 71)"], result.Diagnostics.Select(d => d.ToString()).ToArray());
    }

    private static ReadResult ReadFromFolder(string folder, string fileName) =>
        NetworkReader.ReadText(File.ReadAllText(Path.Combine(folder, fileName)), fileName);

    private static string[] ExpectedLines(string folder, string fileName) =>
        File.ReadAllLines(Path.Combine(folder, Path.ChangeExtension(fileName, ".diagnostics.txt")))
            .Where(line => line.Length > 0)
            .ToArray();

    private static TheoryData<string> FilesIn(string folder)
    {
        var data = new TheoryData<string>();
        foreach (var path in Directory.EnumerateFiles(folder, "*.yaml").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(path));
        }

        return data;
    }

    private static byte[] Junk(int seed, bool binary, int length)
    {
        var random = new Random(seed);
        var bytes = new byte[length];
        if (binary)
        {
            random.NextBytes(bytes);
            return bytes;
        }

        const string Alphabet = "abc: -[]{}#&*!|>'\"%@`,?\n  \t0123456789.";
        for (int i = 0; i < length; i++)
        {
            bytes[i] = (byte)Alphabet[random.Next(Alphabet.Length)];
        }

        return bytes;
    }
}
