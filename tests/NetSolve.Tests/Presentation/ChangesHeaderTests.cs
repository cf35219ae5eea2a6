using System.Text;
using System.Text.Json;
using NetSolve.Presentation.Scenarios;

namespace NetSolve.Tests.Presentation;

/// <summary>The changes header leaves unchanged outputs byte for byte alone and adds to changed ones only.</summary>
public sealed class ChangesHeaderTests
{
    private static readonly byte[] Document = Encoding.UTF8.GetBytes("{\n  \"network\": \"Invented\",\n  \"rate\": 1.50\n}");

    [Fact]
    public void Json_without_changes_is_returned_byte_for_byte()
    {
        Assert.Same(Document, ChangesHeader.AddToJson(Document, []));
    }

    [Fact]
    public void Json_with_changes_keeps_every_other_value_as_written()
    {
        using var json = JsonDocument.Parse(ChangesHeader.AddToJson(Document, ["ward: 3 servers"]));

        Assert.Equal(["network", "changes", "rate"], json.RootElement.EnumerateObject().Select(p => p.Name).ToArray());
        Assert.Equal("1.50", json.RootElement.GetProperty("rate").GetRawText());
    }

    [Fact]
    public void Json_without_a_network_name_gets_the_changes_first()
    {
        byte[] unnamed = Encoding.UTF8.GetBytes("{\"rate\": 2}");

        using var json = JsonDocument.Parse(ChangesHeader.AddToJson(unnamed, ["ward: 3 servers"]));

        Assert.Equal("changes", json.RootElement.EnumerateObject().First().Name);
    }

    [Fact]
    public void A_table_gets_the_changes_line_under_its_first_line_only_when_something_changed()
    {
        const string table = "Invented Hospital  (rates per hour)\n\nunit  servers\n";

        Assert.Same(table, ChangesHeader.AddToTable(table, []));
        Assert.Equal(
            "Invented Hospital  (rates per hour)\nchanges: ward: 3 servers; clinic: closed, patients leave\n\nunit  servers\n",
            ChangesHeader.AddToTable(table, ["ward: 3 servers", "clinic: closed, patients leave"]));
    }
}
