using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Tests.Support;
using static NetSolve.Tests.Support.CliRun;

namespace NetSolve.Tests.Cli;

/// <summary>
/// Warnings for files that are valid but probably not what the planner meant: return loops that apply a unit's
/// routes again, bare numbers taken in the file's time unit, and utilisation far beyond 100%. Warnings go to stderr
/// and leave stdout as it was.
/// </summary>
public sealed class PlausibilityWarningTests
{
    // The worked example of docs/network-file.md, "Return routes": imaging sends every patient back to emergency.
    private const string ReturnForReview = """
        name: Ashby Cross Hospital, emergency with review after imaging (invented)
        time_unit: hour
        units:
          emergency:
            servers: 30
            service: 1h
          imaging:
            servers: 4
            service: 20min
          acute_medical_unit:
            servers: 40
            service: 12h
        arrivals:
          emergency: 10/h
        routes:
          emergency:
            imaging: 50%
            acute_medical_unit: 15%
          imaging:
            emergency: 100%
        """;

    [Fact]
    public void A_return_route_doubles_the_visits_and_the_share_taking_each_route()
    {
        var network = TestNetworks.Parse(ReturnForReview);

        var loop = Assert.Single(ReturnLoops.Find(network));

        // Exact by hand: a patient leaving emergency comes back with chance 0.5 (imaging, then 100% back), so
        // visits per patient = 1 / (1 - 0.5) = 2, and the 15% route is taken 0.15 x 2 = 0.30 times per patient.
        Assert.Equal("emergency", loop.UnitId);
        Assert.Equal(2.0, loop.VisitsPerPatient, 12);
        Assert.Equal(["emergency", "imaging", "emergency"], loop.Cycle);
        Assert.Equal(0.5, loop.CycleProbability, 12);
        var other = Assert.Single(loop.OtherUnits);
        Assert.Equal("imaging", other.UnitId);

        // Exact by hand: imaging's patients return with chance 1 x 0.5, so 2 visits each as well.
        Assert.Equal(2.0, other.VisitsPerPatient, 12);
    }

    [Fact]
    public void Check_names_the_loop_the_visits_and_the_fix_on_one_line_and_stdout_is_unchanged()
    {
        string path = Write(ReturnForReview);
        try
        {
            var (code, output, error) = Run("check", path);

            Assert.Equal(0, code);
            Assert.Equal(string.Concat(path, ": valid: 3 units, 1 arrival stream, 3 routes\n"), output);
            string line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
            Assert.StartsWith(string.Concat(path, ": warning: unit 'emergency': patients come back to this unit (emergency -> imaging -> emergency: 50% of those leaving it)"), line, StringComparison.Ordinal);
            Assert.Contains("visits it 2 times on average", line, StringComparison.Ordinal);
            Assert.Contains("its 15% route to 'acute_medical_unit' is followed 30 times per 100 of its patients", line, StringComparison.Ordinal);
            Assert.Contains("separate review unit", line, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Solve_prints_the_same_table_with_or_without_the_loop_warning_on_stderr()
    {
        string path = Write(ReturnForReview);
        try
        {
            var withWarning = Run("solve", path);
            var json = Run("solve", path, "--format", "json");

            Assert.Equal(0, withWarning.ExitCode);
            Assert.Contains("patients come back to this unit", withWarning.Error, StringComparison.Ordinal);
            Assert.DoesNotContain("come back", withWarning.Out, StringComparison.Ordinal);
            Assert.DoesNotContain("come back", json.Out, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void A_small_return_to_theatre_is_not_reported()
    {
        // Exact by hand: theatres -> ward 80%, ward -> theatres 5%: return chance 4%, visits 1/0.96 = 1.04 < 1.25.
        var network = TestNetworks.Parse("""
            units:
              theatres: { servers: 4, service: 2h }
              ward: { servers: 60, service: 3d }
            arrivals:
              theatres: 1/h
            routes:
              theatres:
                ward: 80%
              ward:
                theatres: 5%
            """);

        Assert.Empty(ReturnLoops.Find(network));
    }

    [Fact]
    public void A_bare_service_number_is_a_located_warning_naming_the_unit_and_the_time_unit_it_was_read_in()
    {
        string path = Write("""
            name: Ashby Cross imaging (invented)
            time_unit: hour
            units:
              imaging:
                servers: 3
                service: 25
            arrivals:
              imaging: 2/h
            """);
        try
        {
            var (code, output, error) = Run("solve", path);

            Assert.Equal(0, code);
            Assert.DoesNotContain("warning", output, StringComparison.Ordinal);
            Assert.Equal(
                [
                    string.Concat(path, ":6:14: warning: unit 'imaging': service '25' has no unit of time, so it was read as 25 hours (the file's time_unit is hour); write e.g. 25min or 25h to say which"),

                    // Exact by hand: 2/h x 25 h = 50 erlangs on 3 servers, utilisation 1667%.
                    string.Concat(path, ": warning: unit 'imaging': utilisation 1667% is more than twice what its servers can do; is a unit of time missing or wrong? its service is 25 hours per patient (write e.g. 25min or 2.5h)"),
                ],
                error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void A_service_with_its_unit_of_time_gets_no_warning()
    {
        string path = Write("""
            units:
              imaging:
                servers: 3
                service: 25min
            arrivals:
              imaging: 2/h
            """);
        try
        {
            var (code, _, error) = Run("solve", path);

            Assert.Equal(0, code);
            Assert.Empty(error);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void A_bare_number_for_a_staffing_target_is_a_warning_and_the_table_is_the_same_as_with_the_unit_written()
    {
        string harbourside = Path.Combine(AppContext.BaseDirectory, "networks", "harbourside.yaml");

        var bare = Run("staff", harbourside, "--max-wait", "30");
        var written = Run("staff", harbourside, "--max-wait", "30h");

        Assert.Equal(0, bare.ExitCode);
        Assert.Equal(written.Out, bare.Out);
        Assert.Equal("netsolve: warning: --max-wait 30 has no unit of time, so it was read as 30 hours (the file's time_unit is hour); write e.g. 30min or 30h to say which\n", bare.Error);
        Assert.Empty(written.Error);
    }

    private static string Write(string text)
    {
        string path = Path.Combine(Path.GetTempPath(), string.Concat("netsolve-plausible-", Guid.NewGuid().ToString("N", CultureInfo.InvariantCulture), ".yaml"));
        File.WriteAllText(path, text);
        return path;
    }
}
