using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Fitting;
using NetSolve.Fitting.Reading;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Presentation;

namespace NetSolve.Tests.Fitting;

public sealed class UnitNamingTests
{
    [Theory]
    [InlineData("Ward 7", "Ward_7")]
    [InlineData("x-ray/ct", "x-ray_ct")]
    [InlineData("ward #2", "ward_2")]
    [InlineData("\"quoted\" unit", "quoted_unit")]
    [InlineData("Urgences pédiatriques", "Urgences_p_diatriques")]
    [InlineData("7th floor", "unit_7th_floor")]
    [InlineData("#", "unit_")]
    public void Any_name_becomes_a_valid_unit_id(string name, string id)
    {
        // Exact by hand: the rule in docs/movement-log.md (runs of other characters become one '_').
        Assert.Equal(id, UnitNaming.MakeId(name));
    }

    [Fact]
    public void Hostile_unit_names_round_trip_through_the_network_reader_with_their_labels()
    {
        string[] names = ["Ward 7", "ward 7", "ward_7", "x-ray/ct", "ward #2", "say \"\"hi\"\"", "Urgences pédiatriques", "病棟", "a: b", "{x}", "- dash", "back\\slash"];
        var rows = names.Select((name, i) => string.Create(CultureInfo.InvariantCulture, $"P{i},\"{name}\",2026-03-02T{8 + (i % 10):00}:00,2026-03-02T{9 + (i % 10):00}:30"));
        string text = "patient,unit,arrived,left\n" + string.Join("\n", rows) + "\n";
        var (log, diagnostics) = MovementLogReader.Read(text, "log.csv");
        Assert.Empty(diagnostics);
        var fitted = NetworkFitter.Fit(log!, "hostile", TimeUnit.Hour);
        var yaml = new StringWriter();
        NetworkYamlWriter.Write(fitted.Network, yaml, ["fitted"]);

        var read = NetworkReader.ReadText(yaml.ToString(), "fitted.yaml");

        Assert.False(read.HasErrors, string.Join("\n", read.Diagnostics) + "\n" + yaml);
        Assert.Equal(names.Length, read.Network!.Units.Length);
        Assert.Equal(names.Select(name => name.Replace("\"\"", "\"", StringComparison.Ordinal)).Order(StringComparer.Ordinal),
            read.Network.Units.Select(unit => unit.Label).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Names_differing_only_in_case_are_one_unit_only_when_asked()
    {
        const string text = "patient,unit,arrived,left\nP1,ED,2026-03-02T08:00,2026-03-02T09:00\nP2,ed,2026-03-02T09:00,2026-03-02T10:00\n";

        var (exact, _) = MovementLogReader.Read(text, "log.csv");
        var (folded, _) = MovementLogReader.Read(text, "log.csv", new MovementLogOptions { IgnoreCase = true });

        Assert.Equal(ImmutableArray.Create("ED", "ed"), Ids(exact!));
        // The label is the ordinal-first spelling, whatever the row order.
        Assert.Equal(new LogUnit("ED", "ED"), Assert.Single(folded!.Units));
    }

    [Fact]
    public void A_unit_map_merges_spellings_into_one_unit_with_its_id_and_label()
    {
        const string map = "name,id,label\nA&E,emergency,Emergency department\nEmergency Dept,emergency,\n";
        const string text = "patient,unit,arrived,left\nP1,A&E,2026-03-02T08:00,2026-03-02T09:00\nP2,Emergency Dept,2026-03-02T09:00,2026-03-02T10:00\nP3,Ward 7,2026-03-02T09:00,2026-03-02T10:00\n";
        using var mapStream = new MemoryStream(System.Text.Encoding.UTF8.GetBytes(map));
        var (entries, problems) = UnitMapReader.Read(mapStream, "map.csv", ignoreCase: false);
        Assert.Empty(problems);

        var (log, _) = MovementLogReader.Read(text, "log.csv", new MovementLogOptions { UnitMap = entries! });

        Assert.Equal([new LogUnit("Ward_7", "Ward 7"), new LogUnit("emergency", "Emergency department")], log!.Units);
    }

    [Theory]
    [InlineData("name,id\nA&E,7th\n", "map.csv:2:1: '7th' is not a valid unit id: use letters, digits, '_' and '-', starting with a letter")]
    [InlineData("name,id\nA&E,ed\nA&E,ae\n", "map.csv:3:1: the name 'A&E' is mapped twice")]
    [InlineData("from,to\n", "map.csv:1:1: the unit map's header must be name,id or name,id,label")]
    public void A_bad_unit_map_gets_a_located_line(string map, string expected)
    {
        using var stream = new MemoryStream(System.Text.Encoding.UTF8.GetBytes(map));

        var (entries, problems) = UnitMapReader.Read(stream, "map.csv", ignoreCase: false);

        Assert.Null(entries);
        Assert.Equal(expected, problems[0].ToString());
    }

    private static ImmutableArray<string> Ids(MovementLog log) => [.. log.Units.Select(unit => unit.Id)];
}
