using System.Diagnostics;
using System.Xml.Linq;
using System.Globalization;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Corpus;

/// <summary>
/// Input files that used to crash or exhaust the program: control characters in labels (map and report exit 70),
/// a scenario value <c>x</c> for a service (exit 70), an endless device as the network or the base (4.2 GB before
/// failing), a 10,000-character label (a map 78,759 units wide).
/// </summary>
public sealed class InputFileCorpusTests
{
    /// <summary>Managed heap allowed to the program reading an endless device: far above any network file, far below the 4.2 GB it used to take.</summary>
    private const string HeapLimit = "0x10000000";

    [Fact]
    public void A_scenario_giving_a_service_the_value_x_is_one_located_line() =>
        CorpusCase.Run(["solve", CorpusCase.File("scenario-service-x.yaml")]);

    [Theory]
    [InlineData("map.svg")]
    [InlineData("map.dot")]
    public void Control_characters_in_labels_do_not_break_the_map(string output) =>
        CorpusCase.RunWriting(path => ["map", CorpusCase.File("label-control-characters.yaml"), "--output", path], output);

    [Fact]
    public void Control_characters_in_labels_do_not_break_the_report() =>
        CorpusCase.RunWriting(path => ["report", CorpusCase.File("label-control-characters.yaml"), "--output", path], "report.html");

    [Fact]
    public void Control_characters_in_labels_do_not_reach_the_terminal() =>
        CorpusCase.Run(["solve", CorpusCase.File("label-control-characters.yaml")]);

    [Fact]
    public void A_ten_thousand_character_label_keeps_the_map_a_readable_width() =>
        CorpusCase.RunWriting(path => ["map", CorpusCase.File("long-label.yaml"), "--output", path], "map.svg", inspect: path =>
        {
            string width = XDocument.Load(path).Root!.Attribute("width")!.Value;

            // Common practice: a map fits a few screens wide; the unshortened label made it 78,759 units wide.
            Assert.True(double.Parse(width.TrimEnd('p', 'x'), CultureInfo.InvariantCulture) < 10_000, "map width " + width);
        });

    [Fact]
    public void A_ten_thousand_character_label_does_not_break_the_report() =>
        CorpusCase.RunWriting(path => ["report", CorpusCase.File("long-label.yaml"), "--output", path], "report.html");

    [Fact]
    public void Checking_an_endless_device_is_refused_without_reading_it_all() => AssertRefusedWithinMemory("check", "/dev/zero");

    [Fact]
    public void A_scenario_whose_base_is_an_endless_device_is_refused_without_reading_it_all() =>
        AssertRefusedWithinMemory("solve", CorpusCase.File("scenario-base-dev-zero.yaml"));

    /// <summary>
    /// Runs the program as its own process with a bounded heap, so that reading without limit fails fast here
    /// instead of exhausting the machine; the run must refuse the input with one line, exit 1.
    /// </summary>
    private static void AssertRefusedWithinMemory(string command, string file)
    {
        Assert.SkipUnless(OperatingSystem.IsLinux(), "/dev/zero is a Linux device");
        var start = new ProcessStartInfo("dotnet")
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "netsolve.dll"));
        start.ArgumentList.Add(command);
        start.ArgumentList.Add(file);
        start.Environment["DOTNET_GCHeapHardLimit"] = HeapLimit;
        using var process = Process.Start(start)!;
        var output = ReadHead(process.StandardOutput);
        var error = ReadHead(process.StandardError);
        if (!process.WaitForExit(TimeSpan.FromSeconds(20)))
        {
            process.Kill(entireProcessTree: true);
            Assert.Fail("still reading after 20 s");
        }

        process.WaitForExit();
        var result = new CliResult(process.ExitCode, output.Result, error.Result);
        CorpusCase.AssertKeepsContract(result, [command, file]);
        Assert.Equal(1, result.ExitCode);
    }

    /// <summary>The first 64 KB of a stream, the rest read and dropped: a program echoing an endless device must not exhaust the test.</summary>
    private static async Task<string> ReadHead(StreamReader reader)
    {
        const int Kept = 64 * 1024;
        var head = new System.Text.StringBuilder();
        char[] buffer = new char[8192];
        int read;
        while ((read = await reader.ReadAsync(buffer, TestContext.Current.CancellationToken)) > 0)
        {
            head.Append(buffer, 0, Math.Min(read, Math.Max(0, Kept - head.Length)));
        }

        return head.ToString();
    }
}
