using NetSolve.Tests.Analysis;
using NetSolve.Tests.Support;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Scenarios;

namespace NetSolve.Tests.Scenarios;

/// <summary>
/// One bad value, written in a network file, in a scenario file and in <c>--set</c>, gets one message: the three
/// entry points read values with the same parsers and name the field the same way. Only the location differs.
/// </summary>
public sealed class SameMistakeSameMessageTests
{
    private static readonly string HarboursidePath = Path.Combine(TestFiles.NetworksFolder, "harbourside.yaml");

    // Source: the value messages of src/NetSolve.Core/Parsing/Values; each row is one mistake in one field of the
    // ward of networks/harbourside.yaml (time_unit hour).
    public static TheoryData<string, string, string> Mistakes => new()
    {
        { "servers", "14.0", "servers: '14.0' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)" },
        { "servers", "-3", "servers: '-3' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)" },
        { "servers", "0", "servers: '0' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)" },
        { "servers", "abc", "servers: 'abc' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)" },
        { "servers", "NaN", "servers: 'NaN' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)" },
        { "servers", ".inf", "servers: '.inf' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)" },
        { "servers", "2000000", "servers: '2000000' is more than 1000000 servers (write unlimited for a unit where nobody waits)" },
        { "service", "abc", "service: 'abc' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in hours)" },
        { "service", "45mins", "service: '45mins' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in hours)" },
        { "service", "NaN", "service: 'NaN' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in hours)" },
        { "service", ".inf", "service: '.inf' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in hours)" },
        { "service", "0", "service: '0' is not a positive duration" },
        { "service", "-2h", "service: '-2h' is not a positive duration" },
        { "service", "1e-320h", "service: '1e-320h' is too short for a duration (from 1e-6 s to 100 years)" },
        { "service", "1e400h", "service: '1e400h' is too long for a duration (from 1e-6 s to 100 years)" },
        { "arrivals", "abc", "arrival rate: 'abc' is not a rate (write e.g. 11.5/h, 280/d, 0.2/min, or a number per hour)" },
        { "arrivals", "11.5/hour", "arrival rate: '11.5/hour' is not a rate (write e.g. 11.5/h, 280/d, 0.2/min, or a number per hour)" },
        { "arrivals", ".inf", "arrival rate: '.inf' is not a rate (write e.g. 11.5/h, 280/d, 0.2/min, or a number per hour)" },
        { "arrivals", "-3", "arrival rate: '-3' is negative; an arrival rate is 0 or more" },
        { "arrivals", "1e400/h", "arrival rate: '1e400/h' is too large for a rate (0, or from 1e-9/h to 1e9/h)" },
        { "route", "120%", "route to 'discharge_lounge': '120%' is not between 0 and 1" },
        { "route", "-3", "route to 'discharge_lounge': '-3' is not between 0 and 1" },
        { "route", "abc", "route to 'discharge_lounge': 'abc' is not a probability (write e.g. 0.35 or 35%)" },
        { "route", "NaN", "route to 'discharge_lounge': 'NaN' is not a probability (write e.g. 0.35 or 35%)" },
    };

    // Source: as above; a factor has no network-file form, so it is written in a scenario file and in --set.
    public static TheoryData<string, string, string> FactorMistakes => new()
    {
        { "service", "abc", "service: 'abc' is not a factor (write a number, e.g. 1.2 for 20% more)" },
        { "service", "0", "service: the factor must be more than 0, not '0'" },
        { "service", "-3", "service: the factor must be more than 0, not '-3'" },
        { "service", ".inf", "service: '.inf' is not a factor (write a number, e.g. 1.2 for 20% more)" },
        { "service", "1e400", "service: '1e400' is too large for a factor (from 1e-9 to 1e9)" },
        { "arrivals", "NaN", "arrivals: 'NaN' is not a factor (write a number, e.g. 1.2 for 20% more)" },
        { "arrivals", "-3", "arrivals: the factor must be 0 or more, not '-3'" },
    };

    [Theory]
    [MemberData(nameof(Mistakes))]
    public void A_bad_value_gets_the_same_message_in_a_network_file_a_scenario_file_and_set(string field, string value, string expected)
    {
        Assert.Equal(expected, FromNetworkFile(field, value));
        Assert.Equal(expected, FromScenarioFile(field, value));
        Assert.Equal(expected, FromSet(field, value, "="));
    }

    [Theory]
    [MemberData(nameof(FactorMistakes))]
    public void A_bad_factor_gets_the_same_message_in_a_scenario_file_and_set(string field, string value, string expected)
    {
        Assert.Equal(expected, FromScenarioFile(field, "x" + value));
        Assert.Equal(expected, FromSet(field, value, "*="));
    }

