using NetSolve.Parsing;

namespace NetSolve.Tests.Roster;

public sealed class RosterParsingTests
{
    private static ReadResult Read(string servers, string roster, string extra = "") => NetworkReader.ReadText($"""
        units:
          triage:
            servers: {servers}
            service: 30min{extra}
            roster: {roster}
        arrivals:
          triage: 3/h
        """, "test.yaml");

    private static string Errors(ReadResult result) => string.Join("\n", result.Diagnostics.Where(d => d.IsError));

    private static readonly string TwentyFour = "[" + string.Join(", ", Enumerable.Range(0, 24).Select(h => h is >= 8 and < 20 ? 4 : 2)) + "]";

    // Exact by hand: hour 00-01 is the first entry; 12 day hours of 4 and 12 of 2 average 3.
    [Fact]
    public void A_list_of_24_gives_the_servers_of_each_hour_and_a_warning_about_the_steady_state()
    {
        var result = Read("4", TwentyFour);

        Assert.False(result.HasErrors, Errors(result));
        var roster = result.Network!.Units[0].Roster!;
        Assert.Equal(2, roster.At(7.5));
        Assert.Equal(4, roster.At(8.0));
        Assert.Equal(2, roster.At(24 + 20.0));
        Assert.Equal(3.0, roster.Mean, 12);
        var warning = Assert.Single(result.Diagnostics);
        Assert.Equal("test.yaml:5:13: warning: unit 'triage': roster averages 3 servers; the steady-state formulas use servers 4 all day, while simulate and staff --by-hour follow the roster", warning.ToString());
    }

    // Exact by hand: "23-07" runs across midnight, so hours 23 and 00-06 have 3 servers.
    [Fact]
    public void Shift_blocks_cover_the_day_and_may_run_across_midnight()
    {
        var result = Read("6", "{ \"07-15\": 6, \"15-23\": 5, \"23-07\": 3 }");

        Assert.False(result.HasErrors, Errors(result));
        var hours = result.Network!.Units[0].Roster!.ServersByHour;
        Assert.Equal([3, 3, 3, 3, 3, 3, 3, 6, 6, 6, 6, 6, 6, 6, 6, 5, 5, 5, 5, 5, 5, 5, 5, 3], hours);
    }

    [Fact]
    public void A_week_long_roster_has_168_hours_from_monday()
    {
        var result = Read("3", "[" + string.Join(", ", Enumerable.Range(0, 168).Select(h => h < 120 ? 3 : 1)) + "]");

        Assert.False(result.HasErrors, Errors(result));
        var roster = result.Network!.Units[0].Roster!;
        Assert.Equal(3, roster.At(119.5));
        Assert.Equal(1, roster.At(120.0));
    }

    [Theory]
    [InlineData("4", "[1, 2, 3]", "test.yaml:5:13: unit 'triage': roster has 3 entries; give 24 (hour 00-01 first) or 168 (Monday 00-01 first)")]
    [InlineData("4", "[-1, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2]", "test.yaml:5:14: unit 'triage': roster: '-1' is not a number of servers; write a whole number from 0 to 1000000")]
    [InlineData("4", "[2.5, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2]", "test.yaml:5:14: unit 'triage': roster: '2.5' is not a number of servers; write a whole number from 0 to 1000000")]
    [InlineData("4", "[0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0]", "test.yaml:5:13: unit 'triage': roster: every hour has 0 servers; at least one hour needs a server")]
    [InlineData("unlimited", TwentyFourText, "test.yaml:5:13: unit 'triage': roster on a unit with unlimited servers: nobody waits there, so there is nothing to roster; give servers a number or remove the roster")]
    [InlineData("4", "{ \"07-15\": 6, \"15-07\": 3, \"06-08\": 2 }", "test.yaml:5:39: unit 'triage': roster: block '06-08' overlaps another block at hour 06")]
    [InlineData("4", "{ \"07-15\": 6, \"15-23\": 3 }", "test.yaml:5:13: unit 'triage': roster: no block covers hour 00-01; the blocks must cover the day once")]
    [InlineData("4", "{ \"7-15\": 6, \"15-07\": 3 }", "test.yaml:5:15: unit 'triage': roster: '7-15' is not a shift block; write the start and end hour, e.g. \"07-15\" or \"23-07\" across midnight")]
    [InlineData("4", "{ \"07-07\": 6 }", "test.yaml:5:15: unit 'triage': roster: '07-07' is not a shift block; write the start and end hour, e.g. \"07-15\" or \"23-07\" across midnight")]
    [InlineData("4", "six", "test.yaml:5:13: unit 'triage': roster must be a list of 24 (or 168) whole numbers, hour 00-01 first, or shift blocks such as { \"07-15\": 6, \"15-07\": 3 }")]
    public void A_bad_roster_is_one_located_error(string servers, string roster, string expected)
    {
        var result = Read(servers, roster);

        Assert.Equal(expected, Errors(result));
        Assert.Null(result.Network);
    }

    private const string TwentyFourText = "[2, 2, 2, 2, 2, 2, 2, 2, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 2, 2, 2, 2]";

    [Fact]
    public void A_capacity_below_the_rosters_most_servers_is_an_error()
    {
        var result = Read("2", "{ \"07-19\": 5, \"19-07\": 2 }", "\n    capacity: 4");

        Assert.Equal("test.yaml:6:13: unit 'triage': capacity 4 is below the roster's 5 servers; capacity counts patients in service and waiting", Errors(result));
    }
}
