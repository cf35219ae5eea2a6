using NetSolve.Presentation;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Roster;

public sealed class StaffByHourCommandTests
{
    // Common practice: three eight-hour shifts from 07, 15 and 23; the CSV has one row per unit and hour.
    [Fact]
    public void The_example_emergency_department_gets_a_shift_roster_constant_in_each_block()
    {
        var result = CliRun.Run("staff", TestFiles.Network("wrenfield-emergency-roster"), "--by-hour", "--max-wait", "10min", "--shifts", "07,15,23", "--no-check", "--format", "csv");

        Assert.Equal(0, result.ExitCode);
        var rows = result.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries).Skip(1).Select(line => line.Split(',')).Where(cells => cells[0] == "clinicians").ToList();
        Assert.Equal(24, rows.Count);
        Assert.Equal("00-01", rows[0][1]);
        Assert.All(rows.Skip(7).Take(8), cells => Assert.Equal(rows[7][3], cells[3]));
        Assert.All(rows.Skip(15).Take(8), cells => Assert.Equal(rows[15][3], cells[3]));
        Assert.Equal(rows[23][3], rows[0][3]);
    }

    [Fact]
    public void The_table_carries_the_planning_caution_and_the_staff_hours_against_flat_staffing()
    {
        var result = CliRun.Run("staff", TestFiles.Network("wrenfield-emergency-roster"), "--by-hour", "--max-wait", "10min", "--no-check");

        Assert.Equal(0, result.ExitCode);
        // A roster comes from the time-varying queue over a repeating day, so its caution claims no steady state.
        Assert.EndsWith(Caution.HourByHour + "\n", result.Out, StringComparison.Ordinal);
        Assert.DoesNotContain(Caution.Text, result.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("steady state", result.Out, StringComparison.Ordinal);
        Assert.Contains("staff-hours a day on the roster against", result.Out, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--shifts", "15,07", "--shifts: '15,07' is not a list of shift start hours; write whole hours from 0 to 23 in rising order, e.g. 07,15,23")]
    [InlineData("--budget", "2", "staff: --by-hour takes --max-wait, --max-time, --max-util and --wait-over with --at-most, not --budget, --cost or --max-turned-away")]
    [InlineData("--max-turned-away", "0.05", "staff: --by-hour takes --max-wait, --max-time, --max-util and --wait-over with --at-most, not --budget, --cost or --max-turned-away")]
    public void Bad_by_hour_options_are_usage_errors(string option, string value, string expected)
    {
        var result = CliRun.Run("staff", TestFiles.Network("wrenfield-emergency-roster"), "--by-hour", "--max-wait", "10min", option, value);

        Assert.Equal(2, result.ExitCode);
        Assert.Contains(expected, result.Error, StringComparison.Ordinal);
    }
}
