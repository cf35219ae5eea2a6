using System.Globalization;
using System.Text;
using System.Text.Json;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using NetSolve.Model;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Presentation;

/// <summary>
/// Table, CSV and JSON show the same value for every metric of random networks: JSON and CSV exactly, the table
/// within the rounding documented in docs/map-and-report.md.
/// </summary>
public class SameValueEverywhereTests
{
    private static readonly string[] TimeUnits = ["minute", "hour", "day"];

    /// <summary>A random network: 2 to 8 units, servers from 1 to 1,500 or unlimited, services from 10 s to 30 days.</summary>
    private static string RandomNetwork(int seed)
    {
        var random = new Random(seed);
        int count = random.Next(2, 9);
        string timeUnit = TimeUnits[random.Next(TimeUnits.Length)];
        var yaml = new StringBuilder().Append(CultureInfo.InvariantCulture, $"name: Random {seed}\ntime_unit: {timeUnit}\nunits:\n");
        var arrivals = new StringBuilder("arrivals:\n");
        var routes = new StringBuilder("routes:\n");
        for (int i = 0; i < count; i++)
        {
            double serviceHours = Math.Exp(random.NextDouble() * Math.Log(30 * 24 * 360.0)) / 360.0;
            bool unlimited = random.Next(8) == 0;
            int servers = random.Next(3) switch { 0 => random.Next(1, 4), 1 => random.Next(4, 60), _ => random.Next(60, 1500) };
            double utilisation = 0.05 + random.NextDouble() * 1.0;
            yaml.Append(CultureInfo.InvariantCulture, $"  u{i}:\n    servers: {(unlimited ? "unlimited" : servers.ToString(CultureInfo.InvariantCulture))}\n    service: {serviceHours.ToString("R", CultureInfo.InvariantCulture)}h\n");
            if (i == 0 || random.Next(2) == 0)
            {
                double perHour = utilisation * (unlimited ? 5 : servers) / serviceHours / 2.0;
                arrivals.Append(CultureInfo.InvariantCulture, $"  u{i}: {perHour.ToString("R", CultureInfo.InvariantCulture)}/h\n");
            }

            if (i + 1 < count)
            {
                routes.Append(CultureInfo.InvariantCulture, $"  u{i}:\n    u{i + 1}: {random.NextDouble().ToString("0.###", CultureInfo.InvariantCulture)}\n");
            }
        }

        return yaml.Append(arrivals).Append(routes).ToString();
    }

    [Property(MaxTest = 150)]
    public Property Table_csv_and_json_show_the_same_value_for_every_unit_metric() =>
        Prop.ForAll(Gen.Choose(1, int.MaxValue - 1).ToArbitrary(), seed =>
        {
            var solution = NetworkSolver.Solve(TestNetworks.Parse(RandomNetwork(seed)));
            double hoursPerFileUnit = TimeConstants.HoursPer(solution.Network.TimeUnit);
            var json = Json(solution);
            var csv = Csv(solution);
            var table = Table(solution);
            for (int row = 0; row < solution.Units.Length; row++)
            {
                var jsonUnit = json.GetProperty("units")[row];
                foreach (var column in UnitColumns.All)
                {
                    var value = jsonUnit.GetProperty(column.Id);
                    string csvCell = csv[row][column.Id];
                    AssertCsvMatchesJson(column.Id, value, csvCell);
                    if (table[row].TryGetValue(column.Header, out string? tableCell))
                    {
                        AssertTableMatchesJson(column.Id, value, tableCell, hoursPerFileUnit, seed);
                    }
                }
            }
        });

    private static void AssertCsvMatchesJson(string id, JsonElement value, string csvCell)
    {
        switch (value.ValueKind)
        {
            case JsonValueKind.Number:
                Assert.Equal(value.GetDouble(), double.Parse(csvCell, CultureInfo.InvariantCulture));
                break;
            case JsonValueKind.String:
                Assert.Equal(value.GetString(), csvCell);
                break;
            default:
                Assert.True(csvCell is "" or "unlimited", $"{id}: CSV '{csvCell}' for JSON null");
                break;
        }
    }

    private static void AssertTableMatchesJson(string id, JsonElement value, string tableCell, double hoursPerFileUnit, int seed)
    {
        switch (value.ValueKind)
        {
            case JsonValueKind.Number:
                double number = value.GetDouble();
                var interval = PeopleNumber.Interval(tableCell, hoursPerFileUnit);
                Assert.True(interval is not null, string.Create(CultureInfo.InvariantCulture, $"seed {seed}, {id}: table '{tableCell}' for {number}"));
                var (low, high) = interval.Value;
                double slack = 1e-12 * Math.Max(1.0, Math.Abs(number));
                Assert.True(number >= low - slack && number <= high + slack, string.Create(CultureInfo.InvariantCulture, $"seed {seed}, {id}: table '{tableCell}' does not stand for {number.ToString("R", CultureInfo.InvariantCulture)}"));
                break;
            case JsonValueKind.String:
                Assert.EndsWith(value.GetString()!, tableCell.Trim(), StringComparison.Ordinal);
                break;
            default:
                Assert.True(tableCell.Trim() is "-" or "unlimited", string.Create(CultureInfo.InvariantCulture, $"seed {seed}, {id}: table '{tableCell}' for JSON null"));
                break;
        }
    }

    private static JsonElement Json(NetworkSolution solution)
    {
        using var stream = new MemoryStream();
        SolutionJsonWriter.Write(solution, stream);
        return JsonDocument.Parse(stream.ToArray()).RootElement.Clone();
    }

    private static List<Dictionary<string, string>> Csv(NetworkSolution solution)
    {
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        SolutionCsvWriter.Write(solution, writer);
        var rows = CsvRows.Parse(writer.ToString());
        return [.. rows.Skip(1).Select(row => rows[0].Zip(row).ToDictionary(pair => pair.First, pair => pair.Second, StringComparer.Ordinal))];
    }

    /// <summary>The unit table's cells by header, sliced at the columns its rule of dashes marks.</summary>
    private static List<Dictionary<string, string>> Table(NetworkSolution solution)
    {
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        SolutionTableWriter.Write(solution, writer);
        string[] lines = writer.ToString().Split('\n');
        int rule = Array.FindIndex(lines, line => line.StartsWith("---", StringComparison.Ordinal));
        var spans = new List<(int Start, int Length)>();
        for (int start = 0; start < lines[rule].Length;)
        {
            int end = lines[rule].IndexOf(' ', start);
            end = end < 0 ? lines[rule].Length : end;
            spans.Add((start, end - start));
            start = end + 2;
        }

        string Slice(string line, (int Start, int Length) span) =>
            span.Start >= line.Length ? string.Empty : line.Substring(span.Start, Math.Min(span.Length, line.Length - span.Start)).Trim();

        string[] headers = [.. spans.Select(span => Slice(lines[rule - 1], span))];
        return [.. lines.Skip(rule + 1).Take(solution.Units.Length)
            .Select(line => spans.Select((span, i) => (headers[i], Slice(line, span)))
                .ToDictionary(pair => HeaderWithoutRate(pair.Item1), pair => pair.Item2, StringComparer.Ordinal))];
    }

    private static string HeaderWithoutRate(string header) => header.Split('/')[0];
}
