using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening;

/// <summary>Text cells that a spreadsheet would run as a formula are written inert; numbers stay numbers.</summary>
public class CsvInjectionTests
{
    // Source: OWASP Foundation, "CSV Injection" (community attack page): cells starting with = + - @ tab or carriage
    // return are prefixed with a single quote and the field is enclosed in double quotes.
    [Theory]
    [InlineData("=HYPERLINK(\"http://example.invalid\",\"x\")")]
    [InlineData("+cmd|' /C calc'!A0")]
    [InlineData("-2+3+cmd|' /C calc'!A0")]
    [InlineData("@SUM(1+1)*cmd|' /C calc'!A0")]
    [InlineData("\tleading tab")]
    [InlineData("\rleading carriage return")]
    public void A_text_cell_that_starts_like_a_formula_gets_a_single_quote_and_is_quoted(string text)
    {
        string cell = MachineFormat.CsvText(text);

        Assert.StartsWith("\"'", cell, StringComparison.Ordinal);
        Assert.Equal("'" + text, CsvRows.Parse("a\n" + cell + "\n")[1][0]);
    }

    [Fact]
    public void A_negative_number_is_written_as_a_number()
    {
        Assert.Equal("-0.5", MachineFormat.Csv(-0.5));
        Assert.Equal("-0.5", MachineFormat.CsvCell(Cell.Of(-0.5, MetricDimension.Plain), TimeUnit.Hour));
    }

    [Theory]
    [InlineData("emergency", "emergency")]
    [InlineData("X-ray room", "X-ray room")]
    [InlineData("beds; wards", "\"beds; wards\"")]
    [InlineData("", "")]
    public void Ordinary_text_is_left_as_it_was_and_a_semicolon_is_quoted(string text, string expected) =>
        Assert.Equal(expected, MachineFormat.CsvText(text));

    [Fact]
    public void Solve_writes_a_formula_like_label_inert()
    {
        string path = WriteNetwork("=HYPERLINK(\"http://example.invalid\")");
        try
        {
            var result = CliRun.Run("solve", path, "--format", "csv");

            Assert.Equal(0, result.ExitCode);
            var rows = CsvRows.Parse(result.Out);
            int label = Array.IndexOf(rows[0], "label");
            Assert.Equal("'=HYPERLINK(\"http://example.invalid\")", rows[1][label]);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Compare_writes_a_formula_like_scenario_name_inert_and_keeps_negative_changes_numbers()
    {
        string network = WriteNetwork("Reception");
        string scenario = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-csv-scenario-{Environment.ProcessId}.yaml"));
        File.WriteAllText(scenario, "scenario: \"-two more chairs\"\nbase: " + Path.GetFileName(network) + "\nservers:\n  reception: 6\n");
        try
        {
            var result = CliRun.Run("compare", network, scenario, "--format", "csv");

            Assert.Equal(0, result.ExitCode);
            var rows = CsvRows.Parse(result.Out);
            Assert.All(rows.Skip(1), row => Assert.Equal("'-two more chairs", row[0]));
            int change = Array.IndexOf(rows[0], "change");
            Assert.Contains(rows.Skip(1), row => row[change].StartsWith('-') && double.TryParse(row[change], System.Globalization.CultureInfo.InvariantCulture, out _));
        }
        finally
        {
            File.Delete(network);
            File.Delete(scenario);
        }
    }

    private static string WriteNetwork(string label)
    {
        string path = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-csv-{Environment.ProcessId}-{Environment.CurrentManagedThreadId}.yaml"));
        File.WriteAllText(path, "name: Invented clinic\nunits:\n  reception:\n    label: '" + label.Replace("'", "''", StringComparison.Ordinal) + "'\n    servers: 4\n    service: 10min\narrivals:\n  reception: 12/h\n");
        return path;
    }
}
