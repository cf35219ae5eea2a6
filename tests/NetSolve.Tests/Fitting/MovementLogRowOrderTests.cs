using System.Text.RegularExpressions;
using NetSolve.Tests.Hardening;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Fitting;

public sealed partial class MovementLogRowOrderTests : IDisposable
{
    private readonly TempFolder folder = new();

    [Fact]
    public void Shuffled_rows_give_a_byte_identical_network_file_and_summary()
    {
        // The bundled log, with messy rows added: a duplicate, a readmission of a reused id, a tie in arrival time.
        var lines = File.ReadAllLines(TestFiles.Log("rowan-urgent-care")).Where(line => !line.StartsWith('#')).ToList();
        string header = lines[0];
        var rows = lines.Skip(1).ToList();
        rows.Add(rows[10]);
        rows.Add("P00001,xray,2026-03-12T09:00:00,2026-03-12T09:05:00,2026-03-12T09:20:00");
        rows.Add("P00002,lab,2026-03-02T00:40:42,2026-03-02T00:40:42,2026-03-02T01:00:00");
        rows.Add("P00002,xray,2026-03-02T00:40:42,2026-03-02T00:40:42,2026-03-02T00:50:00");
        var shuffled = rows.ToList();
        new Random(16).Shuffle(System.Runtime.InteropServices.CollectionsMarshal.AsSpan(shuffled));

        string inOrder = Fit("in-order.csv", [header, .. rows]);
        string reordered = Fit("shuffled.csv", [header, .. shuffled]);

        // The summary differs only in the count of rows out of time order, a fact about the file's order.
        Assert.Equal(inOrder.Replace("in-order", "shuffled", StringComparison.Ordinal), RowOrderNote().Replace(reordered, string.Empty));
        Assert.Contains("1 exact duplicates dropped", inOrder, StringComparison.Ordinal);
        Assert.Matches(RowOrderNote(), reordered);
    }

    public void Dispose() => folder.Dispose();

    [GeneratedRegex("; [0-9,]+ rows out of time order", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 1000)]
    private static partial Regex RowOrderNote();

    private string Fit(string name, IEnumerable<string> lines)
    {
        string path = Path.Combine(folder.Path, name);
        File.WriteAllLines(path, lines);
        string output = Path.Combine(folder.Path, name + ".yaml");
        var result = CliRun.Run("fit", path, "-o", output);
        Assert.Equal(0, result.ExitCode);
        return result.Out.Replace(folder.Path, "{temp}", StringComparison.Ordinal) + File.ReadAllText(output);
    }
}
