using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving;

/// <summary>
/// Single queues and small Jackson networks against worked examples published outside the project, each checked to
/// the precision its source prints. docs/reference-values.md lists the sources.
/// </summary>
public partial class NetworkSolverTests
{
    /// <summary>Half of the last printed digit of a value printed to two decimals.</summary>
    private const double HalfOfSecondDecimal = 0.005;

    /// <summary>For values a source works out in exact arithmetic (for example 0.8 / (1 − 0.8) = 4).</summary>
    private const double ExactArithmetic = 1e-9;

    // Source: textbook closed forms for the M/M/1 queue, worked by hand (D. Gross, J. F. Shortle, J. M. Thompson and
    // C. M. Harris, Fundamentals of Queueing Theory, 4th ed., Wiley 2008, section 2.2; the section number is from
    // memory). With λ = 0.8 and μ = 1 per minute: ρ = λ/μ = 0.8, L = ρ/(1 − ρ) = 4, Lq = ρ²/(1 − ρ) = 3.2,
    // W = 1/(μ − λ) = 5 minutes, Wq = ρ/(μ − λ) = 4 minutes; exact arithmetic.
    [Fact]
    public void A_single_server_at_rho_0_8_matches_the_textbook_M_M_1_closed_forms_in_minutes()
    {
        const string Yaml = """
            name: Published M/M/1 example
            time_unit: minute
            units:
              desk:
                servers: 1
                service: 1
            arrivals:
              desk: 0.8
            """;
        var solution = NetworkSolver.Solve(TestNetworks.Parse(Yaml));
        var desk = solution.Units[0];

        Assert.Equal(0.8, TimeConstants.RateFromPerHour(desk.ArrivalsPerHour, TimeUnit.Minute), ExactArithmetic);
        Assert.Equal(0.8, desk.Utilisation, ExactArithmetic);
        Assert.Equal(4.0, desk.MeanInUnit!.Value, ExactArithmetic);
        Assert.Equal(5.0, TimeConstants.FromHours(desk.MeanTimeInUnitHours!.Value, TimeUnit.Minute), ExactArithmetic);
        Assert.Equal(4.0, TimeConstants.FromHours(desk.MeanWaitHours!.Value, TimeUnit.Minute), ExactArithmetic);
        Assert.Equal(3.2, desk.MeanQueue!.Value, ExactArithmetic);
    }

    // Source: FabTime Inc., "M/M/1 Queues in Series with Rework", www.fabtime.com/MM1Rework.shtml (worked example of
    // the analytic cycle time). Three single-machine workstations, each processing 2.0 lots per hour; 1.0 lot per hour
    // arrives at workstation one; a lot leaving workstation one goes with probability 0.2 to a rework workstation and
    // back to workstation one, otherwise to the last workstation and out. Published: arrival rate at workstation one
    // 1.25 lots/h (= 1/(1 − p); the page's formula line labels it λ2, its text says workstation one), at the rework
    // workstation 0.25, at the last workstation 1.0; expected system cycle time, the sum over workstations of visits
    // times time per visit, "2.81 hours".
    [Fact]
    public void A_rework_loop_solves_to_the_published_flows_and_cycle_time()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Parse(PublishedNetworks.ReworkLoop));
        double[] flows = [.. solution.Units.Select(unit => unit.ArrivalsPerHour)];

        // The flows are sums of a geometric series, exact on the page.
        Assert.Equal([1.25, 0.25, 1.0], flows, (expected, actual) => Math.Abs(expected - actual) <= ExactArithmetic);
        Assert.True(solution.IsStable);
        Assert.Equal(2.81, solution.Totals.MeanTimeInSystemHours!.Value, HalfOfSecondDecimal);
    }

    // Source: FabTime Inc., "M/M/1 Queues in Series with Scrap", fabtime.com/MM1Scrap.php (worked example). Three
    // single-machine workstations in series, 1.0 lot per hour into the first, processing rates 2.5, 2.0 and 2.5 lots per
    // hour; one lot in ten is scrapped at workstation one, one in five at workstation two (scrapped lots leave).
    // Published: λ2 = 0.9 and λ3 = 0.72 lots per hour; cycle time of a lot that passes all three
    // "0.67 + 0.91 + 0.56 = 2.14 hours".
    [Fact]
    public void A_line_with_scrap_solves_to_the_published_flows_and_times_per_workstation()
    {
        const string Yaml = """
            name: Published line with scrap
            units:
              station_one:
                servers: 1
                service: 24min
              station_two:
                servers: 1
                service: 30min
              station_three:
                servers: 1
                service: 24min
            arrivals:
              station_one: 1/h
            routes:
              station_one:
                station_two: 0.9
              station_two:
                station_three: 0.8
            """;
        var units = NetworkSolver.Solve(TestNetworks.Parse(Yaml)).Units;

        Assert.Equal(0.9, units[1].ArrivalsPerHour, ExactArithmetic);
        Assert.Equal(0.72, units[2].ArrivalsPerHour, ExactArithmetic);
        Assert.Equal(0.67, units[0].MeanTimeInUnitHours!.Value, HalfOfSecondDecimal);
        Assert.Equal(0.91, units[1].MeanTimeInUnitHours!.Value, HalfOfSecondDecimal);
        Assert.Equal(0.56, units[2].MeanTimeInUnitHours!.Value, HalfOfSecondDecimal);
        Assert.Equal(2.14, units.Sum(unit => unit.MeanTimeInUnitHours!.Value), HalfOfSecondDecimal);
    }
}