    // Source: exact by hand. The ward's 3 d is 72 h: 72 × 1e9 h is far beyond 100 years (876,600 h). A factor below
    // 1e-9 (such as 1e-320) is refused before it is applied, so no factor can make a time too short here.
    [Theory]
    [InlineData("1e9", "service: 72 h times 1000000000 is too long for a duration (from 1e-6 s to 100 years)")]
    public void A_factor_that_takes_a_time_out_of_range_gets_the_same_message_in_a_scenario_file_and_set(string factor, string expected)
    {
        Assert.Equal(expected, FromScenarioFile("service", "x" + factor));
        Assert.Equal(expected, FromSetApplied("service.ward*=" + factor));
    }

    [Fact]
    public void A_factor_that_takes_a_rate_out_of_range_gets_the_same_message_in_a_scenario_file_and_set()
    {
        // Source: exact by hand. Emergency arrivals of 11.5/h times 1e9 are 1.15e10/h, above the largest rate (1e9/h).
        const string Expected = "arrival rate: 11.5/h times 1000000000 is too large for a rate (0, or from 1e-9/h to 1e9/h)";
        var scenario = ScenarioReader.ReadText("base: harbourside.yaml\nscale_arrivals: 1e9\n", "scenario.yaml", _ => NetworkReader.ReadFile(HarboursidePath));

        Assert.Equal(Expected, OnlyError(scenario.Diagnostics));
        Assert.Equal(Expected, FromSetApplied("arrivals*=1e9"));
    }

    [Fact]
    public void A_field_with_no_value_gets_the_same_message_in_all_three()
    {
        // Source: NodeParser's wording for an empty YAML value, which --set now shares.
        Assert.Equal("servers has no value", FromNetworkFile("servers", string.Empty));
        Assert.Equal("servers has no value", FromScenarioFile("servers", string.Empty));
        Assert.Equal("servers has no value", FromSet("servers", string.Empty, "="));
    }

    [Fact]
    public void Servers_to_add_get_the_same_message_in_a_scenario_file_and_set()
    {
        // Source: AddedServersValue; the scenario writes the sign itself, --set writes it after +=.
        Assert.Equal("servers: '+two' is not a whole number of servers to add (write e.g. +2, or -1 to remove one)", FromScenarioFile("servers", "+two"));
        Assert.Equal("servers: '+two' is not a whole number of servers to add (write e.g. +2, or -1 to remove one)", FromSet("servers", "+two", "+="));
    }

    private static string FromNetworkFile(string field, string value)
    {
        string yaml = File.ReadAllText(HarboursidePath);
        string original = field switch
        {
            "servers" => "servers: 300           # staffed beds",
            "service" => "service: 3d",
            "arrivals" => "ward: 18/d               # direct admissions",
            _ => "discharge_lounge: 0.6",
        };
        Assert.Contains(original, yaml, StringComparison.Ordinal);
        string key = original[..(original.IndexOf(':', StringComparison.Ordinal) + 1)];
        var result = NetworkReader.ReadText(yaml.Replace(original, $"{key} {value}", StringComparison.Ordinal), "net.yaml");
        return OnlyError(result.Diagnostics);
    }

    private static string FromScenarioFile(string field, string value)
    {
        // A signed number in the servers section adds servers, so setting a signed count is written under add_units.
        string change = field switch
        {
            "servers" when value is ['-', ..] => $"add_units:\n  extra:\n    servers: {value}\n    service: 1h\n",
            "servers" => $"servers:\n  ward: {value}\n",
            "service" => $"service:\n  ward: {value}\n",
            "arrivals" => $"arrivals:\n  ward: {value}\n",
            _ => $"routes:\n  ward:\n    discharge_lounge: {value}\n",
        };
        var result = ScenarioReader.ReadText("base: harbourside.yaml\n" + change, "scenario.yaml", _ => NetworkReader.ReadFile(HarboursidePath));
        return OnlyError(result.Diagnostics);
    }

    private static string FromSet(string field, string value, string op)
    {
        string path = field == "route" ? "route.ward.discharge_lounge" : $"{field}.ward";
        var problem = OverrideParser.Parse($"{path}{op}{value}", TimeUnit.Hour, out _);
        Assert.NotNull(problem);
        return problem.Message;
    }

    private static string FromSetApplied(string text)
    {
        var network = SmallNetworks.Example("harbourside.yaml");
        Assert.Null(OverrideParser.Parse(text, network.TimeUnit, out var change));
        return OnlyError(NetworkEditor.Apply(network, [change!], new Diagnostics.SourceLocation("harbourside.yaml", 0, 0)).Diagnostics);
    }

    private static string OnlyError(IEnumerable<Diagnostics.Diagnostic> diagnostics) =>
        Assert.Single(diagnostics, diagnostic => diagnostic.IsError).Message;
}
