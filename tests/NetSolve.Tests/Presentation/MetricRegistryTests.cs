using System.Text.RegularExpressions;
using NetSolve.Presentation.Solution;

namespace NetSolve.Tests.Presentation;

/// <summary>The registry of metrics against the contract: every documented JSON field has exactly one entry.</summary>
public class MetricRegistryTests
{
    // Fields of the document itself, not metrics of a unit or of the totals.
    private static readonly string[] DocumentFields = ["stable"];

    private static string ContractText() => File.ReadAllText(Path.Combine(RepositoryRoot(), "docs", "network-file.md"));

    // Source: docs/network-file.md, "JSON output of netsolve solve": the field table lists every unit field
    // (some rows name two fields, "mean_queue, mean_wait") and every total as "totals.<field>".
    private static List<string> DocumentedFields()
    {
        string text = ContractText();
        int start = text.IndexOf("| field | meaning |", StringComparison.Ordinal);
        Assert.True(start >= 0, "the contract's field table was not found");
        var fields = new List<string>();
        foreach (string line in text[start..].Split('\n').Skip(2).TakeWhile(line => line.StartsWith('|')))
        {
            string names = line.Split('|', StringSplitOptions.TrimEntries)[1];
            fields.AddRange(names.Split(',', StringSplitOptions.TrimEntries));
        }

        return fields;
    }

    [Fact]
    public void Every_unit_field_of_the_contract_has_one_metric_in_the_registry()
    {
        var registry = UnitColumns.All.Select(column => column.Id).ToList();
        var documented = DocumentedFields().Where(field => !field.StartsWith("totals.", StringComparison.Ordinal))
            .Except(DocumentFields, StringComparer.Ordinal).ToList();

        Assert.NotEmpty(documented);
        Assert.All(documented, field => Assert.Contains(field, registry, StringComparer.Ordinal));
        Assert.Equal(registry.Count, registry.Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void Every_total_of_the_contract_has_one_metric_in_the_registry_and_no_other()
    {
        var registry = TotalsColumns.All.Select(column => column.Id).Order(StringComparer.Ordinal).ToList();
        var documented = DocumentedFields().Where(field => field.StartsWith("totals.", StringComparison.Ordinal))
            .Select(field => field["totals.".Length..]).Order(StringComparer.Ordinal).ToList();

        Assert.Equal(documented, registry);
    }

    [Fact]
    public void Every_unit_metric_of_the_registry_appears_in_the_contract_example_in_the_same_order()
    {
        // Source: docs/network-file.md, the example document's first unit, field by field in order.
        string text = ContractText();
        string example = text[text.IndexOf("\"units\": [", StringComparison.Ordinal)..text.IndexOf("\"totals\"", StringComparison.Ordinal)];
        var exampleFields = Regex.Matches(example, "\"(?<field>[a-z_]+)\":", RegexOptions.ExplicitCapture, TimeSpan.FromSeconds(1))
            .Select(match => match.Groups["field"].Value).Where(field => !string.Equals(field, "units", StringComparison.Ordinal)).ToList();

        Assert.Equal(exampleFields, UnitColumns.All.Select(column => column.Id).ToList());
    }

    private static string RepositoryRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "NetSolve.sln")))
        {
            directory = directory.Parent;
        }

        return directory?.FullName ?? throw new InvalidOperationException("NetSolve.sln not found above the test output folder");
    }
}
